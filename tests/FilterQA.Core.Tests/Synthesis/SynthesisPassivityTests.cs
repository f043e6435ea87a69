using System.Numerics;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Synthesis;

namespace FilterQA.Core.Tests.Synthesis;

public class SynthesisPassivityTests
{
    public static TheoryData<string, DefectKind> PartsAndDefects()
    {
        var data = new TheoryData<string, DefectKind>();
        foreach (DemoPart part in DemoParts.All)
        {
            data.Add(part.PartNumber, DefectKind.None);
            foreach (DefectKind defect in part.Defects)
            {
                data.Add(part.PartNumber, defect);
            }
        }
        return data;
    }

    // A passive two-port cannot deliver more power than it receives: for each incident port the column sum
    // |S11|² + |S21|² (and |S22|² + |S12|²) is at most 1 (Pozar, Microwave Engineering, 4th ed., §4.3: unitary
    // S for lossless, ≤ 1 for lossy networks). Tolerance 1e-12: rounding of a few double operations near 1.
    [Theory]
    [MemberData(nameof(PartsAndDefects))]
    public void Every_column_is_passive_at_every_point(string partNumber, DefectKind defect)
    {
        DemoPart part = DemoParts.Get(partNumber);
        var synthesiser = new UnitSynthesiser(2611);
        for (int serial = 1; serial <= 4; serial++)
        {
            NetworkData s = synthesiser.Unit(part, serial, defect).Network!;
            ReadOnlySpan<Complex> s11 = s.Trace(1, 1), s21 = s.Trace(2, 1), s12 = s.Trace(1, 2), s22 = s.Trace(2, 2);
            for (int i = 0; i < s.Grid.Count; i++)
            {
                double column1 = Power(s11[i]) + Power(s21[i]);
                double column2 = Power(s22[i]) + Power(s12[i]);
                Assert.True(column1 <= 1 + 1e-12, $"{partNumber} S{serial}: |S11|²+|S21|² = {column1} at {s.Grid[i]} Hz");
                Assert.True(column2 <= 1 + 1e-12, $"{partNumber} S{serial}: |S22|²+|S12|² = {column2} at {s.Grid[i]} Hz");
            }
        }
    }

    private static double Power(Complex z) => z.Real * z.Real + z.Imaginary * z.Imaginary;
}
