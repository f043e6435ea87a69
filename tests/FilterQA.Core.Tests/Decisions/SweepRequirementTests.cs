using FilterQA.Core.Decisions;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;

namespace FilterQA.Core.Tests.Decisions;

// Sweep requirements (the engine's documented contract): a sweep that cannot show a value is never a pass or a plain fail.
public class SweepRequirementTests
{
    private static readonly Func<double, double> Filter = Units.Trapezoid(455e3, 5e3, 15e3, 3, 60);

    private static LimitTemplate Template(double spanStartHz = 255e3, double narrowestHz = 10e3, int points = 50, double maxThruAgeS = 8 * 3600) =>
        Units.Template(DecisionRule.GuardedAcceptance, 455e3, spanStartHz, 655e3,
        [
            new InsertionLossRule("loss", "loss", 6, InsertionLossMeasure.MinimumLoss, null, 0.3),
            new PassbandRippleRule("ripple", "ripple", new FrequencyBand(FrequencyAnchor.NominalOffset, -5e3, 5e3), 2, 0.2),
        ], narrowestFeatureHz: narrowestHz, pointsPerFeature: points, maximumThruAgeS: maxThruAgeS);

    private static readonly FrequencyGrid Grid = FrequencyGrid.Linear(255e3, 655e3, 2001); // 200 Hz step

    [Fact]
    public void Requirements_met_every_rule_is_judged()
    {
        UnitEvaluation evaluation = Units.Evaluate(Template(), Units.Scalar(Filter, Grid));
        Assert.Equal(UnitVerdict.Go, evaluation.Verdict);
    }

    [Fact]
    public void A_sweep_that_misses_the_required_span_makes_every_rule_not_verifiable()
    {
        UnitEvaluation evaluation = Units.Evaluate(Template(spanStartHz: 200e3), Units.Scalar(Filter, Grid));
        Assert.All(evaluation.Rules, r => Assert.Equal(RuleOutcome.NotVerifiable, r.Outcome));
        Assert.All(evaluation.Rules, r => Assert.Contains("does not cover the required span 200.00 kHz to 655.00 kHz", r.Message));
        Assert.All(evaluation.Rules, r => Assert.Null(r.Margin));
        Assert.Equal(3, evaluation.Rules[0].MeasuredValue); // what was measured stays on record (the trapezoid's 3 dB, exact)
        Assert.Equal(UnitVerdict.NotVerifiable, evaluation.Verdict);
    }

    [Fact]
    public void A_step_coarser_than_narrowest_feature_over_points_makes_every_rule_not_verifiable()
    {
        // 10 kHz / 100 points = 100 Hz allowed; the grid steps 200 Hz.
        UnitEvaluation evaluation = Units.Evaluate(Template(points: 100), Units.Scalar(Filter, Grid));
        Assert.All(evaluation.Rules, r => Assert.Equal(RuleOutcome.NotVerifiable, r.Outcome));
        Assert.Contains("coarser than the 100.0 Hz the template allows", evaluation.Rules[0].Message);
    }

    [Theory]
    [InlineData(8.0, UnitVerdict.Go)]             // exactly the maximum age is allowed
    [InlineData(8.01, UnitVerdict.NotVerifiable)]
    public void A_thru_older_than_the_template_allows_makes_every_rule_not_verifiable(double ageHours, UnitVerdict expected)
    {
        UnitEvaluation evaluation = Units.Evaluate(Template(), Units.Scalar(Filter, Grid), thruAge: TimeSpan.FromHours(ageHours));
        Assert.Equal(expected, evaluation.Verdict);
        if (expected == UnitVerdict.NotVerifiable)
        {
            Assert.All(evaluation.Rules, r => Assert.Contains("the thru is 8.01 h old; the template allows 8.0 h", r.Message));
        }
    }

    [Fact]
    public void An_unknown_thru_age_is_not_checked_and_a_warning_says_so()
    {
        UnitEvaluation evaluation = TemplateEvaluator.Evaluate(Template(maxThruAgeS: 60), MeasurementInput.FromSweep(Units.Scalar(Filter, Grid)));
        Assert.Equal(UnitVerdict.Go, evaluation.Verdict);
        Assert.Contains(evaluation.Warnings, w => w.Contains("thru age is not known", StringComparison.Ordinal));
    }

    [Fact]
    public void A_power_trace_in_dBm_without_a_thru_is_refused()
    {
        Sweep power = Sweep.FromScalar(ScalarTrace.Create(Grid, ScalarQuantity.PowerDbm, new double[Grid.Count]), SweepSource.Of("p.csv", SweepFormat.DelimitedText));
        ArgumentException e = Assert.Throws<ArgumentException>(() => MeasurementInput.FromSweep(power));
        Assert.Contains("normalised by a thru", e.Message);
    }

    [Fact]
    public void A_resonator_template_that_needs_phase_cannot_judge_a_magnitude_only_sweep()
    {
        LimitTemplate template = Units.Template(DecisionRule.SimpleAcceptance, 455e3, 255e3, 655e3,
            [new MotionalResistanceRule("r1", "R1", 40, 1)], DeviceKind.Resonator, needsPhase: true);
        UnitEvaluation evaluation = Units.Evaluate(template, Units.Scalar(Filter, Grid));
        RuleResult r1 = Units.Only(evaluation);
        Assert.Equal(RuleOutcome.NotVerifiable, r1.Outcome);
        Assert.Contains("needs the transmission phase", r1.Message);
    }
}
