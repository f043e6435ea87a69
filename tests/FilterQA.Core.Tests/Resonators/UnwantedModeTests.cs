using FilterQA.Core.Resonators;

namespace FilterQA.Core.Tests.Resonators;

/// <summary>A second motional arm (an unwanted mode) beside the crystal of worked example 2.</summary>
public sealed class UnwantedModeTests
{
    [Theory]
    [InlineData(10.035e6, 60.0)]  // above fp
    [InlineData(10.012e6, 60.0)]  // between fs and fp
    [InlineData(10.040e6, 200.0)] // weaker, well above fp
    public void Unwanted_mode_is_reported_and_does_not_spoil_the_main_fit(double spurHz, double spurOhm)
    {
        MotionalArm spur = MotionalArm.At(spurHz, spurOhm, 2 * CrystalCases.L1H);
        ResonatorMeasurement m = ResonatorAnalyzer.Measure(
            ResonatorSweeps.SeriesCrystal(CrystalCases.WideGrid, CrystalCases.C0F, [CrystalCases.Arm(), spur]));
        double twoZ0 = 2 * ResonatorSweeps.Z0;

        UnwantedMode mode = Assert.Single(m.UnwantedModes);
        // DOMAIN 3 (computed): in a 2Z0 fixture the mode lies 20·log10((R_spur + 2Z0)/(R1 + 2Z0)) dB below the main peak.
        // The main arm and C0 add at most ~2e-4 to |S21| at the mode (in quadrature), i.e. < 0.002 dB; the parabola
        // on a 40 Hz step of a ~1 kHz wide peak adds < 0.005 dB. Limit 0.02 dB.
        Assert.Equal(20 * Math.Log10((CrystalCases.R1Ohm + twoZ0) / (spurOhm + twoZ0)), mode.RelativeDb, 0.02);
        Assert.Equal(spurHz, mode.Hz, 40.0); // within one step
        Assert.True(mode.RelativeDb < 0);

        // The mode is modelled as its own arm, so the main fit keeps the exact-data tolerance of the clean crystal.
        Assert.Equal(CrystalCases.FsHz, m.SeriesHz!.Value, 1e-3);
        Assert.Equal(CrystalCases.R1Ohm, m.R1Ohm!.Value, 1e-6 * CrystalCases.R1Ohm);
        Assert.Equal(CrystalCases.C0F, m.C0F!.Value, 1e-6 * CrystalCases.C0F);
        Assert.Equal(CrystalCases.FpHz, m.ParallelHz!.Value, 1e-2);
        Assert.False(m.HasWarning(ResonatorWarningCode.FitPoorResidual));
    }

    [Fact]
    public void Without_arms_for_modes_an_unwanted_mode_biases_the_fit_which_is_why_they_are_modelled()
    {
        // The same crystal and spur with modelling switched off: the fit must visibly degrade, proving the
        // arm model above is doing the work (and that this check can fail).
        MotionalArm spur = MotionalArm.At(10.035e6, 60, 2 * CrystalCases.L1H);
        var sweep = ResonatorSweeps.SeriesCrystal(CrystalCases.WideGrid, CrystalCases.C0F, [CrystalCases.Arm(), spur]);

        ResonatorMeasurement m = ResonatorAnalyzer.Measure(sweep, new ResonatorOptions { MaxModeArms = 0 });

        Assert.True(m.HasWarning(ResonatorWarningCode.ModesNotModelled));
        Assert.True(m.HasWarning(ResonatorWarningCode.FitPoorResidual));
    }
}
