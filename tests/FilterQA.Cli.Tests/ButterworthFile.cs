using System.Globalization;
using System.Text;

namespace FilterQA.Cli.Tests;

/// <summary>
/// A Touchstone 1.x two-port written by the test itself from the closed-form Butterworth bandpass
/// magnitude |S21|² = 1/(1 + Ω^(2n)), Ω = (f/f0 − f0/f)·f0/B (lowpass-to-bandpass transformation of the
/// maximally flat prototype; Zverev, Handbook of Filter Synthesis, 1967, ch. 2, recalled from memory).
/// </summary>
internal static class ButterworthFile
{
    public static double GainSquared(double f, double f0, double bandwidthHz, int order)
    {
        double omega = (f / f0 - f0 / f) * f0 / bandwidthHz;
        return 1.0 / (1.0 + Math.Pow(omega, 2 * order));
    }

    /// <summary>The two frequencies where the loss is <paramref name="levelDb"/>: Ω_X = (10^(X/10) − 1)^(1/2n), f = Ω_X·B/2 ± √((Ω_X·B/2)² + f0²).</summary>
    public static (double LowerHz, double UpperHz) Edges(double levelDb, double f0, double bandwidthHz, int order)
    {
        double omega = Math.Pow(Math.Pow(10, levelDb / 10) - 1, 1.0 / (2 * order));
        double half = omega * bandwidthHz / 2;
        double root = Math.Sqrt(half * half + f0 * f0);
        return (root - half, root + half);
    }

    /// <summary>Real/imaginary Touchstone text (phase 0: magnitude only matters here), S11 from passivity.</summary>
    public static string Text(double startHz, double stopHz, int points, double f0, double bandwidthHz, int order)
    {
        var text = new StringBuilder("! closed-form Butterworth bandpass written by the test\n# HZ S RI R 50\n");
        for (int i = 0; i < points; i++)
        {
            double f = startHz + (stopHz - startHz) * i / (points - 1);
            double g2 = GainSquared(f, f0, bandwidthHz, order);
            double s21 = Math.Sqrt(g2);
            double s11 = Math.Sqrt(1 - g2);
            text.Append(CultureInfo.InvariantCulture, $"{f:R} {s11:R} 0 {s21:R} 0 {s21:R} 0 {s11:R} 0\n");
        }
        return text.ToString();
    }
}
