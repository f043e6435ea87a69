using FilterQA.Core.Resonators;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Tests.Resonators;

/// <summary>The worked-example-2 crystal measured as a one-port: S11 = (Z − Z0)/(Z + Z0).</summary>
public sealed class OnePortTests
{
    private static Sweep OnePortCrystal(params MotionalArm[] arms) =>
        ResonatorSweeps.OnePort(CrystalCases.WideGrid, f => ResonatorSweeps.OnePortS11(ResonatorSweeps.Admittance(f, CrystalCases.C0F, arms)));

    [Fact]
    public void One_port_crystal_fit_recovers_the_BVD_parameters()
    {
        ResonatorMeasurement m = ResonatorAnalyzer.Measure(OnePortCrystal(CrystalCases.Arm()));

        // Exact model data: solver tolerance, as for the series fixture.
        Assert.Equal(CrystalCases.FsHz, m.SeriesHz!.Value, 1e-3);
        Assert.Equal(CrystalCases.FpHz, m.ParallelHz!.Value, 1e-3);
        Assert.Equal(CrystalCases.R1Ohm, m.R1Ohm!.Value, 1e-7 * CrystalCases.R1Ohm);
        Assert.Equal(CrystalCases.C0F, m.C0F!.Value, 1e-7 * CrystalCases.C0F);
        // One-port loading is Z0 alone: QL = 2π·fs·L1/(R1 + Z0) (DOMAIN 3 with Rext = Z0).
        double ql = 2 * Math.PI * CrystalCases.FsHz * CrystalCases.L1H / (CrystalCases.R1Ohm + ResonatorSweeps.Z0);
        Assert.Equal(ql, m.LoadedQ!.Value, 1e-7 * ql);
    }

    [Fact]
    public void One_port_notch_is_the_S11_dip_with_its_return_loss_and_there_is_no_peak()
    {
        ResonatorMeasurement m = ResonatorAnalyzer.Measure(OnePortCrystal(CrystalCases.Arm()));
        // At fs, Z = R1: |S11| = |R1 − Z0|/(R1 + Z0) = 40/60, return loss 3.522 dB (reflection formula).
        double returnLoss = -20 * Math.Log10(Math.Abs(CrystalCases.R1Ohm - ResonatorSweeps.Z0) / (CrystalCases.R1Ohm + ResonatorSweeps.Z0));

        Assert.Null(m.PeakHz);
        Assert.Null(m.PeakLossDb);
        // C0 across R1 moves the zero of reactance by ωC0·R1² = 0.03 ohm, i.e. 0.2 Hz; the parabola on a 40 Hz step
        // of a 754 Hz wide dip adds well under 1 Hz. Limit 5 Hz. The level moves by < 1e-4 dB; limit 0.001 dB.
        Assert.Equal(CrystalCases.FsHz, m.NotchHz!.Value, 5.0);
        Assert.Equal(returnLoss, m.NotchLossDb!.Value, 0.001);
        Assert.Empty(m.UnwantedModes);
    }

    [Fact]
    public void One_port_unwanted_dip_is_negative_when_weaker_than_the_main_dip()
    {
        // |S11| at a resonance is |R − Z0|/(R + Z0), so a dip weaker than the 10 ohm main one (0.667) needs R > 250 ohm.
        const double spurOhm = 400;
        MotionalArm spur = MotionalArm.At(10.035e6, spurOhm, 2 * CrystalCases.L1H);
        ResonatorMeasurement m = ResonatorAnalyzer.Measure(OnePortCrystal(CrystalCases.Arm(), spur));
        double z0 = ResonatorSweeps.Z0;
        // relativeDb = 20·log10|S11|main − 20·log10|S11|mode, with |S11| = |R − Z0|/(R + Z0) at each resonance.
        double expected = 20 * Math.Log10((z0 - CrystalCases.R1Ohm) / (z0 + CrystalCases.R1Ohm)) - 20 * Math.Log10((spurOhm - z0) / (spurOhm + z0));

        UnwantedMode mode = Assert.Single(m.UnwantedModes);
        Assert.True(expected < 0); // the 400 ohm mode reflects more (a shallower dip) than the 10 ohm main mode
        // The other arm and C0 change |S11| at each dip by < 1e-3 relative; limit 0.02 dB.
        Assert.Equal(expected, mode.RelativeDb, 0.02);
        Assert.Equal(10.035e6, mode.Hz, 40.0);
        Assert.Equal(CrystalCases.R1Ohm, m.R1Ohm!.Value, 1e-6 * CrystalCases.R1Ohm); // spur modelled as an arm: exact-data tolerance
    }

    [Fact]
    public void Magnitude_only_one_port_reports_the_dip_only_with_a_warning()
    {
        ResponseTrace full = ResponseTrace.Primary(OnePortCrystal(CrystalCases.Arm()));
        ResponseTrace magnitude = ResponseTrace.Create(full.Grid, ResponsePath.InputReflection, full.LossDb);

        ResonatorMeasurement m = ResonatorAnalyzer.Measure(magnitude, ResonatorSweeps.Z0, ResonatorFixture.OnePortReflection);

        Assert.True(m.HasWarning(ResonatorWarningCode.MagnitudeOnlyNotFitted));
        Assert.NotNull(m.NotchHz);
        Assert.NotNull(m.NotchLossDb);
        Assert.Null(m.SeriesHz);
        Assert.Null(m.R1Ohm);
        Assert.Null(m.UnloadedQ);
    }
}
