using System.Numerics;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Tests.Measurement;

/// <summary>
/// Closed-form bandpass responses written from the handbook prototypes, independent of any project code:
/// the lowpass-to-bandpass transformation Ω = (f/f0 − f0/f)/(B/f0), f0 the geometric centre, B the 3 dB (Butterworth)
/// or ripple (Chebyshev) bandwidth; Butterworth |H|² = 1/(1 + Ω^(2n)); Chebyshev type I |H|² = 1/(1 + ε²T_n²(Ω)),
/// ε = √(10^(ripple/10) − 1). Source: Zverev, Handbook of Filter Synthesis, and Matthaei, Young and Jones,
/// Microwave Filters, Impedance-Matching Networks and Coupling Structures (from memory).
/// </summary>
internal static class AnalyticBandpass
{
    public static double Omega(double hz, double f0Hz, double bandwidthHz) => (hz / f0Hz - f0Hz / hz) * f0Hz / bandwidthHz;

    public static double ButterworthLossDb(double hz, double f0Hz, double bandwidthHz, int order) =>
        10 * Math.Log10(1 + Math.Pow(Omega(hz, f0Hz, bandwidthHz) * Omega(hz, f0Hz, bandwidthHz), order));

    public static double Epsilon(double rippleDb) => Math.Sqrt(Math.Pow(10, rippleDb / 10) - 1);

    /// <summary>Chebyshev polynomial of the first kind: cos(n·acos x) inside ±1, ±cosh(n·acosh|x|) outside.</summary>
    public static double ChebyshevT(int order, double x)
    {
        if (Math.Abs(x) <= 1)
        {
            return Math.Cos(order * Math.Acos(x));
        }
        double magnitude = Math.Cosh(order * Math.Acosh(Math.Abs(x)));
        return x < 0 && order % 2 == 1 ? -magnitude : magnitude;
    }

    public static double ChebyshevLossDb(double hz, double f0Hz, double rippleBandwidthHz, int order, double rippleDb)
    {
        double t = ChebyshevT(order, Omega(hz, f0Hz, rippleBandwidthHz));
        double eps = Epsilon(rippleDb);
        return 10 * Math.Log10(1 + eps * eps * t * t);
    }

    /// <summary>Butterworth: Ω at which the loss is <paramref name="lossDb"/>: (10^(X/10) − 1)^(1/(2n)).</summary>
    public static double ButterworthOmegaAt(double lossDb, int order) => Math.Pow(Math.Pow(10, lossDb / 10) - 1, 1.0 / (2 * order));

    /// <summary>Chebyshev, outside the ripple band (X ≥ ripple): cosh(acosh(√(10^(X/10) − 1)/ε)/n).</summary>
    public static double ChebyshevOmegaAt(double lossDb, int order, double rippleDb) =>
        Math.Cosh(Math.Acosh(Math.Sqrt(Math.Pow(10, lossDb / 10) - 1) / Epsilon(rippleDb)) / order);

    /// <summary>Band edges for a prototype frequency Ω: f = ∓Ω·B/2 + √((Ω·B/2)² + f0²).</summary>
    public static (double LowerHz, double UpperHz) EdgesHz(double omega, double f0Hz, double bandwidthHz)
    {
        double half = omega * bandwidthHz / 2;
        double root = Math.Sqrt(half * half + f0Hz * f0Hz);
        return (root - half, root + half);
    }

    public static ResponseTrace Trace(FrequencyGrid grid, Func<double, double> lossDb, double noiseSigmaDb = 0, int seed = 1)
    {
        var random = new Random(seed);
        var loss = new double[grid.Count];
        for (int i = 0; i < loss.Length; i++)
        {
            loss[i] = lossDb(grid[i]) + (noiseSigmaDb > 0 ? noiseSigmaDb * Gaussian(random) : 0);
        }
        return ResponseTrace.Create(grid, ResponsePath.Transmission, loss);
    }

    /// <summary>
    /// A trace as an instrument sees it: the filter's amplitude plus complex Gaussian noise of total power
    /// 10^(−floorDb/10) relative to the thru, i.e. a noise floor <paramref name="floorDb"/> below the thru.
    /// </summary>
    public static ResponseTrace WithNoiseFloor(FrequencyGrid grid, Func<double, double> lossDb, double floorDb, int seed)
    {
        var random = new Random(seed);
        var values = new Complex[grid.Count];
        double sigma = Math.Pow(10, -floorDb / 20) / Math.Sqrt(2);
        for (int i = 0; i < values.Length; i++)
        {
            double amplitude = Math.Pow(10, -lossDb(grid[i]) / 20);
            values[i] = new Complex(amplitude + sigma * Gaussian(random), sigma * Gaussian(random));
        }
        return ResponseTrace.FromComplex(grid, ResponsePath.Transmission, values);
    }

    /// <summary>Standard normal deviate by the Box–Muller transform.</summary>
    public static double Gaussian(Random random)
    {
        double u1 = 1 - random.NextDouble();
        double u2 = random.NextDouble();
        return Math.Sqrt(-2 * Math.Log(u1)) * Math.Cos(2 * Math.PI * u2);
    }

    /// <summary>
    /// Tolerance of a linearly interpolated crossing (DOMAIN 4, worked bound): the interpolant's error in dB is at most
    /// h²·|L''|/8, which moves the crossing by that over |L'|. L' and L'' come from the closed form by central differences;
    /// a factor 2 covers the change of L'' across the interval, plus 1e-12 relative for rounding.
    /// </summary>
    public static double InterpolationToleranceHz(Func<double, double> lossDb, double edgeHz, double stepHz)
    {
        double d = stepHz / 50;
        double slope = (lossDb(edgeHz + d) - lossDb(edgeHz - d)) / (2 * d);
        double curvature = 0;
        for (int k = -2; k <= 2; k++)
        {
            double x = edgeHz + k * stepHz / 4;
            curvature = Math.Max(curvature, Math.Abs(lossDb(x + d) - 2 * lossDb(x) + lossDb(x - d)) / (d * d));
        }
        return 2 * stepHz * stepHz * curvature / (8 * Math.Abs(slope)) + 1e-12 * edgeHz;
    }

    public static double SlopeDbPerHz(Func<double, double> lossDb, double hz, double d) => (lossDb(hz + d) - lossDb(hz - d)) / (2 * d);

    public static double SampledMinimum(FrequencyGrid grid, Func<double, double> lossDb)
    {
        double least = double.PositiveInfinity;
        foreach (double f in grid.Hz)
        {
            least = Math.Min(least, lossDb(f));
        }
        return least;
    }
}
