using FilterQA.Core.Sampling;
using FilterQA.Data.Entities;

namespace FilterQA.Data.Services;

/// <summary>Between a <see cref="SamplingPlan"/> and its stored fields.</summary>
internal static class PlanRecords
{
    internal static LotPlan ToRecord(SamplingPlan plan, string severityReason) => new()
    {
        Kind = plan.Kind,
        StandardName = plan.StandardName,
        LotSize = plan.LotSize,
        SampleSize = plan.SampleSize,
        TableSampleSize = plan.TableSampleSize,
        AcceptanceNumber = plan.AcceptanceNumber,
        RejectionNumber = plan.RejectionNumber,
        IsFullInspection = plan.IsFullInspection,
        Level = plan.Level,
        Severity = plan.Severity,
        AqlPercent = plan.AqlPercent,
        TableLetter = plan.TableLetter,
        LetterUsed = plan.LetterUsed,
        LtpdFraction = plan.LtpdFraction,
        Confidence = plan.Confidence,
        SeverityReason = severityReason,
    };

    /// <summary>
    /// Rebuilds the plan with the planner from the stored inputs and checks that every stored
    /// field agrees, so a changed table or a damaged row cannot pass unseen.
    /// </summary>
    internal static SamplingPlan FromRecord(LotPlan stored, string lotNumber)
    {
        SamplingPlan plan = stored.Kind switch
        {
            SamplingPlanKind.Mil105ESingle => SamplingPlanner.Mil105E(stored.LotSize, Need(stored.Level, "level", lotNumber),
                Need(stored.Severity, "severity", lotNumber), Need(stored.AqlPercent, "AQL", lotNumber)),
            SamplingPlanKind.ZeroAcceptance => SamplingPlanner.ZeroAcceptance(stored.LotSize, Need(stored.LtpdFraction, "LTPD", lotNumber),
                Need(stored.Confidence, "confidence", lotNumber)),
            SamplingPlanKind.FullInspection => SamplingPlanner.FullInspection(stored.LotSize, stored.AcceptanceNumber),
            _ => throw new InvalidDataException($"lot {lotNumber}: stored plan kind {stored.Kind} is not known"),
        };
        LotPlan again = ToRecord(plan, stored.SeverityReason);
        if (again.SampleSize != stored.SampleSize || again.AcceptanceNumber != stored.AcceptanceNumber || again.RejectionNumber != stored.RejectionNumber
            || again.TableSampleSize != stored.TableSampleSize || again.IsFullInspection != stored.IsFullInspection
            || again.TableLetter != stored.TableLetter || again.LetterUsed != stored.LetterUsed || again.StandardName != stored.StandardName)
        {
            throw new InvalidDataException(FormattableString.Invariant(
                $"lot {lotNumber}: the stored plan (n {stored.SampleSize}, Ac {stored.AcceptanceNumber}, Re {stored.RejectionNumber}) is not what the planner gives for its inputs (n {again.SampleSize}, Ac {again.AcceptanceNumber}, Re {again.RejectionNumber})"));
        }
        return plan;
    }

    private static T Need<T>(T? value, string field, string lotNumber)
        where T : struct =>
        value ?? throw new InvalidDataException($"lot {lotNumber}: the stored plan has no {field}");
}
