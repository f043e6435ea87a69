using FilterQA.Core.Decisions;
using FilterQA.Data.Services;

namespace FilterQA.Web.Api.Intake;

/// <summary>The answer to a stored sweep: the unit's verdict, every rule result, warnings, the thru applied and the lot's progress.</summary>
public sealed record SweepAnswer(string LotNumber, string Serial, string Station, long MeasurementId, int Attempt, bool CountsForLot,
    UnitVerdict Verdict, IReadOnlyList<RuleAnswer> Rules, IReadOnlyList<string> Warnings, long? ThruReferenceId, LotProgress Lot)
{
    public static SweepAnswer From(SweepSubmission submission, IntakeResult result)
    {
        ArgumentNullException.ThrowIfNull(submission);
        ArgumentNullException.ThrowIfNull(result);
        StoredMeasurement stored = result.Stored;
        return new(stored.Lot.LotNumber, submission.Serial, submission.Station, stored.MeasurementId, stored.Attempt, stored.CountsForLot,
            stored.Verdict,
            [.. result.Evaluation.Rules.Select(r => new RuleAnswer(r.RuleId, r.Title, r.Kind, r.Outcome, r.MeasuredValue, r.LimitValue, r.Sense,
                r.Margin, r.Unit, r.AtHz, r.Message))],
            result.Evaluation.Warnings, result.ThruApplied?.Id, LotProgress.From(stored.Lot));
    }
}
