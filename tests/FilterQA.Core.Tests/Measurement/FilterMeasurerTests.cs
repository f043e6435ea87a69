using FilterQA.Core.Measurement;
using FilterQA.Core.Sweeps;
using static FilterQA.Core.Tests.Measurement.AnalyticBandpass;

namespace FilterQA.Core.Tests.Measurement;

public sealed class FilterMeasurerTests
{
    private const double F0Hz = 70e6;
    private const double BandwidthHz = 1.25e6;
    private const int Order = 5;

    private static double Loss(double f) => ButterworthLossDb(f, F0Hz, BandwidthHz, Order) + 10;

    private static FrequencyGrid Grid() => FrequencyGrid.Linear(F0Hz - 5e6, F0Hz + 5e6, 1601);

    [Fact]
    public void Measure_reports_every_requested_level_in_order_against_the_closed_form()
    {
        // Butterworth order 5 with 10 dB flat loss added (an SAW-like insertion loss); f0 is the middle grid point.
        double[] levels = [6, 1.5, 3, 40, 20];
        var request = new FilterMeasurementRequest
        {
            LevelsDb = levels,
            RippleBand = new FrequencyBand(F0Hz - 0.3e6, F0Hz + 0.3e6),
            Stopbands = [new FrequencyBand(65e6, 67e6), new FrequencyBand(73e6, 75e6)],
        };
        FrequencyGrid grid = Grid();

        FilterMeasurement result = FilterMeasurer.Measure(Trace(grid, Loss), request, Enumerable.Repeat(150.0, grid.Count).ToArray());

        // Minimum at Ω ≈ 0: 10 dB (Ω^10 < 1e-16 within a few steps of f0, so the first such sampled point is taken;
        // rounding 1e-12 dB); it must be a grid point within 0.1 MHz of f0.
        Assert.Equal(10, result.InsertionLossDb, 1e-12);
        Assert.Equal(10, Loss(result.MinLossHz), 1e-12);
        Assert.Contains(result.MinLossHz, grid.Hz.ToArray());
        Assert.Equal(F0Hz, result.MinLossHz, 0.1e6);
        Assert.Equal(levels, result.Bands.Select(b => b.LevelDb));
        foreach (LevelBandwidth band in result.Bands)
        {
            // Edges from Ω_X = (10^(X/10) − 1)^(1/(2n)) (Zverev, from memory), within the interpolation bound (DOMAIN 4).
            (double lower, double upper) = EdgesHz(ButterworthOmegaAt(band.LevelDb, Order), F0Hz, BandwidthHz);
            double lowerTol = InterpolationToleranceHz(Loss, lower, grid.MaxStepHz);
            double upperTol = InterpolationToleranceHz(Loss, upper, grid.MaxStepHz);
            Assert.Equal(lower, band.LowerHz!.Value, lowerTol);
            Assert.Equal(upper, band.UpperHz!.Value, upperTol);
            // Bandwidth = Ω_X·B exactly for the closed-form edges; centre = √((Ω_X·B/2)² + f0²).
            Assert.Equal(ButterworthOmegaAt(band.LevelDb, Order) * BandwidthHz, band.BandwidthHz!.Value, lowerTol + upperTol);
            Assert.Equal((lower + upper) / 2, band.CentreHz!.Value, (lowerTol + upperTol) / 2);
        }
        // Ripple over ±0.3 MHz (Ω ≤ 0.48): the loss at the band's outermost grid points, Ω^10 small; exact sampled values.
        double expectedRipple = Math.Max(Loss(grid[800 - 48]), Loss(grid[800 + 48])) - 10;
        Assert.Equal(expectedRipple, result.RippleDb!.Value, 1e-9);
        Assert.Equal(2, result.Stopbands.Count);
        StopbandResult low = result.Stopbands[0];
        // The least loss in 65–67 MHz is at its top edge, a grid point (67 MHz = point 560); rejection relative to the 10 dB reference.
        Assert.Equal(67e6, low.AtHz!.Value, 1e-3);
        Assert.Equal(Loss(67e6) - 10, low.MinRejectionDb!.Value, 1e-9);
        Assert.Equal(Loss(67e6), low.AbsoluteLossDb!.Value, 1e-9);
        Assert.False(low.FloorLimited);
        Assert.Equal(73e6, result.Stopbands[1].AtHz!.Value, 1e-3);
        Assert.True(result.Warnings.Count == 0, string.Join("; ", result.Warnings));
    }

    [Fact]
    public void Measure_without_a_floor_trace_estimates_one_and_says_so()
    {
        var request = new FilterMeasurementRequest { Stopbands = [new FrequencyBand(65e6, 67e6)] };

        FilterMeasurement result = FilterMeasurer.Measure(Trace(Grid(), Loss), request);

        Assert.Contains(result.Warnings, w => w.Code == MeasurementWarningCodes.FloorEstimated);
        Assert.False(result.Stopbands[0].FloorLimited);
    }

    [Fact]
    public void Measure_warns_when_the_ripple_band_reaches_beyond_the_3_dB_edges()
    {
        // 3 dB edges of the Butterworth at Ω = 1: f0 ± 0.625 MHz (approximately); a ±1 MHz ripple band reaches beyond.
        var request = new FilterMeasurementRequest { RippleBand = new FrequencyBand(F0Hz - 1e6, F0Hz + 1e6) };

        FilterMeasurement result = FilterMeasurer.Measure(Trace(Grid(), Loss), request);

        Assert.Contains(result.Warnings, w => w.Code == MeasurementWarningCodes.RippleBandBeyondEdges);
    }

    [Fact]
    public void Measure_with_default_request_gives_the_3_and_6_dB_bands()
    {
        FilterMeasurement result = FilterMeasurer.Measure(Trace(Grid(), Loss), new FilterMeasurementRequest());

        Assert.Equal([3.0, 6.0], result.Bands.Select(b => b.LevelDb));
        Assert.Null(result.RippleDb);
        Assert.Empty(result.Stopbands);
    }

    [Fact]
    public void A_reflection_trace_is_refused()
    {
        ResponseTrace s11 = ResponseTrace.Create(FrequencyGrid.Linear(1, 2, 2), ResponsePath.InputReflection, [10, 10]);

        var error = Assert.Throws<ArgumentException>(() => FilterMeasurer.Measure(s11, new FilterMeasurementRequest()));
        Assert.Equal("trace", error.ParamName);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(-6.0)]
    [InlineData(double.NaN)]
    public void A_request_with_a_bad_level_is_refused_naming_its_index(double level)
    {
        var error = Assert.Throws<ArgumentException>(() => new FilterMeasurementRequest { LevelsDb = [3, level] });

        Assert.Equal("LevelsDb", error.ParamName);
        Assert.Contains("level 1", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_request_with_a_bad_rbw_is_refused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => new FilterMeasurementRequest { ResolutionBandwidthHz = 0 });
    }

    [Fact]
    public void The_request_keeps_its_own_copy_of_the_levels()
    {
        double[] levels = [3, 6];
        var request = new FilterMeasurementRequest { LevelsDb = levels };

        levels[0] = 99;

        Assert.Equal([3.0, 6.0], request.LevelsDb);
    }
}
