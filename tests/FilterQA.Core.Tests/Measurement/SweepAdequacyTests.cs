using FilterQA.Core.Measurement;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Tests.Measurement;

/// <summary>
/// The adequacy rules are common practice, no published source (at least 10 points in the −3 dB band, step ≤ B/10,
/// step below the RBW); the error figures in the messages follow DOMAIN 4 (computed).
/// </summary>
public sealed class SweepAdequacyTests
{
    private const double StepHz = 1e3;
    private const double LowerIndex = 10.5;

    /// <summary>
    /// A trapezoid in dB on a 1 kHz grid: its −3 dB edges sit at 10.5 and 10.5 + width steps (skirts of 1.5 dB per step,
    /// flat 0 dB top), so the number of grid points inside the band is floor(10.5 + width) − 10.
    /// </summary>
    private static ResponseTrace Trapezoid(double widthSteps, FrequencyGrid? grid = null)
    {
        grid ??= FrequencyGrid.Linear(0, 40 * StepHz, 41);
        double lower = LowerIndex * StepHz, upper = (LowerIndex + widthSteps) * StepHz;
        return AnalyticBandpass.Trace(grid, f => Math.Max(0, Math.Max(3 - 1.5 * (f - lower) / StepHz, 3 + 1.5 * (f - upper) / StepHz)));
    }

    private static List<MeasurementWarning> Check(ResponseTrace trace, double? rbwHz = null)
    {
        var warnings = new List<MeasurementWarning>();
        SweepAdequacy.Check(trace, BandEdges.Find(trace, 3), rbwHz, warnings);
        return warnings;
    }

    [Theory]
    // width in steps → points inside the −3 dB band = floor(10.5 + w) − 10; step/B = 1/w.
    [InlineData(9.2, true, true)]     // 9 points, step B/9.2
    [InlineData(9.99, false, true)]   // 10 points, step slightly above B/10
    [InlineData(10.01, false, false)] // 10 points, step slightly below B/10
    [InlineData(12.2, false, false)]  // 12 points
    public void Points_and_step_rules_fire_exactly_when_broken(double widthSteps, bool undersampled, bool coarse)
    {
        List<MeasurementWarning> warnings = Check(Trapezoid(widthSteps));

        Assert.Equal(undersampled, warnings.Any(w => w.Code == MeasurementWarningCodes.UndersampledBand));
        Assert.Equal(coarse, warnings.Any(w => w.Code == MeasurementWarningCodes.CoarseStep));
    }

    [Fact]
    public void Coarse_step_message_carries_the_peak_error()
    {
        List<MeasurementWarning> warnings = Check(Trapezoid(5));

        // DOMAIN 4 (computed): peak error 10·log10(1 + (Δ/B)²) = 10·log10(1.04) = 0.170333 dB at Δ/B = 0.2.
        MeasurementWarning coarse = Assert.Single(warnings, w => w.Code == MeasurementWarningCodes.CoarseStep);
        Assert.Contains("0.170333 dB", coarse.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(1.001e3, false)] // step just below the RBW
    [InlineData(1e3, true)]      // step equal to the RBW
    [InlineData(0.5e3, true)]    // step twice the RBW
    public void Step_against_rbw_warns_when_not_below(double rbwHz, bool warned)
    {
        List<MeasurementWarning> warnings = Check(Trapezoid(20), rbwHz);

        Assert.Equal(warned, warnings.Any(w => w.Code == MeasurementWarningCodes.StepNotBelowRbw));
    }

    [Fact]
    public void Rbw_message_carries_the_gaussian_dip()
    {
        List<MeasurementWarning> warnings = Check(Trapezoid(20), 0.5e3);

        // DOMAIN 4 (computed): 3.01·(Δ/RBW)² = 3.01·4 = 12.04 dB.
        MeasurementWarning rbw = Assert.Single(warnings, w => w.Code == MeasurementWarningCodes.StepNotBelowRbw);
        Assert.Contains("12.04 dB", rbw.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Non_uniform_grid_is_warned_and_a_uniform_one_is_not()
    {
        double[] hz = new double[41];
        for (int i = 0; i < hz.Length; i++)
        {
            hz[i] = i * StepHz + (i > 30 ? 500 : 0);
        }

        List<MeasurementWarning> uneven = Check(Trapezoid(15, FrequencyGrid.FromHz(hz)));
        List<MeasurementWarning> even = Check(Trapezoid(15));

        Assert.Contains(uneven, w => w.Code == MeasurementWarningCodes.NonUniformGrid);
        Assert.Empty(even);
    }

    [Fact]
    public void A_stopband_the_sweep_does_not_cover_is_warned_and_one_it_covers_is_not()
    {
        ResponseTrace trace = Trapezoid(15);
        var request = new FilterMeasurementRequest
        {
            Stopbands = [new FrequencyBand(30e3, 40e3), new FrequencyBand(35e3, 45e3)],
        };

        FilterMeasurement result = FilterMeasurer.Measure(trace, request, new double[41]);

        MeasurementWarning warning = Assert.Single(result.Warnings, w => w.Code == MeasurementWarningCodes.BandNotCovered);
        Assert.Contains("35000–45000 Hz", warning.Message, StringComparison.Ordinal);
    }
}
