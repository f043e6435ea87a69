using System.Numerics;

namespace FilterQA.Core.Synthesis;

/// <summary>
/// All-pole lowpass prototypes (cut-off 1 rad/s) and their lowpass-to-bandpass evaluation.
/// Poles from the standard closed forms (e.g. Zverev, Handbook of Filter Synthesis; Williams and Taylor,
/// Electronic Filter Design Handbook).
/// </summary>
internal static class BandpassPrototype
{
    /// <summary>
    /// Left-half-plane poles of a Butterworth (<paramref name="rippleDb"/> = 0) or Chebyshev type I prototype
    /// whose ripple band (3 dB band for Butterworth) ends at 1 rad/s.
    /// </summary>
    public static Complex[] Poles(int order, double rippleDb)
    {
        if (order < 1 || order > 12)
        {
            throw new ArgumentOutOfRangeException(nameof(order), order, "prototype order must be 1..12");
        }
        if (!double.IsFinite(rippleDb) || rippleDb < 0 || rippleDb > 3)
        {
            throw new ArgumentOutOfRangeException(nameof(rippleDb), rippleDb, "passband ripple must be 0..3 dB (0 = Butterworth)");
        }
        double sinhA = 1, coshA = 1;
        if (rippleDb > 0)
        {
            double epsilon = Math.Sqrt(Math.Pow(10, rippleDb / 10) - 1);
            double a = Math.Asinh(1 / epsilon) / order;
            sinhA = Math.Sinh(a);
            coshA = Math.Cosh(a);
        }
        var poles = new Complex[order];
        for (int k = 1; k <= order; k++)
        {
            double theta = (2 * k - 1) * Math.PI / (2 * order);
            poles[k - 1] = new Complex(-sinhA * Math.Sin(theta), coshA * Math.Cos(theta));
        }
        return poles;
    }

    /// <summary>Π(−p): the numerator that makes the prototype's gain 1 at DC.</summary>
    public static Complex DcGainNumerator(ReadOnlySpan<Complex> poles)
    {
        Complex k = Complex.One;
        foreach (Complex p in poles)
        {
            k *= -p;
        }
        return k;
    }

    /// <summary>
    /// H(jω) of the bandpass made by s → (s² + ω0²)/(B·s), plus uniform dissipation d (each prototype pole
    /// moved left by d = f0/(B·Qu) for resonators of unloaded Q Qu). On the jω axis the lowpass variable is
    /// S = d + j·(f0/B)·(f/f0 − f0/f), so magnitude, phase and group delay all come from one rational function.
    /// </summary>
    /// <param name="poles">Prototype poles.</param>
    /// <param name="numerator">Π(−p), see <see cref="DcGainNumerator"/>.</param>
    /// <param name="frequencyHz">Frequency, Hz, above 0.</param>
    /// <param name="geometricCentreHz">f0 = √(fL·fU), Hz.</param>
    /// <param name="bandwidthHz">B = fU − fL of the prototype band, Hz.</param>
    /// <param name="dissipation">d, 0 for lossless resonators.</param>
    public static Complex Evaluate(ReadOnlySpan<Complex> poles, Complex numerator, double frequencyHz,
        double geometricCentreHz, double bandwidthHz, double dissipation)
    {
        double x = geometricCentreHz / bandwidthHz * (frequencyHz / geometricCentreHz - geometricCentreHz / frequencyHz);
        var s = new Complex(dissipation, x);
        Complex denominator = Complex.One;
        foreach (Complex p in poles)
        {
            denominator *= s - p;
        }
        return numerator / denominator;
    }

    /// <summary>f0 = √(fc² − B²/4): the geometric centre whose band edges have arithmetic mean fc.</summary>
    public static double GeometricCentreHz(double arithmeticCentreHz, double bandwidthHz) =>
        Math.Sqrt(arithmeticCentreHz * arithmeticCentreHz - bandwidthHz * bandwidthHz / 4);
}
