using FilterQA.Core.Resonators;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Tests.Resonators;

/// <summary>A series LC in the 50 ohm series-through fixture: DOMAIN worked example 1 (computed).</summary>
public sealed class SeriesLcTests
{
    private const double L = 2.2e-6, C = 100e-12, R = 1;

    private static ResonatorMeasurement Measure() =>
        ResonatorAnalyzer.Measure(ResonatorSweeps.SeriesCrystal(FrequencyGrid.Linear(1e6, 40e6, 2001), 0, [new MotionalArm(R, L, C)]));

    [Fact]
    public void Fitted_series_resonance_is_f0_of_the_LC()
    {
        ResonatorMeasurement m = Measure();
        double f0 = 1 / (2 * Math.PI * Math.Sqrt(L * C)); // series resonance f0 = 1/(2π√(LC)), handbook formula

        // Worked example 1: f0 = 10.730 MHz, printed to 1 kHz, so ±0.5 kHz.
        Assert.Equal(10.730e6, f0, 500.0);
        // Exact model data: only the solver's convergence limits the fit; 1e-9 relative is far inside it.
        Assert.Equal(f0, m.SeriesHz!.Value, f0 * 1e-9);
        Assert.Equal(R, m.R1Ohm!.Value, R * 1e-6);
        Assert.Equal(L, m.L1H!.Value, L * 1e-6);
        Assert.Equal(C, m.C1F!.Value, C * 1e-6);
    }

    [Fact]
    public void Unloaded_and_loaded_Q_match_worked_example_1()
    {
        ResonatorMeasurement m = Measure();
        double x0 = Math.Sqrt(L / C); // reactance at f0, ohm: worked example 1 gives 148.3
        Assert.Equal(148.3, x0, 0.05); // printed to 0.1 ohm

        // Q = X/R = 148 (worked example 1, printed to the unit: ±0.5); QL = X/(R + 2·Z0) = 148.3/101 = 1.47 (±0.005).
        Assert.Equal(148, m.UnloadedQ!.Value, 0.5);
        Assert.Equal(1.47, m.LoadedQ!.Value, 0.005);
        // Against the formulas themselves: exact data, solver tolerance 1e-6 relative.
        Assert.Equal(x0 / R, m.UnloadedQ.Value, x0 / R * 1e-6);
        Assert.Equal(x0 / (R + 2 * ResonatorSweeps.Z0), m.LoadedQ.Value, 1e-6);
    }

    [Fact]
    public void A_series_LC_has_no_antiresonance_so_C0_and_fp_are_null()
    {
        ResonatorMeasurement m = Measure();

        Assert.Null(m.C0F);
        Assert.Null(m.ParallelHz);
        Assert.True(m.HasWarning(ResonatorWarningCode.NoAntiresonance));
        // |S21| falls monotonically to both ends of the span: there is no interior notch.
        Assert.Null(m.NotchHz);
        Assert.Null(m.NotchLossDb);
        Assert.Empty(m.UnwantedModes);
    }

    [Fact]
    public void Peak_is_at_f0_with_the_loss_of_R_in_the_fixture()
    {
        ResonatorMeasurement m = Measure();
        double f0 = 1 / (2 * Math.PI * Math.Sqrt(L * C));
        // At X = 0: S21 = 2Z0/(2Z0 + R) (series fixture formula), loss −20·log10 of it = 0.0864 dB.
        double expectedLoss = -20 * Math.Log10(2 * ResonatorSweeps.Z0 / (2 * ResonatorSweeps.Z0 + R));

        // The 19.5 kHz step is 1/375 of the 7.31 MHz width; the parabola through 3 points of so broad a peak
        // lands within 100 Hz (0.5 % of a step) even though the LC response is not symmetric in frequency.
        Assert.Equal(f0, m.PeakHz!.Value, 100.0);
        Assert.Equal(expectedLoss, m.PeakLossDb!.Value, 1e-6); // flat top: the level error is second order, < 1e-6 dB
    }
}
