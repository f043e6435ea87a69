using FilterQA.Core.Statistics.ControlCharts;

namespace FilterQA.Core.Tests.Statistics.ControlCharts;

public sealed class XBarSChartTests
{
    // σ of the mean of 5 values of an S chart with s̄ = 1: A3(5)/3 = 1/(c4·√5), c4(5) = (3/8)·√(2π) (gamma identity).
    private static readonly double SigmaOfMeanOfFive = 1 / (3.0 / 8.0 * Math.Sqrt(2 * Math.PI) * Math.Sqrt(5));

    [Fact]
    public void Piston_ring_example_limits_match_the_textbook()
    {
        // Montgomery, "Introduction to Statistical Quality Control", Example 6.3 (piston-ring inside diameter, 25 samples
        // of n = 5, mm): x̿ = 74.001, s̄ = 0.0094 give UCL 74.014, LCL 73.988 on the X-bar chart and UCL 0.0196, LCL 0 on
        // the S chart (values from memory). The subgroups here are made to have exactly that x̿ and s̄.
        var groups = Enumerable.Range(0, 25)
            .Select(i => new Subgroup($"sample {i + 1}", 5, 74.001 + (i % 2 == 0 ? 0.002 : -0.002) * (i == 24 ? 0 : 1), 0.0094 + (i % 2 == 0 ? 0.001 : -0.001) * (i == 24 ? 0 : 1)))
            .ToArray();
        XBarSChart chart = XBarSChart.Create(groups);

        // 1e-12: the constructed means and s average exactly (pairs cancel) up to rounding.
        Assert.Equal(74.001, chart.GrandMean, 1e-12);
        Assert.Equal(0.0094, chart.AverageS, 1e-12);
        Assert.True(chart.IsUniformSize);
        ControlChartPoint p = chart.Points[0];
        // The book prints 3 decimals (mm) for the X-bar limits, 4 for the S limits: half the last digit.
        Assert.Equal(74.014, p.MeanUpper, 0.0005);
        Assert.Equal(73.988, p.MeanLower, 0.0005);
        Assert.Equal(0.0196, p.SUpper, 0.00005);
        Assert.Equal(0.0, p.SLower, 1e-15);
        Assert.Empty(chart.OutOfControl());
    }

    [Fact]
    public void Limits_from_the_published_constants_for_n_of_five()
    {
        // x̿ ± A3·s̄ and B3·s̄, B4·s̄ with A3 = 1.427, B3 = 0, B4 = 2.089 (ASTM E2587 Table 1, n = 5; from memory).
        // The constants are printed to 3 decimals: the limits may differ by 0.0005·s̄.
        var groups = new[] { new Subgroup("L1", 5, 10.0, 2.0), new Subgroup("L2", 5, 12.0, 4.0) };
        XBarSChart chart = XBarSChart.Create(groups);
        double mean = 11.0, s = 3.0;
        Assert.Equal(mean + 1.427 * s, chart.Points[1].MeanUpper, 0.0005 * s);
        Assert.Equal(mean - 1.427 * s, chart.Points[1].MeanLower, 0.0005 * s);
        Assert.Equal(2.089 * s, chart.Points[1].SUpper, 0.0005 * s);
        Assert.Equal(0, chart.Points[1].SLower, 1e-15);
    }

    [Fact]
    public void Lots_of_different_sizes_use_the_weighted_centre_lines_and_their_own_limits()
    {
        // Montgomery, section 6.3.2 (X-bar and S with variable sample size): x̿ = Σnᵢx̄ᵢ/Σnᵢ, s̄ = sqrt(Σ(nᵢ−1)sᵢ²/(Σnᵢ − m)),
        // limits x̿ ± A3(nᵢ)s̄. Hand-computed: x̿ = (5·10 + 13·12 + 20·11)/38 = 426/38; s̄ = sqrt((4·4 + 12·9 + 19·1)/35) = sqrt(143/35).
        var groups = new[] { new Subgroup("A", 5, 10, 2), new Subgroup("B", 13, 12, 3), new Subgroup("C", 20, 11, 1) };
        XBarSChart chart = XBarSChart.Create(groups);
        double grand = 426.0 / 38.0, sBar = Math.Sqrt(143.0 / 35.0);
        Assert.False(chart.IsUniformSize);
        Assert.Equal(grand, chart.GrandMean, 1e-12);
        Assert.Equal(sBar, chart.AverageS, 1e-12);
        // A3 from the published table: n = 5: 1.427, n = 13: 0.850, n = 20: 0.680 (ASTM E2587 Table 1; from memory), 3 decimals.
        Assert.Equal(grand + 1.427 * sBar, chart.Points[0].MeanUpper, 0.0005 * sBar);
        Assert.Equal(grand + 0.850 * sBar, chart.Points[1].MeanUpper, 0.0005 * sBar);
        Assert.Equal(grand - 0.680 * sBar, chart.Points[2].MeanLower, 0.0005 * sBar);
    }

    [Fact]
    public void Rule_1_flags_one_mean_beyond_three_sigma_and_nothing_else()
    {
        // 20 lots of 5, s = 1, means alternating ±0.1 and one at 2.0: x̿ = 2.0/20 + (0 − 0.1)/20 (the replaced +0.1);
        // z of the outlier ≈ 4 > 3 (Western Electric rule 1), every other |z| < 1.
        double[] means = Alternating(20);
        means[12] = 2.0;
        XBarSChart chart = Chart(means);
        double z = (2.0 - means.Average()) / SigmaOfMeanOfFive;
        Assert.True(z > 3, "the outlier is placed beyond three sigma");
        ControlChartPoint flagged = Assert.Single(chart.OutOfControl());
        Assert.Equal("L13", flagged.Subgroup.Label);
        Assert.Contains(new ControlSignal(ControlChart.Mean, ControlRule.BeyondThreeSigma, Above: true), flagged.Signals);
        Assert.True(flagged.Subgroup.Mean > flagged.MeanUpper);
    }

    [Fact]
    public void Rule_2_flags_the_second_of_two_means_beyond_two_sigma()
    {
        // ±0.1 alternating, two consecutive at +1.2 (z ≈ 2.5) balanced by two lone −1.2 (z ≈ −2.5, single: no signal);
        // x̿ = 0. Western Electric rule 2: 2 of 3 beyond 2σ on one side.
        double[] means = Alternating(20);
        means[10] = means[11] = 1.2;
        means[3] = means[16] = -1.2;
        XBarSChart chart = Chart(means);
        Assert.Equal(0, chart.GrandMean, 1e-12);
        ControlChartPoint flagged = Assert.Single(chart.OutOfControl());
        Assert.Equal("L12", flagged.Subgroup.Label);
        Assert.Equal([new ControlSignal(ControlChart.Mean, ControlRule.TwoOfThreeBeyondTwoSigma, Above: true)], flagged.Signals);
    }

    [Fact]
    public void Rule_3_flags_the_fourth_of_four_means_beyond_one_sigma()
    {
        // Four in a row at +0.6 (z ≈ 1.26) balanced by four lone −0.6; x̿ = 0. Western Electric rule 3: 4 of 5 beyond 1σ.
        double[] means = Alternating(20);
        means[8] = means[9] = means[10] = means[11] = 0.6;
        means[0] = means[5] = means[14] = means[19] = -0.6;
        XBarSChart chart = Chart(means);
        Assert.Equal(0, chart.GrandMean, 1e-12);
        ControlChartPoint flagged = Assert.Single(chart.OutOfControl());
        Assert.Equal("L12", flagged.Subgroup.Label);
        Assert.Equal([new ControlSignal(ControlChart.Mean, ControlRule.FourOfFiveBeyondOneSigma, Above: true)], flagged.Signals);
    }

    [Fact]
    public void Rule_4_flags_the_eighth_mean_in_a_row_on_one_side()
    {
        // Eight at −0.2 then eight at +0.2 (|z| ≈ 0.4): x̿ = 0; Western Electric rule 4 completes at the 8th of each run.
        double[] means = [.. Enumerable.Repeat(-0.2, 8), .. Enumerable.Repeat(0.2, 8)];
        XBarSChart chart = Chart(means);
        ControlChartPoint[] flagged = chart.OutOfControl().ToArray();
        Assert.Equal(["L8", "L16"], flagged.Select(p => p.Subgroup.Label));
        Assert.Equal([new ControlSignal(ControlChart.Mean, ControlRule.EightOnOneSide, Above: false)], flagged[0].Signals);
        Assert.Equal([new ControlSignal(ControlChart.Mean, ControlRule.EightOnOneSide, Above: true)], flagged[1].Signals);
    }

    [Fact]
    public void A_spread_beyond_B4_is_flagged_on_the_S_chart()
    {
        // 19 lots with s = 1 and one with s = 3, n = 5: s̄ = 22/20 = 1.1, UCL(s) = B4·s̄ = 2.089·1.1 ≈ 2.30 < 3
        // (B4 from ASTM E2587 Table 1; from memory).
        var groups = Alternating(20).Select((m, i) => new Subgroup($"L{i + 1}", 5, m, i == 6 ? 3 : 1));
        XBarSChart chart = XBarSChart.Create(groups);
        ControlChartPoint flagged = Assert.Single(chart.OutOfControl());
        Assert.Equal("L7", flagged.Subgroup.Label);
        Assert.Equal([new ControlSignal(ControlChart.StandardDeviation, ControlRule.BeyondThreeSigma, Above: true)], flagged.Signals);
        Assert.Equal(2.089 * 1.1, flagged.SUpper, 0.0005 * 1.1);
        Assert.Contains("rule 1", flagged.Signals[0].Describe(), StringComparison.Ordinal);
    }

    [Fact]
    public void Subgroup_of_values_takes_the_mean_and_the_n_minus_1_deviation()
    {
        // 2, 4, 4, 4, 5, 5, 7, 9: mean 5, Σ(x − 5)² = 32, s = sqrt(32/7) (hand-computed). 1e-12: rounding.
        Subgroup g = Subgroup.Of("L", [2, 4, 4, 4, 5, 5, 7, 9]);
        Assert.Equal(8, g.Count);
        Assert.Equal(5, g.Mean, 1e-12);
        Assert.Equal(Math.Sqrt(32.0 / 7.0), g.StandardDeviation, 1e-12);
    }

    public static TheoryData<string, Func<object>, string> BadInput => new()
    {
        { "one subgroup", () => XBarSChart.Create([new Subgroup("L1", 5, 1, 1)]), "at least 2 subgroups" },
        { "repeated label", () => XBarSChart.Create([new Subgroup("L1", 5, 1, 1), new Subgroup("L1", 5, 2, 1)]), "'L1' is repeated" },
        { "no spread", () => XBarSChart.Create([new Subgroup("L1", 5, 1, 0), new Subgroup("L2", 5, 2, 0)]), "zero spread" },
        { "subgroup of one", () => new Subgroup("L1", 1, 1, 0), "2 or more" },
        { "NaN mean", () => new Subgroup("L1", 5, double.NaN, 1), "must be finite" },
        { "negative s", () => new Subgroup("L1", 5, 1, -1), "0 or more" },
        { "NaN value", () => Subgroup.Of("L1", [1, double.NaN, 3]), "index 1" },
    };

    [Theory]
    [MemberData(nameof(BadInput))]
    public void Bad_input_is_refused_with_a_message_that_names_it(string what, Func<object> make, string phrase)
    {
        var e = Assert.ThrowsAny<ArgumentException>(make);
        Assert.True(e.Message.Contains(phrase, StringComparison.Ordinal), $"{what}: {e.Message}");
    }

    private static double[] Alternating(int count) => Enumerable.Range(0, count).Select(i => i % 2 == 0 ? 0.1 : -0.1).ToArray();

    private static XBarSChart Chart(double[] means) =>
        XBarSChart.Create(means.Select((m, i) => new Subgroup($"L{i + 1}", 5, m, 1)));
}
