using FilterQA.Core.Decisions;

namespace FilterQA.Data.Services;

/// <summary>One reference unit judged against a draft.</summary>
/// <param name="ReferenceUnitId">The reference-unit record.</param>
/// <param name="MeasurementId">The stored measurement judged again.</param>
/// <param name="LotNumber">Its lot.</param>
/// <param name="Serial">The unit's serial.</param>
/// <param name="Attempt">The measurement's attempt number.</param>
/// <param name="Verdict">The verdict under the draft; the unit passes only with go.</param>
/// <param name="FailingRules">The draft's results of the rules that keep the unit from go (empty when it passes).</param>
/// <param name="Warnings">The evaluation's warnings (e.g. why a sweep cannot show a rule).</param>
public sealed record ReferenceCheckUnit(long ReferenceUnitId, long MeasurementId, string LotNumber, string Serial, int Attempt,
    UnitVerdict Verdict, IReadOnlyList<RuleResult> FailingRules, IReadOnlyList<string> Warnings)
{
    /// <summary>True when the draft judges the unit go.</summary>
    public bool Passes => Verdict == UnitVerdict.Go;
}
