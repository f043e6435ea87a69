using FilterQA.Core.Statistics.ControlCharts;
using MathNet.Numerics;

namespace FilterQA.Core.Tests.Statistics.ControlCharts;

public sealed class ControlChartConstantsTests
{
    // Table values are printed to 4 decimals (c4) or 3 decimals (A3, B3, B4): half a unit of the last digit.
    private const double FourDecimals = 0.00005;
    private const double ThreeDecimals = 0.0005;

    /// <summary>
    /// Factors for X-bar and S charts as printed in ASTM E2587, Table 1, and in Montgomery, "Introduction to Statistical
    /// Quality Control", Appendix VI ("Factors for constructing variables control charts"). Values from memory.
    /// </summary>
    [Theory]
    [InlineData(2, 0.7979, 2.659, 0.000, 3.267)]
    [InlineData(5, 0.9400, 1.427, 0.000, 2.089)]
    [InlineData(6, 0.9515, 1.287, 0.030, 1.970)]
    [InlineData(10, 0.9727, 0.975, 0.284, 1.716)]
    [InlineData(25, 0.9896, 0.606, 0.565, 1.435)]
    public void Factors_match_the_published_table(int n, double c4, double a3, double b3, double b4)
    {
        Assert.Equal(c4, ControlChartConstants.C4(n), FourDecimals);
        Assert.Equal(a3, ControlChartConstants.A3(n), ThreeDecimals);
        Assert.Equal(b3, ControlChartConstants.B3(n), ThreeDecimals);
        Assert.Equal(b4, ControlChartConstants.B4(n), ThreeDecimals);
    }

    [Fact]
    public void C4_of_five_is_three_eighths_of_root_two_pi()
    {
        // c4(n) = sqrt(2/(n-1)) Γ(n/2)/Γ((n-1)/2); for n = 5: sqrt(1/2)·Γ(5/2)/Γ(2) = sqrt(1/2)·(3/4)·sqrt(π) = (3/8)·sqrt(2π)
        // (Γ(5/2) = (3/4)·sqrt(π), handbook identity). 1e-12: rounding only.
        Assert.Equal(3.0 / 8.0 * Math.Sqrt(2 * Math.PI), ControlChartConstants.C4(5), 1e-12);
    }

    [Theory]
    [InlineData(3)]
    [InlineData(8)]
    [InlineData(13)]
    [InlineData(50)]
    [InlineData(125)]
    public void C4_follows_the_gamma_function_definition(int n)
    {
        // E[s] = c4·σ for n normal values (Montgomery, section 6.3): c4 = sqrt(2/(n-1))·Γ(n/2)/Γ((n-1)/2), Γ from MathNet
        // (plain gamma, not the log-gamma the code uses; n ≤ 125 keeps Γ finite). 1e-10 relative: rounding of Γ.
        double expected = Math.Sqrt(2.0 / (n - 1)) * SpecialFunctions.Gamma(n / 2.0) / SpecialFunctions.Gamma((n - 1) / 2.0);
        Assert.Equal(expected, ControlChartConstants.C4(n), expected * 1e-10);
        double spread = 3 * Math.Sqrt(1 - expected * expected) / expected;
        Assert.Equal(3 / (expected * Math.Sqrt(n)), ControlChartConstants.A3(n), 1e-9);
        Assert.Equal(Math.Max(0, 1 - spread), ControlChartConstants.B3(n), 1e-9);
        Assert.Equal(1 + spread, ControlChartConstants.B4(n), 1e-9);
    }

    [Fact]
    public void C4_approaches_its_large_sample_form_for_a_large_subgroup()
    {
        // c4 ≈ 4(n−1)/(4n−3) (Montgomery, Appendix VI footnote; from memory); the error is O(1/n²): 1e-6 at n = 2000.
        const int n = 2000;
        Assert.Equal(4.0 * (n - 1) / (4.0 * n - 3), ControlChartConstants.C4(n), 1e-6);
    }

    [Theory]
    [InlineData(1)]
    [InlineData(0)]
    [InlineData(-3)]
    [InlineData(ControlChartConstants.MaxSubgroupSize + 1)]
    public void Subgroup_size_out_of_range_is_refused(int n)
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => ControlChartConstants.C4(n));
        Assert.Contains("2 to", e.Message, StringComparison.Ordinal);
    }
}
