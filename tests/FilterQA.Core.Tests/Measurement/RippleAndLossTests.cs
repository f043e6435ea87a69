using FilterQA.Core.Measurement;
using FilterQA.Core.Sweeps;
using static FilterQA.Core.Tests.Measurement.AnalyticBandpass;

namespace FilterQA.Core.Tests.Measurement;

public sealed class RippleAndLossTests
{
    private const double F0Hz = 70e6;
    private const double BandwidthHz = 1.2e6;

    [Theory]
    [InlineData(3, 0.5)]
    [InlineData(4, 1.0)]
    [InlineData(5, 0.1)]
    public void Chebyshev_ripple_over_the_ripple_band_equals_the_ripple_parameter(int order, double rippleDb)
    {
        var grid = FrequencyGrid.Linear(F0Hz - 2 * BandwidthHz, F0Hz + 2 * BandwidthHz, 8001);
        double Loss(double f) => ChebyshevLossDb(f, F0Hz, BandwidthHz, order, rippleDb);
        ResponseTrace trace = Trace(grid, Loss);
        // The ripple band is Ω ∈ [−1, 1]: f = ∓B/2 + √((B/2)² + f0²) (Chebyshev prototype, Zverev, from memory).
        (double lower, double upper) = EdgesHz(1, F0Hz, BandwidthHz);

        double? ripple = PassbandRipple.Over(trace, new FrequencyBand(lower, upper));

        // Equiripple: loss swings between 0 (T_n = 0) and the ripple (|T_n| = 1). Sampling a smooth extremum within h/2
        // misses it by at most ½|L''|(h/2)²; with the largest |L''| in the band (from the closed form) on both ends.
        double h = grid.MaxStepHz, curvature = 0;
        for (double f = lower; f <= upper; f += h)
        {
            curvature = Math.Max(curvature, Math.Abs(Loss(f + h) - 2 * Loss(f) + Loss(f - h)) / (h * h));
        }
        double tolerance = 2 * 0.5 * curvature * (h / 2) * (h / 2) + 1e-12;
        Assert.InRange(ripple!.Value, rippleDb - tolerance, rippleDb + tolerance);
    }

    [Fact]
    public void Band_rule_counts_points_within_one_part_in_a_billion_of_the_edges_and_no_further()
    {
        // The band rule (fixed contract): start·(1 − 1e-9) ≤ f ≤ stop·(1 + 1e-9). Points just inside carry 1.0 and 2.0 dB;
        // points just outside carry 50 and 60 dB, which would dominate the ripple if they were counted.
        double[] hz = [1e6 * (1 - 2e-9), 1e6 * (1 - 0.5e-9), 1.5e6, 2e6 * (1 + 0.5e-9), 2e6 * (1 + 2e-9)];
        double[] loss = [50, 1.0, 2.0, 1.5, 60];
        ResponseTrace trace = ResponseTrace.Create(FrequencyGrid.FromHz(hz), ResponsePath.Transmission, loss);

        double? ripple = PassbandRipple.Over(trace, new FrequencyBand(1e6, 2e6));

        // 2.0 − 1.0, exact in binary floating point.
        Assert.Equal(1.0, ripple);
        Assert.True(new FrequencyBand(1e6, 2e6).Contains(1e6 * (1 - 0.5e-9)));
        Assert.False(new FrequencyBand(1e6, 2e6).Contains(1e6 * (1 - 2e-9)));
    }

    [Fact]
    public void A_band_between_two_points_is_empty_null_and_warned()
    {
        ResponseTrace trace = Trace(FrequencyGrid.Linear(1e6, 2e6, 11), f => f / 1e6);
        var warnings = new List<MeasurementWarning>();

        double? ripple = PassbandRipple.Over(trace, new FrequencyBand(1.01e6, 1.09e6), warnings);

        Assert.Null(ripple);
        Assert.Equal([MeasurementWarningCodes.BandEmpty], warnings.Select(w => w.Code));
    }

    [Fact]
    public void A_band_beyond_the_sweep_is_warned_and_uses_the_points_inside()
    {
        ResponseTrace trace = Trace(FrequencyGrid.Linear(1e6, 2e6, 11), f => f / 1e6);
        var warnings = new List<MeasurementWarning>();

        double? ripple = PassbandRipple.Over(trace, new FrequencyBand(1.5e6, 3e6), warnings);

        // Points 1.5 … 2.0 MHz carry 1.5 … 2.0 dB: ripple 0.5 dB (rounding of f/1e6 only, 1e-12).
        Assert.Equal(0.5, ripple!.Value, 1e-12);
        Assert.Equal([MeasurementWarningCodes.BandNotCovered], warnings.Select(w => w.Code));
    }

    [Fact]
    public void A_band_inside_the_sweep_gives_no_warning()
    {
        ResponseTrace trace = Trace(FrequencyGrid.Linear(1e6, 2e6, 11), f => f / 1e6);
        var warnings = new List<MeasurementWarning>();

        PassbandRipple.Over(trace, new FrequencyBand(1e6, 2e6), warnings);

        Assert.Empty(warnings);
    }

    [Theory]
    [InlineData(1.3)]
    [InlineData(-0.9)]
    [InlineData(0.2)]
    public void Loss_at_an_offset_matches_the_Butterworth_closed_form(double offsetInBandwidths)
    {
        const int order = 5;
        var grid = FrequencyGrid.Linear(F0Hz - 3 * BandwidthHz, F0Hz + 3 * BandwidthHz, 1201);
        double Loss(double f) => ButterworthLossDb(f, F0Hz, BandwidthHz, order);
        ResponseTrace trace = Trace(grid, Loss);
        double hz = F0Hz + offsetInBandwidths * BandwidthHz + 0.37 * grid.MaxStepHz;

        double? loss = FilterQA.Core.Measurement.Loss.At(trace, hz);

        // Butterworth |H|² = 1/(1 + Ω^(2n)) (Zverev, from memory). Tolerance: linear interpolation in dB errs by at most
        // h²·|L''|/8, |L''| from the closed form by a central difference; factor 2 for its change across the interval.
        double h = grid.MaxStepHz;
        double curvature = Math.Abs(Loss(hz + h) - 2 * Loss(hz) + Loss(hz - h)) / (h * h);
        double tolerance = 2 * h * h * curvature / 8 + 1e-12;
        Assert.InRange(loss!.Value, Loss(hz) - tolerance, Loss(hz) + tolerance);
    }

    [Fact]
    public void Loss_outside_the_sweep_is_null_with_a_warning()
    {
        ResponseTrace trace = Trace(FrequencyGrid.Linear(1e6, 2e6, 11), f => f / 1e6);
        var warnings = new List<MeasurementWarning>();

        Assert.Null(FilterQA.Core.Measurement.Loss.At(trace, 2.5e6, warnings));
        Assert.Null(FilterQA.Core.Measurement.Loss.At(trace, double.NaN, warnings));
        Assert.Equal(2, warnings.Count(w => w.Code == MeasurementWarningCodes.OutsideSweep));
    }

    [Fact]
    public void Minimum_is_the_sampled_point_of_least_loss()
    {
        // Samples of (f − 1.04 MHz)² + 2: the parabola's vertex lies between points; the reading is the nearest sampled point.
        var grid = FrequencyGrid.Linear(1e6, 1.1e6, 11);
        ResponseTrace trace = Trace(grid, f => Math.Pow((f - 1.043e6) / 1e4, 2) + 2);

        LossPoint minimum = FilterQA.Core.Measurement.Loss.Minimum(trace);

        // Point 1.04 MHz: (−0.3)² + 2 = 2.09 dB (rounding 1e-12).
        Assert.Equal(4, minimum.Index);
        Assert.Equal(1.04e6, minimum.Hz, 1e-6);
        Assert.Equal(2.09, minimum.LossDb, 1e-12);
    }

    [Theory]
    [InlineData(-1.0, 2.0)]
    [InlineData(double.NaN, 2.0)]
    [InlineData(3.0, 2.0)]
    [InlineData(1.0, double.PositiveInfinity)]
    public void A_band_with_bad_edges_is_refused(double startHz, double stopHz)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => new FrequencyBand(startHz, stopHz));
    }
}
