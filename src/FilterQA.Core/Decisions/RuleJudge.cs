using FilterQA.Core.Templates.Rules;

namespace FilterQA.Core.Decisions;

/// <summary>Turns the readings of a rule into its result: the deciding side, its margin and the ILAC-G8 statement.</summary>
internal static class RuleJudge
{
    /// <summary>
    /// A rule with one reading; a two-sided rule passes both. The deciding side is the failing side with the smaller
    /// margin; else, when a side is not verifiable, that side; else the side with the smaller margin. A reading that is
    /// only a lower bound ("at least") decides only when it already meets the limit; otherwise it is not verifiable.
    /// </summary>
    public static RuleResult Judge(LimitRule rule, Reading first, Reading? second = null)
    {
        double w = rule.Uncertainty;
        RuleOutcome a = OutcomeOf(first, w);
        if (second is not { } other)
        {
            return Result(rule, first, a);
        }
        RuleOutcome b = OutcomeOf(other, w);
        bool aFails = a is RuleOutcome.Fail or RuleOutcome.ConditionalFail, bFails = b is RuleOutcome.Fail or RuleOutcome.ConditionalFail;
        if (aFails || bFails)
        {
            return aFails && (!bFails || first.Margin <= other.Margin) ? Result(rule, first, a) : Result(rule, other, b);
        }
        if (a == RuleOutcome.NotVerifiable || b == RuleOutcome.NotVerifiable)
        {
            return a == RuleOutcome.NotVerifiable ? Result(rule, first, a) : Result(rule, other, b);
        }
        return first.Margin <= other.Margin ? Result(rule, first, a) : Result(rule, other, b);
    }

    /// <summary>A result that is not verifiable for a reason found before measuring (nothing measured).</summary>
    public static RuleResult NotVerifiable(LimitRule rule, double? limit, LimitSense sense, string why) =>
        new(rule.Id, rule.Kind, rule.Title, rule.Unit, null, limit, sense, null, rule.Uncertainty, RuleOutcome.NotVerifiable, false, null,
            "not verifiable: " + why);

    /// <summary>The result made not verifiable by a sweep requirement, keeping what was measured for the record.</summary>
    public static RuleResult Block(RuleResult result, string why) => result with
    {
        Outcome = RuleOutcome.NotVerifiable,
        Margin = null,
        Message = result.Outcome == RuleOutcome.NotVerifiable
            ? result.Message + "; also " + why
            : "not verifiable: " + why + " (as measured: " + result.Message + ")",
    };

    private static RuleOutcome OutcomeOf(Reading reading, double w)
    {
        if (reading.Margin is not { } margin)
        {
            return RuleOutcome.NotVerifiable;
        }
        if (reading.IsLowerBound && margin < 0)
        {
            return RuleOutcome.NotVerifiable;
        }
        return NonBinaryStatement.Classify(margin, w);
    }

    private static RuleResult Result(LimitRule rule, Reading reading, RuleOutcome outcome)
    {
        string message = outcome == RuleOutcome.NotVerifiable ? "not verifiable: " + reading.Text : reading.Text;
        return new RuleResult(rule.Id, rule.Kind, rule.Title, rule.Unit, reading.Value, reading.Limit, reading.Sense,
            outcome == RuleOutcome.NotVerifiable ? null : reading.Margin, rule.Uncertainty, outcome, reading.IsLowerBound, reading.AtHz, message);
    }
}
