using FilterQA.Core.Sampling;
using FilterQA.Data.Entities;
using FilterQA.Data.Services;

namespace FilterQA.Web.Api.Intake;

/// <summary>Where a lot stands: units tested of the sample size, counts, the plan's numbers and what it says so far.</summary>
public sealed record LotProgress(string LotNumber, string PartNumber, int TemplateRevision, LotStatus Status, int SampleSize, int UnitsTested,
    int Go, int NoGo, int NotVerifiable, int AcceptanceNumber, int RejectionNumber, LotDecision Decision)
{
    public static LotProgress From(LotSummary lot)
    {
        ArgumentNullException.ThrowIfNull(lot);
        return new(lot.LotNumber, lot.PartNumber, lot.TemplateRevision, lot.Status, lot.Plan.SampleSize, lot.UnitsTested, lot.Go, lot.NoGo,
            lot.NotVerifiable, lot.Plan.AcceptanceNumber, lot.Plan.RejectionNumber, lot.Decision);
    }
}
