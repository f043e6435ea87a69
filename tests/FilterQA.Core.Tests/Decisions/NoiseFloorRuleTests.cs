using FilterQA.Core.Decisions;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;

namespace FilterQA.Core.Tests.Decisions;

// DOMAIN 4 and worked example 9 (worked example, computed): verifiable rejection = thru level − floor − margin; with the
// floor 95 dB below the thru and the 10 dB margin (common practice), up to 85 dB is verifiable; an 80 dB requirement is
// fine, a 90 dB requirement is not verifiable, never a pass.
public class NoiseFloorRuleTests
{
    private static readonly FrequencyGrid Grid = FrequencyGrid.Linear(255e3, 655e3, 1601);
    private static readonly double[] Floor95 = Enumerable.Repeat(95.0, Grid.Count).ToArray();

    private static RuleResult Rejection(double requiredDb, double stopbandLossDb, double uncertaintyDb = 0)
    {
        LimitTemplate template = Units.Template(DecisionRule.GuardedAcceptance, 455e3, 255e3, 655e3,
            [new StopbandRejectionRule("reject", "reject", new FrequencyBand(FrequencyAnchor.NominalOffset, 100e3, 200e3), requiredDb, LossReference.Relative, uncertaintyDb)]);
        // Passband 0 dB (the thru level), so relative rejection equals the loss below the thru.
        return Units.Only(Units.Evaluate(template, Units.Scalar(Units.Trapezoid(455e3, 5e3, 15e3, 0, stopbandLossDb), Grid), floor: Floor95));
    }

    [Fact]
    public void Worked_example_9_a_requirement_inside_the_verifiable_range_passes_as_a_lower_bound()
    {
        RuleResult r = Rejection(80, 95); // the stopband reads at the floor itself
        Assert.Equal(RuleOutcome.Pass, r.Outcome);
        Assert.True(r.IsLowerBound);
        Assert.Equal(85, r.MeasuredValue!.Value, 1e-12); // 95 − 10 dB margin: the most that can be claimed
        Assert.Equal(5, r.Margin!.Value, 1e-12);
        Assert.Contains("at least 85.0 dB", r.Message);
    }

    [Fact]
    public void Worked_example_9_a_requirement_beyond_the_verifiable_range_is_not_verifiable()
    {
        RuleResult r = Rejection(90, 95);
        Assert.Equal(RuleOutcome.NotVerifiable, r.Outcome);
        Assert.True(r.IsLowerBound);
        Assert.Null(r.Margin);
        Assert.StartsWith("not verifiable: rejection at least 85.0 dB", r.Message);
    }

    [Fact]
    public void Worked_example_9_exactly_85_dB_is_verifiable()
    {
        Assert.Equal(RuleOutcome.Pass, Rejection(85, 95).Outcome); // margin 0 with w = 0
    }

    [Fact]
    public void A_clean_reading_below_a_deep_requirement_is_a_real_fail()
    {
        // 84 dB keeps more than the 10 dB margin to the 95 dB floor, so it is a measurement, not a bound: 84 < 90 fails.
        RuleResult r = Rejection(90, 84);
        Assert.False(r.IsLowerBound);
        Assert.Equal(-6, r.Margin!.Value, 1e-12);
        Assert.Equal(RuleOutcome.Fail, r.Outcome);
    }
}
