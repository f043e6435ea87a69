using System.Numerics;

namespace FilterQA.Core.Synthesis;

/// <summary>
/// A series R–L–C shunted to ground across a through line: with Z = R + jωL + 1/(jωC),
/// S21 = S12 = 2Z/(2Z + Z0), S11 = S22 = −Z0/(2Z + Z0) (shunt impedance between equal terminations).
/// </summary>
internal static class TrapResponse
{
    public static void Fill(ReadOnlySpan<double> hz, double rOhm, double lH, double cF, double z0Ohm,
        Span<Complex> s11, Span<Complex> s21, Span<Complex> s22)
    {
        for (int i = 0; i < hz.Length; i++)
        {
            double omega = 2 * Math.PI * hz[i];
            var z = new Complex(rOhm, omega * lH - 1 / (omega * cF));
            Complex total = 2 * z + z0Ohm;
            s21[i] = 2 * z / total;
            s11[i] = -z0Ohm / total;
            s22[i] = s11[i];
        }
    }
}
