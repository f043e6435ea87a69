using FilterQA.Core.Statistics;

namespace FilterQA.Core.Tests.Statistics;

public sealed class HistogramTests
{
    private static double[] Values(int n) => Enumerable.Range(0, n).Select(i => Math.Sin(1.3 * i) + 0.01 * i).ToArray();

    [Fact]
    public void Sturges_uses_ceil_log2_n_plus_1_equal_bins_over_the_range()
    {
        // Sturges (1926): k = ⌈log₂ 50⌉ + 1 = 6 + 1 = 7.
        double[] x = Values(50);
        Histogram h = Histogram.Create(x, HistogramBinRule.Sturges);
        Assert.Equal(7, h.BinCount);
        Assert.Equal(x.Min(), h.Edges[0]);
        Assert.Equal(x.Max(), h.Edges[^1]);
        Assert.Equal(50, h.Counts.ToArray().Sum());
    }

    [Fact]
    public void Freedman_Diaconis_width_is_2_IQR_over_cube_root_n()
    {
        // Freedman & Diaconis (1981): width 2·IQR·n^(-1/3); IQR from MathNet (reference library).
        double[] x = Values(200);
        double width = 2 * MathNet.Numerics.Statistics.Statistics.InterquartileRange(x) / Math.Cbrt(200);
        int expectedBins = (int)Math.Ceiling((x.Max() - x.Min()) / width);
        Histogram h = Histogram.Create(x);
        Assert.Equal(expectedBins, h.BinCount);
        Assert.Equal(200, h.Counts.ToArray().Sum());
    }

    [Fact]
    public void FromEdges_counts_half_open_bins_with_the_top_edge_in_the_last_bin()
    {
        // [0,1): 0, 0.5   [1,2): 1, 1.5   [2,3]: 2, 2.5, 3   below: -1   above: 3.5
        Histogram h = Histogram.FromEdges([0, 0.5, 1, 1.5, 2, 2.5, 3, -1, 3.5], [0, 1, 2, 3]);
        Assert.Equal([2, 2, 3], h.Counts.ToArray());
        Assert.Equal(1, h.BelowRange);
        Assert.Equal(1, h.AboveRange);
    }

    [Fact]
    public void Equal_values_make_one_bin_and_bad_edges_are_refused()
    {
        Histogram h = Histogram.Create([4.0, 4.0, 4.0]);
        Assert.Equal(1, h.BinCount);
        Assert.Equal(3, h.Counts[0]);
        Assert.Throws<ArgumentException>(() => Histogram.FromEdges([1.0], [0, 0]));
        Assert.Throws<ArgumentException>(() => Histogram.FromEdges([1.0], [0]));
    }
}
