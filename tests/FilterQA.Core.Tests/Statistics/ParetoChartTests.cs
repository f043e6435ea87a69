using FilterQA.Core.Statistics;

namespace FilterQA.Core.Tests.Statistics;

public sealed class ParetoChartTests
{
    [Fact]
    public void Bars_sorted_by_count_descending_ties_by_name_with_cumulative_share()
    {
        // Pareto chart definition (Juran; any SQC text): categories by decreasing count, cumulative percent.
        string[] failures = ["IL", "Ripple", "IL", "BW3dB", "IL", "BW3dB", "Stopband", "IL", "BW3dB", "Ripple", "BW3dB", "IL", "BW3dB"];
        ParetoChart chart = ParetoChart.FromFailures(failures);
        Assert.Equal(13, chart.TotalFailures);
        Assert.Equal(["BW3dB", "IL", "Ripple", "Stopband"], chart.Entries.Select(e => e.Rule));
        Assert.Equal([5, 5, 2, 1], chart.Entries.Select(e => e.Count));
        double[] cumulative = [5 / 13.0, 10 / 13.0, 12 / 13.0, 1.0];
        for (int i = 0; i < 4; i++)
        {
            Assert.Equal(cumulative[i], chart.Entries[i].CumulativeShare, 1e-15); // exact ratios
        }
        Assert.Equal(2 / 13.0, chart.Entries[2].Share, 1e-15);
    }

    [Fact]
    public void FromCounts_leaves_out_zero_and_refuses_repeats_and_negatives()
    {
        ParetoChart chart = ParetoChart.FromCounts([new("A", 0), new("B", 3), new("C", 7)]);
        Assert.Equal(["C", "B"], chart.Entries.Select(e => e.Rule));
        Assert.Throws<ArgumentException>(() => ParetoChart.FromCounts([new("A", 1), new("A", 2)]));
        Assert.Throws<ArgumentException>(() => ParetoChart.FromCounts([new("A", -1)]));
        Assert.Throws<ArgumentException>(() => ParetoChart.FromFailures(["A", ""]));
        Assert.Empty(ParetoChart.FromFailures([]).Entries);
    }
}
