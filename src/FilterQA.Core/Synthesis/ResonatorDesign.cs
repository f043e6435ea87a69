using System.Numerics;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Synthesis;

/// <summary>
/// A crystal resonator demo part: Butterworth–Van Dyke main arm (fs, R1, C1; L1 = 1/((2π·fs)²·C1)), C0, and
/// unwanted-mode arms above fs, in a series fixture between two <see cref="FixtureZ0Ohm"/> ports.
/// Spreads are standard deviations of Gaussians truncated at ±4σ.
/// </summary>
internal sealed class ResonatorDesign : PartDesign
{
    private static readonly DefectKind[] DefectList = [DefectKind.CentreDrift, DefectKind.StrongUnwantedMode, DefectKind.HighLoss];

    public required double FsHz { get; init; }
    public required double FsSigmaPpm { get; init; }
    public required double R1Ohm { get; init; }
    public required double R1SigmaOhm { get; init; }
    public required double C1F { get; init; }
    public required double C1SigmaRelative { get; init; }
    public required double C0F { get; init; }
    public required double C0SigmaF { get; init; }
    public required IReadOnlyList<UnwantedModeDesign> Modes { get; init; }

    /// <summary>Each port's reference impedance, ohm; the crystal sees 2·Z0.</summary>
    public double FixtureZ0Ohm { get; init; } = 50;

    /// <summary><see cref="DefectKind.CentreDrift"/>: fs shift, ppm (sign drawn per unit).</summary>
    public required double DriftPpm { get; init; }

    /// <summary><see cref="DefectKind.HighLoss"/>: R1, ohm, and its spread.</summary>
    public required double DefectR1Ohm { get; init; }
    public required double DefectR1SigmaOhm { get; init; }

    /// <summary>
    /// <see cref="DefectKind.StrongUnwantedMode"/>: the first mode's level below the main response, dB, in the
    /// 2·Z0 fixture: its resistance becomes (R1 + 2Z0)·10^(dB/20) − 2Z0.
    /// </summary>
    public required double StrongModeBelowDb { get; init; }

    public override IReadOnlyList<DefectKind> Defects => DefectList;

    /// <summary>Draws the arms and C0 of one unit (used by <see cref="Synthesise"/>; visible to tests).</summary>
    internal (double C0F, MotionalArm[] Arms) Draw(ref DeterministicRandom parameters, DefectKind defect)
    {
        double fsZ = parameters.NextTruncatedNormal();
        double r1Z = parameters.NextTruncatedNormal();
        double c1Z = parameters.NextTruncatedNormal();
        double c0Z = parameters.NextTruncatedNormal();
        double driftSign = parameters.NextDouble() < 0.5 ? -1.0 : 1.0;

        double ppm = FsSigmaPpm * fsZ + (defect == DefectKind.CentreDrift ? driftSign * DriftPpm : 0);
        double fs = FsHz * (1 + ppm * 1e-6);
        double r1 = defect == DefectKind.HighLoss ? DefectR1Ohm + DefectR1SigmaOhm * r1Z : R1Ohm + R1SigmaOhm * r1Z;
        double c1 = C1F * (1 + C1SigmaRelative * c1Z);
        double l1 = 1 / (Math.Pow(2 * Math.PI * fs, 2) * c1);
        double c0 = C0F + C0SigmaF * c0Z;

        var arms = new MotionalArm[1 + Modes.Count];
        arms[0] = new MotionalArm(r1, l1, c1);
        for (int k = 0; k < Modes.Count; k++)
        {
            UnwantedModeDesign mode = Modes[k];
            double offsetZ = parameters.NextTruncatedNormal();
            double rZ = parameters.NextTruncatedNormal();
            double f = fs + mode.OffsetHz + mode.OffsetSigmaHz * offsetZ;
            double r = mode.ROhm * (1 + mode.RSigmaRelative * rZ);
            if (k == 0 && defect == DefectKind.StrongUnwantedMode)
            {
                double load = 2 * FixtureZ0Ohm;
                r = (r1 + load) * Math.Pow(10, StrongModeBelowDb / 20) - load;
            }
            double l = l1 * mode.InductanceRatio;
            arms[k + 1] = new MotionalArm(r, l, 1 / (Math.Pow(2 * Math.PI * f, 2) * l));
        }
        return (c0, arms);
    }

    public override void Synthesise(FrequencyGrid grid, ref DeterministicRandom parameters, DefectKind defect,
        Span<Complex> s11, Span<Complex> s21, Span<Complex> s22)
    {
        (double c0, MotionalArm[] arms) = Draw(ref parameters, defect);
        ResonatorResponse.Fill(grid.Hz, c0, arms, FixtureZ0Ohm, s11, s21, s22);
    }
}
