using FilterQA.Core.Measurement;
using FilterQA.Core.Sweeps;
using static FilterQA.Core.Tests.Measurement.AnalyticBandpass;

namespace FilterQA.Core.Tests.Measurement;

public sealed class StopbandRejectionTests
{
    private const double F0Hz = 10.7e6;
    private const double BandwidthHz = 200e3;
    private const int Order = 6;
    private const double FloorDb = 95;

    // Butterworth order 6 (Zverev, from memory): 20·n·log10|Ω| dB far out, so Ω 2…3 (≈ 10.9–11.0 MHz) is 36–57 dB,
    // far above a 95 dB floor, while beyond Ω ≈ 11 (≈ 11.8 MHz) the filter is below 125 dB and only the floor is seen.
    private static double Loss(double f) => ButterworthLossDb(f, F0Hz, BandwidthHz, Order);

    private static readonly FrequencyBand NearStopband = new(F0Hz + 2 * BandwidthHz / 2 + 20e3, F0Hz + 3 * BandwidthHz / 2);
    private static readonly FrequencyBand FarStopband = new(11.8e6, 12.2e6);

    private static FrequencyGrid Grid() => FrequencyGrid.Linear(9.2e6, 12.2e6, 1601);

    [Fact]
    public void Dynamic_range_worked_example()
    {
        // DOMAIN 9.9 (worked example, computed): floor 95 dB below the thru, 10 dB margin → up to 85 dB verifiable;
        // an 80 dB reading is a plain number, a 90 dB reading is only "at least".
        Assert.Equal(85, NoiseFloor.VerifiableLossDb(95));
        Assert.False(NoiseFloor.IsFloorLimited(80, 95));
        Assert.False(NoiseFloor.IsFloorLimited(85, 95));
        Assert.True(NoiseFloor.IsFloorLimited(90, 95));
    }

    [Theory]
    [InlineData(80.0, false)]
    [InlineData(90.0, true)]
    public void Caller_floor_decides_floor_limited_as_the_worked_example(double stopbandLossDb, bool limited)
    {
        // DOMAIN 9.9: a flat stopband at 80 dB over a flat 95 dB floor is verifiable; at 90 dB it is floor-limited.
        var grid = FrequencyGrid.Linear(1e6, 2e6, 101);
        ResponseTrace trace = Trace(grid, f => f < 1.3e6 ? 2 : stopbandLossDb);
        double[] floor = Enumerable.Repeat(FloorDb, grid.Count).ToArray();
        var warnings = new List<MeasurementWarning>();

        StopbandResult result = StopbandRejection.Over(trace, new FrequencyBand(1.5e6, 2e6), floor, warnings);

        // Exact: sampled values; the power mean of a constant floor is the constant (rounding 1e-9 dB).
        Assert.Equal(limited, result.FloorLimited);
        Assert.Equal(stopbandLossDb, result.AbsoluteLossDb);
        Assert.Equal(stopbandLossDb - 2, result.MinRejectionDb!.Value, 1e-12);
        Assert.Equal(1.5e6, result.AtHz!.Value, 1e-6);
        Assert.Equal(FloorDb, result.FloorLossDb!.Value, 1e-9);
        Assert.Equal(limited, warnings.Any(w => w.Code == MeasurementWarningCodes.FloorLimited));
    }

    [Theory]
    [InlineData(11)]
    [InlineData(13)]
    [InlineData(15)]
    public void Noisy_floor_far_stopband_is_floor_limited_and_a_clean_near_stopband_is_not_with_a_measured_floor(int seed)
    {
        ResponseTrace trace = WithNoiseFloor(Grid(), Loss, FloorDb, seed);
        // The floor trace: the same instrument with no part (amplitude 0), an independent noise draw.
        ResponseTrace floorTrace = WithNoiseFloor(Grid(), _ => 400, FloorDb, seed + 1000);
        double[] floor = floorTrace.LossDb.ToArray();

        StopbandResult near = StopbandRejection.Over(trace, NearStopband, floor);
        StopbandResult far = StopbandRejection.Over(trace, FarStopband, floor);

        Assert.False(near.FloorLimited);
        Assert.True(far.FloorLimited);
        // The near reading is the filter's: the least loss sits at the band start, where the closed form gives it;
        // noise 95 dB down moves a ~36 dB reading by at most 20·log10(1 + 10^(−(95−36−13)/20)) < 0.05 dB (13 dB ≈ a 4.5σ peak).
        Assert.Equal(Loss(near.AtHz!.Value), near.AbsoluteLossDb!.Value, 0.05);
        Assert.InRange(near.AtHz!.Value, NearStopband.StartHz, NearStopband.StartHz + Grid().MaxStepHz);
    }

    [Theory]
    [InlineData(21)]
    [InlineData(23)]
    [InlineData(25)]
    public void Noisy_floor_far_stopband_is_floor_limited_and_a_clean_near_stopband_is_not_with_the_estimator(int seed)
    {
        ResponseTrace trace = WithNoiseFloor(Grid(), Loss, FloorDb, seed);
        var warnings = new List<MeasurementWarning>();

        StopbandResult near = StopbandRejection.Over(trace, NearStopband, default, warnings);
        StopbandResult far = StopbandRejection.Over(trace, FarStopband, default, warnings);

        Assert.False(near.FloorLimited);
        Assert.True(far.FloorLimited);
        Assert.Contains(warnings, w => w.Code == MeasurementWarningCodes.FloorEstimated);
        // The estimate is the noise power: a window of 64 points of |n|² (exponential) has a mean within ±5/√64 of its
        // expectation in relative terms (5σ), i.e. ±0.5 dB; choosing the deepest of ~10 independent windows biases it deep by
        // up to ~2σ more (≈ 1 dB). Tolerance 3 dB.
        Assert.Equal(FloorDb, far.FloorLossDb!.Value, 3.0);
    }

    [Fact]
    public void Estimator_sees_the_noise_and_its_level()
    {
        ResponseTrace trace = WithNoiseFloor(Grid(), Loss, FloorDb, seed: 31);

        NoiseFloorEstimate estimate = NoiseFloor.Estimate(trace)!;

        // Pure complex Gaussian noise in dB scatters with standard deviation (10/ln 10)·π/√6 = 5.57 dB (the log of an
        // exponential variable; standard result, from memory): far above the 1.94 dB threshold.
        Assert.True(estimate.NoiseSeen);
        Assert.InRange(estimate.ScatterDb, 3.0, 9.0);
        Assert.Equal(FloorDb, estimate.LossDb, 3.0);
        // The window lies in one of the two floor regions, where the closed form is below the floor: Ω beyond ±7 (from memory
        // of the prototype: 20·6·log10 7 = 101 dB), i.e. below about 9.9 MHz or above about 11.5 MHz.
        Assert.True(estimate.StopHz < 9.9e6 || estimate.StartHz > 11.5e6);
    }

    [Fact]
    public void Estimator_on_a_clean_trace_finds_no_noise_and_flags_nothing()
    {
        ResponseTrace trace = Trace(Grid(), Loss);
        var warnings = new List<MeasurementWarning>();

        StopbandResult far = StopbandRejection.Over(trace, FarStopband, default, warnings);
        NoiseFloorEstimate estimate = NoiseFloor.Estimate(trace)!;

        Assert.False(estimate.NoiseSeen);
        Assert.False(far.FloorLimited);
        // The deepest clean window is at the sweep top; the closed form there is below 125 dB, so the floor bound is deeper than 135 dB.
        Assert.True(estimate.LossDb > 125 + NoiseFloor.MarginDb);
        Assert.Contains(warnings, w => w.Code == MeasurementWarningCodes.FloorEstimated);
    }

    [Fact]
    public void Noise_scatter_threshold_follows_from_the_margin()
    {
        // Small complex noise at margin m scatters the dB reading with σ = (20/ln 10)·10^(−m/20)/√2 (first-order expansion
        // of 20·log10|1 + n|; derived). At m = 10 dB: 1.942 dB; the constant is rounded to 0.01 dB.
        double sigma = 20 / Math.Log(10) * Math.Pow(10, -NoiseFloor.MarginDb / 20) / Math.Sqrt(2);
        Assert.InRange(NoiseFloor.NoiseScatterThresholdDb, sigma - 0.005, sigma + 0.005);
    }

    [Fact]
    public void An_empty_stopband_has_null_readings()
    {
        ResponseTrace trace = Trace(FrequencyGrid.Linear(1e6, 2e6, 11), _ => 50);
        var warnings = new List<MeasurementWarning>();

        StopbandResult result = StopbandRejection.Over(trace, new FrequencyBand(3e6, 4e6), new double[11], warnings);

        Assert.Null(result.MinRejectionDb);
        Assert.Null(result.AbsoluteLossDb);
        Assert.Null(result.AtHz);
        Assert.Null(result.FloorLossDb);
        Assert.False(result.FloorLimited);
        Assert.Contains(warnings, w => w.Code == MeasurementWarningCodes.BandEmpty);
        Assert.Contains(warnings, w => w.Code == MeasurementWarningCodes.BandNotCovered);
    }

    [Fact]
    public void A_floor_trace_of_the_wrong_length_is_refused()
    {
        ResponseTrace trace = Trace(FrequencyGrid.Linear(1e6, 2e6, 11), _ => 50);

        var error = Assert.Throws<ArgumentException>(() => StopbandRejection.Over(trace, new FrequencyBand(1e6, 2e6), new double[10]));
        Assert.Contains("10 values for a grid of 11", error.Message, StringComparison.Ordinal);
    }
}
