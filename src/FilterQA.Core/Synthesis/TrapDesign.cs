using System.Numerics;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Synthesis;

/// <summary>
/// A series LC trap shunted to ground: notch at f0 = 1/(2π√(LC)), characteristic impedance √(L/C), coil Q
/// (R = √(L/C)/Q). Spreads are standard deviations of Gaussians truncated at ±4σ.
/// </summary>
internal sealed class TrapDesign : PartDesign
{
    private static readonly DefectKind[] DefectList = [DefectKind.CentreDrift, DefectKind.LowRejection, DefectKind.HighLoss];

    public required double NotchHz { get; init; }
    public required double CharacteristicOhm { get; init; }
    public required double Q { get; init; }
    public required double LSigmaRelative { get; init; }
    public required double CSigmaRelative { get; init; }
    public required double RSigmaRelative { get; init; }

    /// <summary>Port reference impedance, ohm.</summary>
    public double Z0Ohm { get; init; } = 50;

    /// <summary><see cref="DefectKind.CentreDrift"/>: signed notch shift, Hz, keeping √(L/C).</summary>
    public required double DriftHz { get; init; }

    /// <summary><see cref="DefectKind.LowRejection"/>: series resistance, ohm (shallow notch).</summary>
    public required double DefectROhm { get; init; }

    /// <summary><see cref="DefectKind.HighLoss"/>: characteristic impedance, ohm (too low: the trap loads the line off the notch).</summary>
    public required double DefectCharacteristicOhm { get; init; }

    public override IReadOnlyList<DefectKind> Defects => DefectList;

    /// <summary>Draws R, L and C of one unit (ohm, henry, farad).</summary>
    internal (double ROhm, double LH, double CF) Draw(ref DeterministicRandom parameters, DefectKind defect)
    {
        double lZ = parameters.NextTruncatedNormal();
        double cZ = parameters.NextTruncatedNormal();
        double rZ = parameters.NextTruncatedNormal();
        double notch = NotchHz + (defect == DefectKind.CentreDrift ? DriftHz : 0);
        double zc = defect == DefectKind.HighLoss ? DefectCharacteristicOhm : CharacteristicOhm;
        double omega = 2 * Math.PI * notch;
        double l = zc / omega * (1 + LSigmaRelative * lZ);
        double c = 1 / (omega * zc) * (1 + CSigmaRelative * cZ);
        double r = defect == DefectKind.LowRejection ? DefectROhm * (1 + RSigmaRelative * rZ) : zc / Q * (1 + RSigmaRelative * rZ);
        return (r, l, c);
    }

    public override void Synthesise(FrequencyGrid grid, ref DeterministicRandom parameters, DefectKind defect,
        Span<Complex> s11, Span<Complex> s21, Span<Complex> s22)
    {
        (double r, double l, double c) = Draw(ref parameters, defect);
        TrapResponse.Fill(grid.Hz, r, l, c, Z0Ohm, s11, s21, s22);
    }
}
