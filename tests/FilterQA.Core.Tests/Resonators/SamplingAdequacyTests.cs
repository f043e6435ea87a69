using FilterQA.Core.Resonators;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Tests.Resonators;

/// <summary>
/// The adequacy warning: at least N points within fs ± B/2, B = fs/QL (common practice, no published source; N = 5
/// by default), and a step of at most B/10 (DOMAIN 4, peak error 10·log10(1 + (Δ/B)²)).
/// </summary>
public sealed class SamplingAdequacyTests
{
    /// <summary>B = fs/QL of the worked-example-2 crystal in the series fixture: QL = 2π·fs·L1/(R1 + 2·Z0).</summary>
    private static double BandwidthHz =>
        CrystalCases.FsHz / (2 * Math.PI * CrystalCases.FsHz * CrystalCases.L1H / (CrystalCases.R1Ohm + 2 * ResonatorSweeps.Z0));

    /// <summary>Points at fs + (k + offset)·Δ over fs − 30 kHz .. fs + 40 kHz, Δ = B/pointsPerWidth.</summary>
    private static FrequencyGrid Grid(double pointsPerWidth, double offset)
    {
        double step = BandwidthHz / pointsPerWidth;
        var hz = new List<double>();
        for (int k = (int)Math.Floor(-30e3 / step); k * step <= 40e3; k++)
        {
            hz.Add(CrystalCases.FsHz + (k + offset) * step);
        }
        return FrequencyGrid.FromHz(hz.ToArray());
    }

    [Theory]
    // B/Δ, grid offset (0: a point on fs; 0.5: fs midway), points inside fs ± B/2 counted by hand, threshold, expect warning
    [InlineData(4.2, 0.0, 5, 5, false)] // ±2.1 steps: k = −2..2
    [InlineData(4.2, 0.5, 4, 5, true)]  // ±0.5, ±1.5
    [InlineData(3.9, 0.0, 3, 5, true)]  // ±1.95 steps: k = −1..1
    [InlineData(5.2, 0.5, 6, 5, false)] // ±0.5, ±1.5, ±2.5
    [InlineData(5.2, 0.5, 6, 6, false)] // exactly at a raised threshold
    [InlineData(4.2, 0.0, 5, 6, true)]  // one below a raised threshold
    public void Warning_fires_exactly_when_points_inside_fs_over_QL_fall_below_the_threshold(
        double pointsPerWidth, double offset, int pointsInside, int threshold, bool expectWarning)
    {
        FrequencyGrid grid = Grid(pointsPerWidth, offset);
        double low = CrystalCases.FsHz - BandwidthHz / 2, high = CrystalCases.FsHz + BandwidthHz / 2;
        Assert.Equal(pointsInside, grid.Hz.ToArray().Count(f => f >= low && f <= high)); // the grid is what the row says

        ResonatorMeasurement m = ResonatorAnalyzer.Measure(ResonatorSweeps.SeriesCrystal(grid, CrystalCases.C0F, [CrystalCases.Arm()]),
            new ResonatorOptions { MinPointsInBandwidth = threshold });

        Assert.Equal(expectWarning, m.HasWarning(ResonatorWarningCode.TooFewPointsInBandwidth));
        // The count uses the fitted fs and QL, which exact data give to ~1e-9: far inside the 0.1-step margins above.
        Assert.Equal(CrystalCases.FsHz, m.SeriesHz!.Value, 1e-2);
    }

    [Theory]
    [InlineData(5.0, true)]   // Δ = B/5 > B/10
    [InlineData(9.0, true)]   // Δ = B/9, just coarser than B/10
    [InlineData(11.0, false)] // Δ = B/11, finer
    public void Step_warning_fires_when_the_step_exceeds_a_tenth_of_the_width(double pointsPerWidth, bool expectWarning)
    {
        ResonatorMeasurement m = ResonatorAnalyzer.Measure(
            ResonatorSweeps.SeriesCrystal(Grid(pointsPerWidth, 0.3), CrystalCases.C0F, [CrystalCases.Arm()]));

        Assert.Equal(expectWarning, m.HasWarning(ResonatorWarningCode.StepTooCoarse));
        Assert.False(m.HasWarning(ResonatorWarningCode.TooFewPointsInBandwidth)); // 5+ points in every row
    }

    [Fact]
    public void Step_warning_quotes_the_worst_peak_error_of_DOMAIN_4()
    {
        ResonatorMeasurement m = ResonatorAnalyzer.Measure(ResonatorSweeps.SeriesCrystal(Grid(5.0, 0.3), CrystalCases.C0F, [CrystalCases.Arm()]));
        // Δ/B = 0.20 → 10·log10(1 + 0.2²) = 0.170 dB (DOMAIN 4 table: 0.17 dB), printed to 3 decimals in the message.
        double error = 10 * Math.Log10(1 + 0.2 * 0.2);
        Assert.Equal(0.17, error, 0.005);

        ResonatorWarning warning = m.Warnings.Single(w => w.Code == ResonatorWarningCode.StepTooCoarse);
        Assert.Contains(error.ToString("F3", System.Globalization.CultureInfo.InvariantCulture) + " dB", warning.Message, StringComparison.Ordinal);
    }
}
