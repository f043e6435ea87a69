using FilterQA.Core.Decisions;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Data;
using FilterQA.Data.Services;
using FilterQA.Data.Services.Certificates;
using FilterQA.Web.Ui.Charts;

namespace FilterQA.Web.Ui.Services;

/// <summary>
/// Reads a lot for its page and carries out the approver's dispositions. The services enforce who may do
/// what; this class turns their refusals into a message for the page instead of an error screen.
/// </summary>
public sealed class LotPageModel(LotService lots, LotUnitsReader units, TemplateCatalog templates, CertificateService certificates)
{
    /// <summary>The lot's summary, statistics, units and overlay.</summary>
    /// <exception cref="RecordNotFoundException">The lot does not exist.</exception>
    public async Task<LotPage> LoadAsync(string lotNumber, int envelopeBins = EnvelopeDecimator.DefaultBinCount, CancellationToken cancellationToken = default)
    {
        LotSummary summary = await lots.GetSummaryAsync(lotNumber, cancellationToken).ConfigureAwait(false);
        LotStatistics statistics = await lots.GetStatisticsAsync(lotNumber, cancellationToken).ConfigureAwait(false);
        IReadOnlyList<UnitRow> rows = await units.UnitsAsync(lotNumber, cancellationToken).ConfigureAwait(false);
        IReadOnlyList<ResponseTrace> traces = await units.CountedTracesAsync(lotNumber, cancellationToken).ConfigureAwait(false);
        LossEnvelope envelope = EnvelopeDecimator.Decimate(traces, envelopeBins);
        LimitTemplate template = await templates.LoadAsync(summary.PartNumber, summary.TemplateRevision, cancellationToken).ConfigureAwait(false);
        (IReadOnlyList<MaskLine> mask, string note) = PlaceMask(template, traces, rows);
        IssuedCertificate? certificate = await certificates.GetAsync(lotNumber, cancellationToken).ConfigureAwait(false);
        return new LotPage(summary, statistics, rows, envelope, mask, note, certificate?.CertificateNumber);
    }

    /// <summary>Accepts or rejects the lot as its plan decides.</summary>
    public Task<LotActionResult> DecideAsync(string lotNumber, Actor actor) => Run(() => lots.DecideAsync(lotNumber, actor));

    /// <summary>Holds the lot with a reason.</summary>
    public Task<LotActionResult> HoldAsync(string lotNumber, string? reason, Actor actor) =>
        string.IsNullOrWhiteSpace(reason)
            ? Task.FromResult(new LotActionResult(null, "Give a reason for the hold."))
            : Run(() => lots.HoldAsync(lotNumber, reason.Trim(), actor));

    /// <summary>Releases a hold.</summary>
    public Task<LotActionResult> ReleaseHoldAsync(string lotNumber, Actor actor) => Run(() => lots.ReleaseHoldAsync(lotNumber, actor));

    /// <summary>Accepts or rejects the lot against or without the plan, with a reason (approvers only; the service checks).</summary>
    public Task<LotActionResult> OverrideAsync(string lotNumber, bool accept, string? reason, Actor actor) =>
        string.IsNullOrWhiteSpace(reason)
            ? Task.FromResult(new LotActionResult(null, "Give the reason for overriding the plan."))
            : Run(() => lots.OverrideAsync(lotNumber, accept, reason.Trim(), actor));

    private static async Task<LotActionResult> Run(Func<Task<LotSummary>> action)
    {
        try
        {
            return new LotActionResult(await action().ConfigureAwait(false), null);
        }
        catch (Exception e) when (e is StorageRuleException or RecordNotFoundException or ArgumentException)
        {
            return new LotActionResult(null, e.Message);
        }
    }

    // Limit lines anchored to a measured centre or relative to the least loss move from unit to unit, so the
    // overlay places them as for one unit (the first of the sample with a transmission sweep) and says so.
    private static (IReadOnlyList<MaskLine>, string) PlaceMask(LimitTemplate template, IReadOnlyList<ResponseTrace> traces, IReadOnlyList<UnitRow> rows)
    {
        int index = -1;
        for (int i = 0; i < traces.Count; i++)
        {
            if (traces[i].Path == ResponsePath.Transmission)
            {
                index = i;
                break;
            }
        }
        if (index < 0)
        {
            return ([], traces.Count == 0 ? "No unit measured yet." : "These sweeps are reflections; the template's limit lines apply to transmission.");
        }
        string serial = rows.Where(r => r.CountedMeasurementId is not null).Select(r => r.Serial).ElementAtOrDefault(index) ?? "the first unit";
        try
        {
            IReadOnlyList<MaskLine> lines = MaskPlacement.ForTrace(template, traces[index], serial);
            return (lines, lines.Count == 0
                ? "The template has no limit lines to draw."
                : $"Limit lines placed as for unit {serial}; lines that follow a measured centre or the least loss shift a little from unit to unit.");
        }
        catch (ArgumentException e)
        {
            return ([], $"The limit lines cannot be placed: {e.Message}");
        }
    }
}
