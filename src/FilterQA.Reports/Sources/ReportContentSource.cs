using System.Threading.Channels;
using FilterQA.Core.Decisions;
using FilterQA.Core.Sampling;
using FilterQA.Core.Statistics;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Data;
using FilterQA.Data.Codecs;
using FilterQA.Data.Entities;
using FilterQA.Data.Services;
using FilterQA.Data.Services.Certificates;
using FilterQA.Reports.Charts;
using FilterQA.Reports.Documents;
using FilterQA.Reports.Text;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Reports.Sources;

/// <summary>
/// Reads what the documents print from storage (lot summaries and statistics through <see cref="LotService"/>,
/// templates through <see cref="TemplateCatalog"/>, traces through <see cref="MeasurementStore"/> and the compact
/// trace codec) into plain content records. The renderers never touch the database.
/// </summary>
public sealed class ReportContentSource(IDbContextFactory<FilterQaDbContext> contexts, LotService lots, MeasurementStore measurements,
    TemplateCatalog templates, TimeProvider clock)
{
    /// <summary>Most lots a part's yield report covers.</summary>
    public const int MaxLotsPerReport = 500;

    /// <exception cref="RecordNotFoundException">The lot does not exist.</exception>
    /// <exception cref="ReportRefusedException">The lot is not rejected.</exception>
    public async Task<RejectionReportContent> RejectionAsync(string lotNumber, string requestedBy, CancellationToken cancellationToken = default)
    {
        LotSummary lot = await lots.GetSummaryAsync(lotNumber, cancellationToken).ConfigureAwait(false);
        if (lot.Status != LotStatus.Rejected)
        {
            throw new ReportRefusedException($"lot {lotNumber} is {lot.Status}, not rejected; a rejection report is made for a rejected lot only");
        }
        LotStatistics statistics = await lots.GetStatisticsAsync(lotNumber, cancellationToken).ConfigureAwait(false);
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        LotHeader header = await HeaderAsync(context, lot, cancellationToken).ConfigureAwait(false);
        IReadOnlyList<NonConformingUnit> failing = await NonConformingAsync(context, [lot.Id], cancellationToken).ConfigureAwait(false);
        return new RejectionReportContent(header, lot.UnitsTested, lot.Defectives, Say.Decision(lot.SampleDecision ?? lot.Decision), lot.DispositionBy,
            lot.DispositionAt, lot.DispositionReason, lot.DispositionIsOverride, failing, statistics.FailingRules.Entries, Stamp(requestedBy));
    }

    /// <exception cref="RecordNotFoundException">The lot does not exist.</exception>
    public async Task<YieldReportContent> LotYieldAsync(string lotNumber, string requestedBy, CancellationToken cancellationToken = default)
    {
        LotSummary lot = await lots.GetSummaryAsync(lotNumber, cancellationToken).ConfigureAwait(false);
        LotStatistics statistics = await lots.GetStatisticsAsync(lotNumber, cancellationToken).ConfigureAwait(false);
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        string description = await DescriptionAsync(context, lot.PartNumber, cancellationToken).ConfigureAwait(false);
        return await YieldAsync(context, "lot " + lotNumber, lot.PartNumber, description, [(lot, statistics)], statistics.Parameters, requestedBy,
            cancellationToken).ConfigureAwait(false);
    }

    /// <summary>The lots of <paramref name="partNumber"/> registered from the start of <paramref name="from"/> to the end of <paramref name="to"/> (UTC days).</summary>
    /// <exception cref="RecordNotFoundException">The part is not registered.</exception>
    /// <exception cref="ReportRefusedException">The period is reversed, or holds no lot, or more than <see cref="MaxLotsPerReport"/>.</exception>
    public async Task<YieldReportContent> PartYieldAsync(string partNumber, DateOnly from, DateOnly to, string requestedBy, CancellationToken cancellationToken = default)
    {
        if (to < from)
        {
            throw new ReportRefusedException($"the period ends ({to:yyyy-MM-dd}) before it starts ({from:yyyy-MM-dd})");
        }
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        string description = await DescriptionAsync(context, partNumber, cancellationToken).ConfigureAwait(false);
        var start = new DateTimeOffset(from.ToDateTime(TimeOnly.MinValue), TimeSpan.Zero);
        var end = new DateTimeOffset(to.AddDays(1).ToDateTime(TimeOnly.MinValue), TimeSpan.Zero);
        IReadOnlyList<LotSummary> found = await lots.FindLotsAsync(new LotQuery { PartNumber = partNumber, CreatedFrom = start, CreatedTo = end, Take = MaxLotsPerReport + 1 },
            cancellationToken).ConfigureAwait(false);
        if (found.Count == 0)
        {
            throw new ReportRefusedException($"no lot of part {partNumber} was registered from {from:yyyy-MM-dd} to {to:yyyy-MM-dd}");
        }
        if (found.Count > MaxLotsPerReport)
        {
            throw new ReportRefusedException($"part {partNumber} has more than {MaxLotsPerReport} lots from {from:yyyy-MM-dd} to {to:yyyy-MM-dd}; choose a shorter period");
        }
        var perLot = new List<(LotSummary, LotStatistics)>(found.Count);
        foreach (LotSummary lot in found.OrderBy(l => l.CreatedAt).ThenBy(l => l.Id))
        {
            perLot.Add((lot, await lots.GetStatisticsAsync(lot.LotNumber, cancellationToken).ConfigureAwait(false)));
        }
        IReadOnlyList<ParameterSummary> parameters = await ParametersAsync(context, perLot.Select(l => l.Item1.Id).ToArray(), cancellationToken).ConfigureAwait(false);
        return await YieldAsync(context, $"{from:yyyy-MM-dd} to {to:yyyy-MM-dd}", partNumber, description, perLot, parameters, requestedBy, cancellationToken)
            .ConfigureAwait(false);
    }

    /// <exception cref="RecordNotFoundException">No measurement has that id.</exception>
    public async Task<UnitReportContent> UnitAsync(long measurementId, string requestedBy, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var row = await context.Measurements.AsNoTracking().Where(m => m.Id == measurementId)
            .Select(m => new
            {
                m.Id, m.Attempt, m.CountsForLot, m.Verdict, m.OperatorName, m.MeasuredAt, m.Warnings,
                Serial = m.Unit!.Serial,
                LotNumber = m.Unit.Lot!.LotNumber,
                PartNumber = m.Unit.Lot.Part!.PartNumber,
                Station = m.Station!.Name,
                ThruAt = m.ThruReference == null ? (DateTimeOffset?)null : m.ThruReference.MeasuredAt,
                ThruFlatnessDb = m.ThruReference == null ? (double?)null : m.ThruReference.FlatnessDb,
                m.ThruReferenceId,
                m.Sweep.FileName,
                m.Sweep.RawSha256,
                m.TemplateRevisionId,
            })
            .SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException($"measurement {measurementId} does not exist");
        var revision = await context.TemplateRevisions.AsNoTracking().Where(r => r.Id == row.TemplateRevisionId)
            .Select(r => new { r.Revision, r.DecisionRule }).SingleAsync(cancellationToken).ConfigureAwait(false);
        List<RuleResultRecord> rules = await context.RuleResults.AsNoTracking().Where(r => r.MeasurementId == measurementId)
            .OrderBy(r => r.Ordinal).ToListAsync(cancellationToken).ConfigureAwait(false);
        ResponseTrace trace = await measurements.ReadTraceAsync(measurementId, cancellationToken).ConfigureAwait(false);
        LimitTemplate template = await templates.LoadAsync(row.PartNumber, revision.Revision, cancellationToken).ConfigureAwait(false);
        (IReadOnlyList<MaskLine> mask, _) = PlaceMask(template, trace, row.Serial);
        string thru = row.ThruAt is { } thruAt
            ? FormattableString.Invariant($"thru {row.ThruReferenceId} recorded {Say.Time(thruAt)}, flatness {row.ThruFlatnessDb:F2} dB")
            : "no thru (network sweep taken as calibrated)";
        return new UnitReportContent(row.Id, row.LotNumber, row.PartNumber, revision.Revision, row.Serial, row.Attempt, row.CountsForLot, Say.Verdict(row.Verdict),
            row.Station, row.OperatorName, row.MeasuredAt, thru, row.FileName, row.RawSha256, trace, mask,
            rules.Select(r => Line(r, revision.DecisionRule)).ToArray(),
            row.Warnings.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries), Stamp(requestedBy));
    }

    private async Task<YieldReportContent> YieldAsync(FilterQaDbContext context, string scope, string partNumber, string description,
        IReadOnlyList<(LotSummary Lot, LotStatistics Statistics)> perLot, IReadOnlyList<ParameterSummary> parameters, string requestedBy,
        CancellationToken cancellationToken)
    {
        LotYieldRow[] rows = perLot.Select(l => new LotYieldRow(l.Lot.LotNumber, l.Lot.Supplier, l.Lot.CreatedAt, Say.Status(l.Lot.Status),
            l.Statistics.Yield.UnitsTested, l.Statistics.Yield.FirstPassGo, l.Statistics.Yield.FinalGo)).ToArray();
        ParetoChart pareto = ParetoChart.FromCounts(perLot.SelectMany(l => l.Statistics.FailingRules.Entries)
            .GroupBy(e => e.Rule, StringComparer.Ordinal).Select(g => new KeyValuePair<string, int>(g.Key, g.Sum(e => e.Count))));
        long[] lotIds = perLot.Select(l => l.Lot.Id).ToArray();
        (LossEnvelope envelope, List<ResponseTrace> examples, ResponseTrace? transmission) =
            await CountedSweepsAsync(context, lotIds, cancellationToken).ConfigureAwait(false);
        IReadOnlyList<NonConformingUnit> failing = await NonConformingAsync(context, lotIds, cancellationToken).ConfigureAwait(false);
        LotSummary first = perLot[0].Lot;
        LimitTemplate template = await templates.LoadAsync(first.PartNumber, first.TemplateRevision, cancellationToken).ConfigureAwait(false);
        (IReadOnlyList<MaskLine> mask, string note) = transmission is null
            ? ([], envelope.TraceCount == 0 ? "No unit measured yet." : "These sweeps are reflections; the limit lines apply to transmission.")
            : PlaceMask(template, transmission, "the first unit");
        if (perLot.Select(l => l.Lot.TemplateRevision).Distinct().Count() > 1)
        {
            note += FormattableString.Invariant($" The lots were tested against different template revisions; the lines are those of revision {first.TemplateRevision}.");
        }
        return new YieldReportContent(scope, partNumber, description, rows, pareto.Entries, parameters, envelope, examples, mask, note, failing,
            Stamp(requestedBy));
    }

    /// <summary>Units of a yield report drawn as single lines beside the envelope of all of them.</summary>
    public const int ExampleSweeps = 3;

    // Every counted sweep is folded into the envelope as it is read and then dropped, so a period of many lots needs
    // memory for the bins and three example sweeps only. The span comes first from the stored sweep columns. Decoding
    // the compact traces is most of the work, so one worker per core decodes into its own accumulator while this
    // method reads the rows; the accumulators are merged at the end (min and max do not depend on the order).
    private static async Task<(LossEnvelope Envelope, List<ResponseTrace> Examples, ResponseTrace? FirstTransmission)> CountedSweepsAsync(
        FilterQaDbContext context, long[] lotIds, CancellationToken cancellationToken)
    {
        IQueryable<MeasurementRecord> counted = context.Units.AsNoTracking().Where(u => lotIds.Contains(u.LotId) && u.CountedMeasurementId != null)
            .Join(context.Measurements.AsNoTracking(), u => u.CountedMeasurementId, m => (long?)m.Id, (u, m) => m);
        var span = await counted.GroupBy(m => 1)
            .Select(g => new { Count = g.Count(), StartHz = g.Min(m => m.Sweep.StartHz), StopHz = g.Max(m => m.Sweep.StopHz) })
            .SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false);
        if (span is null || span.Count == 0)
        {
            return (LossEnvelope.Empty, [], null);
        }
        var picks = new HashSet<int>(Enumerable.Range(0, Math.Min(ExampleSweeps, span.Count))
            .Select(i => ExampleSweeps == 1 || span.Count == 1 ? 0 : (int)((long)i * (span.Count - 1) / (Math.Min(ExampleSweeps, span.Count) - 1))));
        IAsyncEnumerable<byte[]> blobs = context.Units.AsNoTracking().Where(u => lotIds.Contains(u.LotId) && u.CountedMeasurementId != null)
            .OrderBy(u => u.LotId).ThenBy(u => u.SamplePosition)
            .Join(context.Measurements.AsNoTracking(), u => u.CountedMeasurementId, m => (long?)m.Id, (u, m) => m.Sweep.Trace)
            .AsAsyncEnumerable();

        using var stop = CancellationTokenSource.CreateLinkedTokenSource(cancellationToken);
        var queue = Channel.CreateBounded<(int Index, byte[] Blob)>(new BoundedChannelOptions(64) { SingleWriter = true });
        var workers = new SweepWorker[Math.Max(1, Environment.ProcessorCount)];
        for (int w = 0; w < workers.Length; w++)
        {
            workers[w] = new SweepWorker(new EnvelopeAccumulator(span.StartHz, span.StopHz, EnvelopeBuilder.DefaultBinCount), picks);
        }
        Task[] running = workers.Select(worker => Task.Run(() => worker.RunAsync(queue.Reader, stop), stop.Token)).ToArray();
        int index = 0;
        try
        {
            await foreach (byte[] blob in blobs.WithCancellation(stop.Token).ConfigureAwait(false))
            {
                await queue.Writer.WriteAsync((index++, blob), stop.Token).ConfigureAwait(false);
            }
        }
        catch (OperationCanceledException) when (!cancellationToken.IsCancellationRequested)
        {
            // A worker failed and stopped the reading; its exception is thrown by the wait below.
        }
        finally
        {
            queue.Writer.TryComplete();
        }
        await Task.WhenAll(running).ConfigureAwait(false);

        EnvelopeAccumulator envelope = workers[0].Envelope;
        foreach (SweepWorker worker in workers.Skip(1))
        {
            envelope.Merge(worker.Envelope);
        }
        List<ResponseTrace> examples = workers.SelectMany(w => w.Picked).OrderBy(p => p.Index).Select(p => p.Trace).ToList();
        ResponseTrace? transmission = workers.Where(w => w.FirstTransmission is not null).MinBy(w => w.FirstTransmissionIndex)?.FirstTransmission;
        return (envelope.ToEnvelope(), examples, transmission);
    }

    /// <summary>One decoding worker of <see cref="CountedSweepsAsync"/>: its own envelope, the example sweeps it met, its earliest transmission.</summary>
    private sealed class SweepWorker(EnvelopeAccumulator envelope, HashSet<int> picks)
    {
        public EnvelopeAccumulator Envelope { get; } = envelope;

        public List<(int Index, ResponseTrace Trace)> Picked { get; } = [];

        public int FirstTransmissionIndex { get; private set; } = int.MaxValue;

        public ResponseTrace? FirstTransmission { get; private set; }

        public async Task RunAsync(ChannelReader<(int Index, byte[] Blob)> queue, CancellationTokenSource stop)
        {
            try
            {
                await foreach ((int index, byte[] blob) in queue.ReadAllAsync(stop.Token).ConfigureAwait(false))
                {
                    ResponseTrace trace = ResponseTraceCodec.Decode(blob);
                    Envelope.Add(trace);
                    if (picks.Contains(index))
                    {
                        Picked.Add((index, trace));
                    }
                    if (index < FirstTransmissionIndex && trace.Path == ResponsePath.Transmission)
                    {
                        (FirstTransmissionIndex, FirstTransmission) = (index, trace);
                    }
                }
            }
            catch
            {
                // Stop the reader (and the other workers) so nobody waits on a queue this worker no longer empties.
                await stop.CancelAsync().ConfigureAwait(false);
                throw;
            }
        }
    }

    private static async Task<IReadOnlyList<NonConformingUnit>> NonConformingAsync(FilterQaDbContext context, long[] lotIds, CancellationToken cancellationToken)
    {
        var units = await context.Units.AsNoTracking().Where(u => lotIds.Contains(u.LotId) && u.CountedMeasurementId != null && u.CountedVerdict != UnitVerdict.Go)
            .Join(context.Measurements.AsNoTracking(), u => u.CountedMeasurementId, m => (long?)m.Id, (u, m) => new
            {
                u.LotId, LotNumber = u.Lot!.LotNumber, u.SamplePosition, u.Serial, m.Attempt, u.CountedVerdict, MeasurementId = m.Id, m.TemplateRevisionId,
            })
            .OrderBy(u => u.LotId).ThenBy(u => u.SamplePosition)
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        long[] ids = units.Select(u => u.MeasurementId).ToArray();
        long[] revisionIds = units.Select(u => u.TemplateRevisionId).Distinct().ToArray();
        Dictionary<long, DecisionRule> decisionRules = await context.TemplateRevisions.AsNoTracking().Where(r => revisionIds.Contains(r.Id))
            .ToDictionaryAsync(r => r.Id, r => r.DecisionRule, cancellationToken).ConfigureAwait(false);
        ILookup<long, RuleResultRecord> rules = (await context.RuleResults.AsNoTracking().Where(r => ids.Contains(r.MeasurementId))
            .OrderBy(r => r.MeasurementId).ThenBy(r => r.Ordinal).ToListAsync(cancellationToken).ConfigureAwait(false)).ToLookup(r => r.MeasurementId);
        return units.Select(u =>
        {
            DecisionRule decision = decisionRules[u.TemplateRevisionId];
            RuleLine[] blocking = rules[u.MeasurementId].Select(r => Line(r, decision)).Where(r => r.Blocking).ToArray();
            return new NonConformingUnit(u.LotNumber, u.Serial, u.Attempt, Say.Verdict(u.CountedVerdict), blocking);
        }).ToArray();
    }

    // Over several lots: each rule's counted values pooled, its limits as the rules record them (as the lot statistics do).
    private static async Task<IReadOnlyList<ParameterSummary>> ParametersAsync(FilterQaDbContext context, long[] lotIds, CancellationToken cancellationToken)
    {
        List<RuleResultRecord> results = await context.Units.AsNoTracking().Where(u => lotIds.Contains(u.LotId))
            .Join(context.RuleResults.AsNoTracking(), u => u.CountedMeasurementId, r => (long?)r.MeasurementId, (u, r) => r)
            .OrderBy(r => r.Ordinal).ThenBy(r => r.MeasurementId)
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        return RuleParameters.Summarise(results);
    }

    private static async Task<LotHeader> HeaderAsync(FilterQaDbContext context, LotSummary lot, CancellationToken cancellationToken)
    {
        string description = await DescriptionAsync(context, lot.PartNumber, cancellationToken).ConfigureAwait(false);
        SamplingPlan plan = lot.Plan;
        return new LotHeader(lot.LotNumber, lot.PartNumber, description, lot.TemplateRevision, lot.TemplateHash, lot.Supplier, lot.SupplierLot, lot.DateCode,
            lot.PurchaseOrder, lot.Customer, lot.QuantityReceived, Say.Status(lot.Status), lot.CreatedAt,
            new CertificatePlan(plan.StandardName, plan.Level?.ToString(), plan.Severity?.ToString(), plan.AqlPercent, plan.LetterUsed?.ToString(),
                plan.SampleSize, plan.AcceptanceNumber, plan.RejectionNumber, plan.IsFullInspection));
    }

    private static async Task<string> DescriptionAsync(FilterQaDbContext context, string partNumber, CancellationToken cancellationToken) =>
        await context.Parts.AsNoTracking().Where(p => p.PartNumber == partNumber).Select(p => p.Description)
            .SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false)
        ?? throw new RecordNotFoundException($"part {partNumber} is not registered");

    private static RuleLine Line(RuleResultRecord r, DecisionRule decision) =>
        new(r.RuleId, r.Title, r.Unit.Symbol(), r.MeasuredValue, r.LimitValue, r.Sense, r.Margin, r.Outcome, !UnitEvaluation.Passes(r.Outcome, decision));

    // Limit lines that follow a measured centre or the least loss move from unit to unit: they are placed as for one unit, and the note says so.
    private static (IReadOnlyList<MaskLine> Mask, string Note) PlaceMask(LimitTemplate template, ResponseTrace trace, string serial)
    {
        try
        {
            IReadOnlyList<MaskLine> lines = MaskPlacement.ForTrace(template, trace, serial);
            return (lines, lines.Count == 0
                ? "The template has no limit lines to draw."
                : $"Limit lines placed as for {serial}; lines that follow a measured centre or the least loss shift a little from unit to unit.");
        }
        catch (ArgumentException e)
        {
            return ([], $"The limit lines cannot be placed: {e.Message}");
        }
    }

    private ReportStamp Stamp(string requestedBy) => new(requestedBy, clock.GetUtcNow());
}
