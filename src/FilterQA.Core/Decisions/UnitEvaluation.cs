using FilterQA.Core.Templates;

namespace FilterQA.Core.Decisions;

/// <summary>
/// The judgement of one measured unit against one template revision: the verdict, every rule's
/// result in template order, the sweep warnings, and the mask lines a chart draws.
/// </summary>
/// <param name="Verdict">Go, no-go or not verifiable.</param>
/// <param name="Rules">One result per template rule, in template order.</param>
/// <param name="Warnings">Measurement and sweep-adequacy warnings, in plain words.</param>
/// <param name="PartNumber">The template's part number.</param>
/// <param name="TemplateRevision">The template's revision.</param>
/// <param name="TemplateHash">The template's content hash ("sha256:…").</param>
/// <param name="DecisionRule">The decision rule the verdict was made under.</param>
/// <param name="MaskLines">The template's limit lines resolved to absolute frequencies for this unit.</param>
public sealed record UnitEvaluation(
    UnitVerdict Verdict,
    IReadOnlyList<RuleResult> Rules,
    IReadOnlyList<string> Warnings,
    string PartNumber,
    int TemplateRevision,
    string TemplateHash,
    DecisionRule DecisionRule,
    IReadOnlyList<MaskLine> MaskLines)
{
    /// <summary>The rules that keep the unit from go (fail or conditional outcomes that do not pass under the decision rule, and not-verifiable ones), in template order.</summary>
    public IEnumerable<RuleResult> BlockingRules => Rules.Where(rule => !Passes(rule.Outcome, DecisionRule));

    /// <summary>Whether an outcome counts as passing under a decision rule: simple acceptance accepts up to the tolerance limit, guarded acceptance only inside the acceptance limit.</summary>
    public static bool Passes(RuleOutcome outcome, DecisionRule decisionRule) => outcome switch
    {
        RuleOutcome.Pass => true,
        RuleOutcome.ConditionalPass => decisionRule == DecisionRule.SimpleAcceptance,
        _ => false,
    };
}
