using System.Numerics;

namespace FilterQA.Core.Resonators;

/// <summary>
/// Point-to-point noise of a trace from its second differences d = x₋₁ − 2x₀ + x₊₁, which cancel any locally
/// straight response. For white noise of RMS σ, E|d|² = 6σ². The median is used so that the few points where the
/// response itself bends sharply (the resonance) do not count: for complex Gaussian noise |d|² is exponential, so
/// median(|d|²) = ln 2 · 6σ²; for real Gaussian noise median(|d|) = 0.6745·√6·σ.
/// </summary>
internal static class NoiseEstimate
{
    /// <summary>RMS of the complex noise per point (√E|n|²); 0 for fewer than 3 points.</summary>
    internal static double ComplexRms(ReadOnlySpan<Complex> x)
    {
        if (x.Length < 3)
        {
            return 0;
        }
        var d2 = new double[x.Length - 2];
        for (int i = 1; i < x.Length - 1; i++)
        {
            Complex d = x[i - 1] - 2 * x[i] + x[i + 1];
            d2[i - 1] = d.Real * d.Real + d.Imaginary * d.Imaginary;
        }
        return Math.Sqrt(Median(d2) / (6 * Math.Log(2)));
    }

    /// <summary>Standard deviation of real noise per point; 0 for fewer than 3 points.</summary>
    internal static double RealRms(ReadOnlySpan<double> x)
    {
        if (x.Length < 3)
        {
            return 0;
        }
        var d = new double[x.Length - 2];
        for (int i = 1; i < x.Length - 1; i++)
        {
            d[i - 1] = Math.Abs(x[i - 1] - 2 * x[i] + x[i + 1]);
        }
        return Median(d) / (0.6745 * Math.Sqrt(6));
    }

    private static double Median(double[] values)
    {
        Array.Sort(values);
        int mid = values.Length / 2;
        return values.Length % 2 == 1 ? values[mid] : 0.5 * (values[mid - 1] + values[mid]);
    }
}
