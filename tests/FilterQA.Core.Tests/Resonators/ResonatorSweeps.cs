using System.Numerics;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Tests.Resonators;

/// <summary>One motional R–L–C arm of a Butterworth–Van Dyke model.</summary>
internal readonly record struct MotionalArm(double ROhm, double LH, double CF)
{
    /// <summary>Arm with a given series resonance and inductance: C = 1/((2π·fs)²·L).</summary>
    public static MotionalArm At(double fsHz, double rOhm, double lH) => new(rOhm, lH, 1 / (Math.Pow(2 * Math.PI * fsHz, 2) * lH));
}

/// <summary>
/// Test data built directly from the Butterworth–Van Dyke admittance Y = jωC0 + Σ 1/(R + jωL + 1/(jωC)) and the
/// textbook fixture formulas; nothing here calls the code under test.
/// </summary>
internal static class ResonatorSweeps
{
    public const double Z0 = 50;

    /// <summary>Admittance of C0 across the arms, S.</summary>
    public static Complex Admittance(double hz, double c0F, params MotionalArm[] arms)
    {
        double w = 2 * Math.PI * hz;
        var y = new Complex(0, w * c0F);
        foreach (MotionalArm arm in arms)
        {
            y += 1 / new Complex(arm.ROhm, w * arm.LH - 1 / (w * arm.CF));
        }
        return y;
    }

    /// <summary>Series-through fixture: S21 = 2Z0/(2Z0 + Z) = 2Z0·Y/(2Z0·Y + 1).</summary>
    public static Complex SeriesS21(Complex y) => 2 * Z0 * y / (2 * Z0 * y + 1);

    /// <summary>Series-through fixture: S11 = Z/(Z + 2Z0) = 1/(1 + 2Z0·Y).</summary>
    public static Complex SeriesS11(Complex y) => 1 / (1 + 2 * Z0 * y);

    /// <summary>One-port: S11 = (Z − Z0)/(Z + Z0) = (1 − Z0·Y)/(1 + Z0·Y).</summary>
    public static Complex OnePortS11(Complex y) => (1 - Z0 * y) / (1 + Z0 * y);

    /// <summary>Shunt to ground: S21 = 2Z/(2Z + Z0) = 2/(2 + Z0·Y).</summary>
    public static Complex ShuntS21(Complex y) => 2 / (2 + Z0 * y);

    /// <summary>Shunt to ground: S11 = −Z0/(2Z + Z0) = −Z0·Y/(2 + Z0·Y).</summary>
    public static Complex ShuntS11(Complex y) => -Z0 * y / (2 + Z0 * y);

    public static Sweep TwoPort(FrequencyGrid grid, Func<double, Complex> s21, Func<double, Complex> s11, double noiseRms = 0, int seed = 1)
    {
        var s = new Complex[grid.Count, 2, 2];
        var random = new Random(seed);
        for (int i = 0; i < grid.Count; i++)
        {
            Complex t = s21(grid[i]) + Noise(random, noiseRms);
            Complex r = s11(grid[i]);
            s[i, 0, 0] = r;
            s[i, 1, 1] = r;
            s[i, 1, 0] = t;
            s[i, 0, 1] = t;
        }
        return Sweep.FromNetwork(NetworkData.Create(grid, s, [Z0, Z0]), SweepSource.Of("resonator.s2p", SweepFormat.Synthetic));
    }

    public static Sweep OnePort(FrequencyGrid grid, Func<double, Complex> s11, double noiseRms = 0, int seed = 1)
    {
        var s = new Complex[grid.Count, 1, 1];
        var random = new Random(seed);
        for (int i = 0; i < grid.Count; i++)
        {
            s[i, 0, 0] = s11(grid[i]) + Noise(random, noiseRms);
        }
        return Sweep.FromNetwork(NetworkData.Create(grid, s, [Z0]), SweepSource.Of("resonator.s1p", SweepFormat.Synthetic));
    }

    /// <summary>A crystal in the series-through fixture.</summary>
    public static Sweep SeriesCrystal(FrequencyGrid grid, double c0F, MotionalArm[] arms, double noiseRms = 0, int seed = 1) =>
        TwoPort(grid, f => SeriesS21(Admittance(f, c0F, arms)), f => SeriesS11(Admittance(f, c0F, arms)), noiseRms, seed);

    /// <summary>Complex Gaussian noise with E|n|² = rms² (each component rms/√2), Box–Muller from a seeded generator.</summary>
    private static Complex Noise(Random random, double rms)
    {
        if (rms == 0)
        {
            return Complex.Zero;
        }
        double u1 = 1 - random.NextDouble(), u2 = random.NextDouble();
        double radius = Math.Sqrt(-2 * Math.Log(u1)) * rms / Math.Sqrt(2);
        return Complex.FromPolarCoordinates(radius, 2 * Math.PI * u2);
    }
}
