using FilterQA.Core.Resonators;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Tests.Resonators;

/// <summary>Fits of crystals in the series-through fixture (Butterworth–Van Dyke model; DOMAIN worked examples 2 and 3).</summary>
public sealed class CrystalFitTests
{
    private static ResonatorMeasurement MeasureCrystal(double r1Ohm = CrystalCases.R1Ohm, double noiseRms = 0, int seed = 1, FrequencyGrid? grid = null) =>
        ResonatorAnalyzer.Measure(ResonatorSweeps.SeriesCrystal(grid ?? CrystalCases.WideGrid, CrystalCases.C0F, [CrystalCases.Arm(r1Ohm)], noiseRms, seed));

    [Fact]
    public void Worked_example_2_values_follow_from_the_BVD_formulas()
    {
        // The formulas the fit is judged by, checked against the printed worked example 2 first.
        Assert.Equal(12.665e-3, CrystalCases.L1H, 0.0005e-3);       // L1 = 12.665 mH, printed to 1 uH
        Assert.Equal(10.019980e6, CrystalCases.FpHz, 0.5);          // fp = 10.019980 MHz, printed to 1 Hz
        double q = 1 / (2 * Math.PI * CrystalCases.FsHz * CrystalCases.C1F * CrystalCases.R1Ohm);
        Assert.Equal(79577, q, 0.5);                                // Q = 79 577, printed to the unit
    }

    [Fact]
    public void Fit_recovers_fs_fp_and_Q_of_worked_example_2()
    {
        ResonatorMeasurement m = MeasureCrystal();
        double q = 1 / (2 * Math.PI * CrystalCases.FsHz * CrystalCases.C1F * CrystalCases.R1Ohm); // BVD: Q = 1/(2π·fs·C1·R1)

        // Exact model data: the solver stops within ~1e-12 relative; 1e-3 Hz is 1e-10 of fs and still leaves margin.
        Assert.Equal(CrystalCases.FsHz, m.SeriesHz!.Value, 1e-3);
        Assert.Equal(CrystalCases.FpHz, m.ParallelHz!.Value, 1e-3);
        Assert.Equal(q, m.UnloadedQ!.Value, q * 1e-7);
        Assert.Equal(CrystalCases.R1Ohm, m.R1Ohm!.Value, CrystalCases.R1Ohm * 1e-7);
        Assert.Equal(CrystalCases.L1H, m.L1H!.Value, CrystalCases.L1H * 1e-7);
        Assert.Equal(CrystalCases.C1F, m.C1F!.Value, CrystalCases.C1F * 1e-7);
        Assert.Equal(CrystalCases.C0F, m.C0F!.Value, CrystalCases.C0F * 1e-7);
        // Loaded Q in the series fixture: 2π·fs·L1/(R1 + 2·Z0) (DOMAIN 3).
        double ql = 2 * Math.PI * CrystalCases.FsHz * CrystalCases.L1H / (CrystalCases.R1Ohm + 2 * ResonatorSweeps.Z0);
        Assert.Equal(ql, m.LoadedQ!.Value, ql * 1e-7);
        Assert.Empty(m.Warnings);
    }

    [Fact]
    public void Peak_is_near_fs_and_the_notch_near_fp_but_neither_is_reported_as_fs_or_fp()
    {
        ResonatorMeasurement m = MeasureCrystal();

        // The |S21| peak of a series fixture is about fm, which lies below fs (DOMAIN 3: fm < fs < fr < fa < fp < fn).
        Assert.True(m.PeakHz < m.SeriesHz, $"peak {m.PeakHz} Hz should lie below fs {m.SeriesHz} Hz");
        Assert.Equal(CrystalCases.FsHz, m.PeakHz!.Value, 40.0); // within one 40 Hz step of fs
        Assert.Equal(CrystalCases.FpHz, m.NotchHz!.Value, 40.0); // the |S21| minimum is about fn, within a step of fp here
        Assert.NotEqual(m.PeakHz, m.SeriesHz);
    }

    [Fact]
    public void Worked_example_3_series_fixture_with_R1_of_20_ohm()
    {
        ResonatorMeasurement m = MeasureCrystal(r1Ohm: 20);
        double z0 = ResonatorSweeps.Z0;
        double s21Peak = 2 * z0 / (2 * z0 + 20); // DOMAIN 3: R1 = 2Z0(1/|S21| − 1) inverted
        double ws = 2 * Math.PI * CrystalCases.FsHz;

        // Worked example 3: |S21| = 0.8333 (−1.584 dB), QL = 6 631, Qu = 39 789, B3dB = 1 508 Hz, each printed to its last digit.
        Assert.Equal(0.8333, s21Peak, 0.00005);
        Assert.Equal(1.584, -20 * Math.Log10(s21Peak), 0.0005);
        // With C0 across R1 the true |S21| maximum sits a little below fs where Re Z ≈ R1·(1 + 2ωC0·X) < R1, about
        // 0.0005 dB above the R1-only value. Expected: the maximum of the BVD formula found on a 0.01 Hz grid.
        double truePeakLoss = Enumerable.Range(-20000, 40001)
            .Select(k => -20 * Math.Log10(ResonatorSweeps.SeriesS21(ResonatorSweeps.Admittance(CrystalCases.FsHz + 0.01 * k, CrystalCases.C0F, CrystalCases.Arm(20))).Magnitude))
            .Min();
        Assert.Equal(1.584, truePeakLoss, 0.0011); // still the worked example's figure to within the C0 shift
        // Parabola on a 40 Hz step of a 1 508 Hz wide peak: the Lorentzian's quartic term leaves < 1e-5 dB.
        Assert.Equal(truePeakLoss, m.PeakLossDb!.Value, 1e-5);
        Assert.Equal(6631, m.LoadedQ!.Value, 0.5);
        Assert.Equal(39789, m.UnloadedQ!.Value, 0.5);
        Assert.Equal(1508, CrystalCases.FsHz / m.LoadedQ.Value, 0.5);
        // And against the formulas (exact data, solver tolerance 1e-7 relative).
        Assert.Equal(ws * CrystalCases.L1H / (20 + 2 * z0), m.LoadedQ.Value, 1e-7 * m.LoadedQ.Value);
        Assert.Equal(m.LoadedQ.Value / (1 - s21Peak), m.UnloadedQ.Value, 1e-7 * m.UnloadedQ.Value); // Qu = QL/(1 − |S21|peak)
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    public void Fit_with_seeded_noise_stays_within_the_noise_limited_tolerance(int seed)
    {
        // Complex noise of RMS 1e-3 on S21 (−60 dB), a fresh seeded draw per row.
        ResonatorMeasurement m = MeasureCrystal(noiseRms: 1e-3, seed: seed);
        double q = 1 / (2 * Math.PI * CrystalCases.FsHz * CrystalCases.C1F * CrystalCases.R1Ohm);

        // Tolerances from a Lorentzian estimate of the fit's standard error with σ = 1e-3, B = 1 382 Hz, step h = 40 Hz:
        // σ(fs) ≈ σ·√(B·h/2π)/|S21|peak ≈ 0.1 Hz; σ(R1)/R1 ≈ σ/(√(πB/2h)·|S21|(1 − |S21|)) ≈ 0.2 %. Limits are ~10σ and ~5σ.
        Assert.Equal(CrystalCases.FsHz, m.SeriesHz!.Value, 1.0);
        Assert.Equal(CrystalCases.R1Ohm, m.R1Ohm!.Value, 0.01 * CrystalCases.R1Ohm);
        Assert.Equal(q, m.UnloadedQ!.Value, 0.01 * q);
        // C0 is seen across the whole 80 kHz span at |S21| ~ −30 dB, 30 dB above the noise: σ(C0)/C0 ~ 1e-3; limit 0.5 %.
        Assert.Equal(CrystalCases.C0F, m.C0F!.Value, 0.005 * CrystalCases.C0F);
        // fp − fs = 20 kHz scales with C1/C0, so 0.25 % on the ratio moves fp by 50 Hz.
        Assert.Equal(CrystalCases.FpHz, m.ParallelHz!.Value, 50.0);
        Assert.False(m.HasWarning(ResonatorWarningCode.FitPoorResidual));
        Assert.False(m.HasWarning(ResonatorWarningCode.FitNotConverged));
        // Noise at the bottom of the −80 dB notch must not be reported as unwanted modes.
        Assert.Empty(m.UnwantedModes);
    }

    [Fact]
    public void Span_that_stops_short_of_fp_reports_no_C0_but_still_fits_the_motional_arm()
    {
        // 9.99..10.01 MHz: fp = 10.01998 MHz lies outside.
        ResonatorMeasurement m = MeasureCrystal(grid: FrequencyGrid.Linear(9.99e6, 10.01e6, 2001));

        Assert.Null(m.C0F);
        Assert.Null(m.ParallelHz);
        Assert.True(m.HasWarning(ResonatorWarningCode.NoAntiresonance));
        // C0 is still fitted internally, so fs and R1 are not biased by it: exact-data tolerance as above.
        Assert.Equal(CrystalCases.FsHz, m.SeriesHz!.Value, 1e-3);
        Assert.Equal(CrystalCases.R1Ohm, m.R1Ohm!.Value, CrystalCases.R1Ohm * 1e-7);
    }

    [Fact]
    public void Magnitude_only_series_trace_is_fitted_on_S21_magnitude()
    {
        Sweep sweep = ResonatorSweeps.SeriesCrystal(CrystalCases.WideGrid, CrystalCases.C0F, [CrystalCases.Arm()]);
        var gain = ResponseTrace.Primary(sweep).LossDb.ToArray().Select(loss => -loss).ToArray();
        Sweep scalar = Sweep.FromScalar(ScalarTrace.Create(CrystalCases.WideGrid, ScalarQuantity.GainDb, gain), SweepSource.Of("crystal.csv", SweepFormat.DelimitedText));

        ResonatorMeasurement m = ResonatorAnalyzer.Measure(scalar);

        // |S21| alone determines fs, R1, Q and C0 of a series fixture; exact data, solver tolerance 1e-6 relative.
        Assert.Equal(CrystalCases.FsHz, m.SeriesHz!.Value, 0.01);
        Assert.Equal(CrystalCases.R1Ohm, m.R1Ohm!.Value, 1e-6 * CrystalCases.R1Ohm);
        Assert.Equal(CrystalCases.C0F, m.C0F!.Value, 1e-6 * CrystalCases.C0F);
        Assert.Equal(CrystalCases.FpHz, m.ParallelHz!.Value, 0.01);
        Assert.False(m.HasWarning(ResonatorWarningCode.MagnitudeOnlyNotFitted));
    }
}
