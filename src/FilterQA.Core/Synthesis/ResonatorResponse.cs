using System.Numerics;

namespace FilterQA.Core.Synthesis;

/// <summary>
/// A crystal (Butterworth–Van Dyke: motional arms in parallel with C0) between two ports in series:
/// S21 = S12 = 2Z0/(2Z0 + Z), S11 = S22 = Z/(Z + 2Z0) (series impedance between equal terminations).
/// </summary>
internal static class ResonatorResponse
{
    /// <summary>Impedance of C0 in parallel with every arm at <paramref name="frequencyHz"/>, ohm.</summary>
    public static Complex Impedance(double frequencyHz, double c0F, ReadOnlySpan<MotionalArm> arms)
    {
        double omega = 2 * Math.PI * frequencyHz;
        Complex admittance = new(0, omega * c0F);
        foreach (MotionalArm arm in arms)
        {
            admittance += Complex.One / new Complex(arm.ROhm, omega * arm.LH - 1 / (omega * arm.CF));
        }
        return Complex.One / admittance;
    }

    /// <summary>Writes the fixture's S-parameters at every frequency.</summary>
    public static void Fill(ReadOnlySpan<double> hz, double c0F, ReadOnlySpan<MotionalArm> arms, double z0Ohm,
        Span<Complex> s11, Span<Complex> s21, Span<Complex> s22)
    {
        for (int i = 0; i < hz.Length; i++)
        {
            Complex z = Impedance(hz[i], c0F, arms);
            Complex total = z + 2 * z0Ohm;
            s21[i] = 2 * z0Ohm / total;
            s11[i] = z / total;
            s22[i] = s11[i];
        }
    }
}
