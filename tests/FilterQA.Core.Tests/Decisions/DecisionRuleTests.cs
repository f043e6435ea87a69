using FilterQA.Core.Decisions;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;

namespace FilterQA.Core.Tests.Decisions;

public class DecisionRuleTests
{
    private static readonly FrequencyGrid Grid = FrequencyGrid.Linear(1e6, 2e6, 101);

    private static UnitEvaluation FlatLoss(double lossDb, DecisionRule decisionRule)
    {
        // DOMAIN worked example 8: insertion loss at most 4.0 dB, U = 0.25 dB.
        LimitTemplate template = Units.Template(decisionRule, 1.5e6, 1e6, 2e6,
            [new InsertionLossRule("loss", "Insertion loss at most 4.0 dB", 4.0, InsertionLossMeasure.MinimumLoss, null, 0.25)]);
        return Units.Evaluate(template, Units.Scalar(_ => lossDb, Grid));
    }

    // Worked example 8 (DOMAIN 9, worked example, computed) with ILAC-G8:09/2019 clause 4.2.3 (non-binary statement,
    // w = U) and JCGM 106:2012 (guarded acceptance: acceptance limit AL = TL − w = 3.75 dB).
    [Theory]
    [InlineData(3.70, RuleOutcome.Pass, UnitVerdict.Go, UnitVerdict.Go)]
    [InlineData(3.75, RuleOutcome.Pass, UnitVerdict.Go, UnitVerdict.Go)]                       // exactly AL: accepted ("up to 3.75 dB")
    [InlineData(3.85, RuleOutcome.ConditionalPass, UnitVerdict.Go, UnitVerdict.NoGo)]          // passes simple, fails guarded
    [InlineData(4.00, RuleOutcome.ConditionalPass, UnitVerdict.Go, UnitVerdict.NoGo)]          // exactly TL: inside the tolerance
    [InlineData(4.10, RuleOutcome.ConditionalFail, UnitVerdict.NoGo, UnitVerdict.NoGo)]
    [InlineData(4.25, RuleOutcome.ConditionalFail, UnitVerdict.NoGo, UnitVerdict.NoGo)]        // exactly TL + w
    [InlineData(4.30, RuleOutcome.Fail, UnitVerdict.NoGo, UnitVerdict.NoGo)]
    public void Worked_example_8_insertion_loss_against_4_dB_with_U_025_dB(double lossDb, RuleOutcome outcome, UnitVerdict simple, UnitVerdict guarded)
    {
        UnitEvaluation underSimple = FlatLoss(lossDb, DecisionRule.SimpleAcceptance);
        UnitEvaluation underGuarded = FlatLoss(lossDb, DecisionRule.GuardedAcceptance);
        RuleResult rule = Units.Only(underSimple);
        Assert.Equal(outcome, rule.Outcome);
        Assert.Equal(outcome, Units.Only(underGuarded).Outcome);
        Assert.Equal(simple, underSimple.Verdict);
        Assert.Equal(guarded, underGuarded.Verdict);
        // Margin = TL − measured for a maximum, in dB; 1e-12 dB covers the rounding of the decimal inputs.
        Assert.Equal(4.0 - lossDb, rule.Margin!.Value, 1e-12);
        Assert.Equal(lossDb, rule.MeasuredValue!.Value, 1e-12);
        Assert.Equal(4.0, rule.LimitValue);
        Assert.Equal(LimitSense.AtMost, rule.Sense);
        Assert.Equal(0.25, rule.GuardBand); // w = U (ILAC-G8 4.2.3), exact
    }

    // ILAC-G8:09/2019 4.2.3: the four zones around TL with w; at w = 0 the statement is binary (simple acceptance).
    [Theory]
    [InlineData(0.5, 0.25, RuleOutcome.Pass)]
    [InlineData(0.25, 0.25, RuleOutcome.Pass)]
    [InlineData(0.1, 0.25, RuleOutcome.ConditionalPass)]
    [InlineData(0.0, 0.25, RuleOutcome.ConditionalPass)]
    [InlineData(-0.1, 0.25, RuleOutcome.ConditionalFail)]
    [InlineData(-0.25, 0.25, RuleOutcome.ConditionalFail)]
    [InlineData(-0.26, 0.25, RuleOutcome.Fail)]
    [InlineData(0.0, 0.0, RuleOutcome.Pass)]
    [InlineData(-1e-9, 0.0, RuleOutcome.Fail)]
    public void Non_binary_statement_zones(double margin, double w, RuleOutcome expected) =>
        Assert.Equal(expected, NonBinaryStatement.Classify(margin, w));

    [Fact]
    public void A_margin_that_is_not_a_number_is_refused() =>
        Assert.Throws<ArgumentOutOfRangeException>(() => NonBinaryStatement.Classify(double.NaN, 0.1));

    private static RuleResult Result(RuleOutcome outcome) =>
        new("r", RuleKind.InsertionLoss, "t", RuleUnit.Decibel, 1, 2, LimitSense.AtMost, 1, 0.1, outcome, false, null, "m");

    // The verdict rule of the engine (its documented contract, built on ILAC-G8 4.2.3): any verifiable rule that does not
    // pass under the decision rule → no-go; else any not verifiable → not verifiable; else go.
    [Theory]
    [InlineData(DecisionRule.SimpleAcceptance, new[] { RuleOutcome.Pass, RuleOutcome.ConditionalPass }, UnitVerdict.Go)]
    [InlineData(DecisionRule.GuardedAcceptance, new[] { RuleOutcome.Pass, RuleOutcome.ConditionalPass }, UnitVerdict.NoGo)]
    [InlineData(DecisionRule.SimpleAcceptance, new[] { RuleOutcome.Pass, RuleOutcome.NotVerifiable }, UnitVerdict.NotVerifiable)]
    [InlineData(DecisionRule.SimpleAcceptance, new[] { RuleOutcome.NotVerifiable, RuleOutcome.Fail }, UnitVerdict.NoGo)]
    [InlineData(DecisionRule.SimpleAcceptance, new[] { RuleOutcome.NotVerifiable, RuleOutcome.ConditionalFail }, UnitVerdict.NoGo)]
    [InlineData(DecisionRule.GuardedAcceptance, new[] { RuleOutcome.NotVerifiable, RuleOutcome.ConditionalPass }, UnitVerdict.NoGo)]
    [InlineData(DecisionRule.SimpleAcceptance, new[] { RuleOutcome.NotVerifiable, RuleOutcome.ConditionalPass }, UnitVerdict.NotVerifiable)]
    [InlineData(DecisionRule.GuardedAcceptance, new[] { RuleOutcome.Pass, RuleOutcome.Pass }, UnitVerdict.Go)]
    public void Verdict_combines_the_rules(DecisionRule decisionRule, RuleOutcome[] outcomes, UnitVerdict expected) =>
        Assert.Equal(expected, TemplateEvaluator.VerdictOf(outcomes.Select(Result).ToArray(), decisionRule));

    [Fact]
    public void A_failing_rule_beats_a_rule_that_cannot_be_verified_in_a_whole_evaluation()
    {
        // Loss 5 dB fails "at most 4 dB"; the 1 dB bandwidth cannot be measured on a flat trace (no edge).
        LimitTemplate template = Units.Template(DecisionRule.SimpleAcceptance, 1.5e6, 1e6, 2e6,
        [
            new InsertionLossRule("loss", "loss", 4.0, InsertionLossMeasure.MinimumLoss, null, 0.25),
            new BandwidthRule("bw", "bw", 1, 1e3, null, 10),
        ]);
        UnitEvaluation evaluation = Units.Evaluate(template, Units.Scalar(_ => 5, Grid));
        Assert.Equal(RuleOutcome.Fail, evaluation.Rules[0].Outcome);
        Assert.Equal(RuleOutcome.NotVerifiable, evaluation.Rules[1].Outcome);
        Assert.Null(evaluation.Rules[1].MeasuredValue);
        Assert.Equal(UnitVerdict.NoGo, evaluation.Verdict);
        Assert.Equal(["loss", "bw"], evaluation.BlockingRules.Select(r => r.RuleId));
    }
}
