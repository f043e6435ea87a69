using System.Globalization;
using FilterQA.Core.Decisions;
using FilterQA.Core.Sampling;
using FilterQA.Core.Statistics;
using FilterQA.Core.Templates;
using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Services;

/// <summary>Lots: creation with a sampling plan, hold, disposition, summary and statistics.</summary>
public sealed class LotService(IDbContextFactory<FilterQaDbContext> contexts, TimeProvider clock)
{
    private const int MaxConflictRetries = 5;

    /// <summary>
    /// Registers a delivery as a lot against a released template revision, with its plan made by
    /// <see cref="SamplingPlanner"/>; for MIL-STD-105E without an explicit severity, the severity
    /// comes from the switching history of the same part and supplier. Audited.
    /// </summary>
    public async Task<LotSummary> CreateLotAsync(NewLot request, Actor actor, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(actor);
        ArgumentException.ThrowIfNullOrWhiteSpace(request.LotNumber);
        ArgumentException.ThrowIfNullOrWhiteSpace(request.Supplier);
        ArgumentNullException.ThrowIfNull(request.Plan);
        if (request.QuantityReceived < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(request), request.QuantityReceived, "the quantity received must be at least 1 unit");
        }
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        await using var transaction = await context.Database.BeginTransactionAsync(cancellationToken).ConfigureAwait(false);
        PartRecord part = await context.Parts.SingleOrDefaultAsync(p => p.PartNumber == request.PartNumber, cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException($"part {request.PartNumber} is not registered");
        if (await context.Lots.AnyAsync(l => l.LotNumber == request.LotNumber, cancellationToken).ConfigureAwait(false))
        {
            throw new StorageRuleException($"lot {request.LotNumber} already exists");
        }
        TemplateRevisionRecord revision = await ReleasedRevisionAsync(context, part, request.TemplateRevision, cancellationToken).ConfigureAwait(false);
        (SamplingPlan plan, string reason) = await PlanAsync(context, part, request, actor, cancellationToken).ConfigureAwait(false);
        var lot = new LotRecord
        {
            LotNumber = request.LotNumber,
            PartId = part.Id,
            TemplateRevisionId = revision.Id,
            Supplier = request.Supplier,
            SupplierLot = request.SupplierLot,
            DateCode = request.DateCode,
            QuantityReceived = request.QuantityReceived,
            PurchaseOrder = request.PurchaseOrder,
            Customer = request.Customer,
            Plan = PlanRecords.ToRecord(plan, reason),
            Status = LotStatus.Open,
            CreatedAt = clock.GetUtcNow(),
            CreatedBy = actor.Name,
            Counters = new LotCounters(),
        };
        context.Lots.Add(lot);
        await context.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        Audit.Add(context, clock, actor, AuditAction.LotCreated, "lot", lot.LotNumber, FormattableString.Invariant(
            $"{part.PartNumber} revision {revision.Revision} from {lot.Supplier}, {lot.QuantityReceived} received; {plan.StandardName} n {plan.SampleSize} Ac {plan.AcceptanceNumber} Re {plan.RejectionNumber}; {reason}"),
            lot.Id);
        await context.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        await transaction.CommitAsync(cancellationToken).ConfigureAwait(false);
        return Summary(lot, part.PartNumber, revision.Revision, revision.ContentHash);
    }

    /// <summary>Moves a lot to another released revision of its part; allowed only before its first unit is tested.</summary>
    public Task<LotSummary> ChangeTemplateRevisionAsync(string lotNumber, int revision, Actor actor, CancellationToken cancellationToken = default) =>
        ChangeAsync(lotNumber, actor, async (context, lot) =>
        {
            if (lot.Counters.UnitsTested > 0 || lot.Status != LotStatus.Open)
            {
                throw new StorageRuleException(FormattableString.Invariant(
                    $"lot {lotNumber}: the template revision is fixed once the first unit is tested ({lot.Counters.UnitsTested} tested, status {lot.Status})"));
            }
            TemplateRevisionRecord target = await ReleasedRevisionAsync(context, lot.Part!, revision, cancellationToken).ConfigureAwait(false);
            int previous = lot.TemplateRevision!.Revision;
            lot.TemplateRevisionId = target.Id;
            lot.TemplateRevision = target;
            Audit.Add(context, clock, actor, AuditAction.LotTemplateChanged, "lot", lotNumber,
                FormattableString.Invariant($"template revision {previous} → {target.Revision}"), lot.Id);
        }, cancellationToken);

    /// <summary>Holds a lot: no measurement is stored until the hold is released or the lot dispositioned.</summary>
    public Task<LotSummary> HoldAsync(string lotNumber, string reason, Actor actor, CancellationToken cancellationToken = default)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(reason);
        return ChangeAsync(lotNumber, actor, (context, lot) =>
        {
            if (lot.Status is not (LotStatus.Open or LotStatus.InTest))
            {
                throw new StorageRuleException($"lot {lotNumber} is {lot.Status}; only an open lot or a lot in test can be held");
            }
            lot.Status = LotStatus.Held;
            lot.HoldReason = reason;
            Audit.Add(context, clock, actor, AuditAction.LotHeld, "lot", lotNumber, "held", lot.Id, reason);
        }, cancellationToken);
    }

    /// <summary>Releases a hold; the lot returns to test (or to open when nothing was tested).</summary>
    public Task<LotSummary> ReleaseHoldAsync(string lotNumber, Actor actor, CancellationToken cancellationToken = default) =>
        ChangeAsync(lotNumber, actor, (context, lot) =>
        {
            if (lot.Status != LotStatus.Held)
            {
                throw new StorageRuleException($"lot {lotNumber} is {lot.Status}, not held");
            }
            lot.Status = lot.Counters.UnitsTested > 0 ? LotStatus.InTest : LotStatus.Open;
            Audit.Add(context, clock, actor, AuditAction.LotHoldReleased, "lot", lotNumber, $"hold released ({lot.HoldReason})", lot.Id);
            lot.HoldReason = null;
        }, cancellationToken);

    /// <summary>
    /// Accepts or rejects the lot as its plan decides (<see cref="LotDisposition.Decide"/>): when the
    /// sample is complete, or earlier once the defectives reach the rejection number. Audited.
    /// </summary>
    public Task<LotSummary> DecideAsync(string lotNumber, Actor actor, CancellationToken cancellationToken = default) =>
        ChangeAsync(lotNumber, actor, (context, lot) =>
        {
            if (lot.Status != LotStatus.InTest)
            {
                throw new StorageRuleException($"lot {lotNumber} is {lot.Status}; the plan decides a lot in test (release a hold first, or override)");
            }
            SamplingPlan plan = PlanRecords.FromRecord(lot.Plan, lotNumber);
            LotDecision decision = LotDisposition.Decide(plan, lot.Counters.UnitsTested, lot.Counters.Defectives);
            if (decision == LotDecision.Pending)
            {
                throw new StorageRuleException(FormattableString.Invariant(
                    $"lot {lotNumber}: the sample is incomplete ({lot.Counters.UnitsTested} of {plan.SampleSize} tested, {lot.Counters.Defectives} defectives); the plan cannot decide yet"));
            }
            lot.Status = decision is LotDecision.Accept or LotDecision.AcceptReturnToNormal ? LotStatus.Accepted : LotStatus.Rejected;
            lot.SampleDecision = decision;
            lot.DispositionAt = clock.GetUtcNow();
            lot.DispositionBy = actor.Name;
            lot.DispositionIsOverride = false;
            lot.DispositionReason = FormattableString.Invariant(
                $"{decision} by the plan: {lot.Counters.Defectives} defectives in {lot.Counters.UnitsTested} tested (n {plan.SampleSize}, Ac {plan.AcceptanceNumber}, Re {plan.RejectionNumber})");
            Audit.Add(context, clock, actor, AuditAction.LotDispositioned, "lot", lotNumber, lot.DispositionReason, lot.Id);
        }, cancellationToken);

    /// <summary>
    /// Accepts or rejects the lot against (or without) the plan's decision. Needs an approver and a
    /// reason; the plan's own decision for the units tested is kept beside it. Audited.
    /// </summary>
    public Task<LotSummary> OverrideAsync(string lotNumber, bool accept, string reason, Actor actor, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(actor);
        if (!actor.IsApprover)
        {
            throw new StorageRuleException($"{actor.Name} is not an approver; overriding the disposition of lot {lotNumber} needs an approver");
        }
        if (string.IsNullOrWhiteSpace(reason))
        {
            throw new StorageRuleException($"overriding the disposition of lot {lotNumber} needs a reason");
        }
        return ChangeAsync(lotNumber, actor, (context, lot) =>
        {
            SamplingPlan plan = PlanRecords.FromRecord(lot.Plan, lotNumber);
            LotDecision byPlan = LotDisposition.Decide(plan, lot.Counters.UnitsTested, lot.Counters.Defectives);
            LotStatus before = lot.Status;
            lot.Status = accept ? LotStatus.Accepted : LotStatus.Rejected;
            lot.SampleDecision = byPlan;
            lot.DispositionAt = clock.GetUtcNow();
            lot.DispositionBy = actor.Name;
            lot.DispositionIsOverride = true;
            lot.DispositionReason = reason;
            lot.HoldReason = null;
            Audit.Add(context, clock, actor, AuditAction.LotDispositionOverridden, "lot", lotNumber, FormattableString.Invariant(
                $"{before} → {lot.Status} (plan says {byPlan}: {lot.Counters.Defectives} defectives in {lot.Counters.UnitsTested} of {plan.SampleSize})"), lot.Id, reason);
        }, cancellationToken);
    }

    /// <summary>The lot summary from the lot row (no sweep or rule result is read).</summary>
    public async Task<LotSummary> GetSummaryAsync(string lotNumber, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var row = await context.Lots.AsNoTracking().Where(l => l.LotNumber == lotNumber)
            .Select(l => new { Lot = l, l.Part!.PartNumber, l.TemplateRevision!.Revision, l.TemplateRevision.ContentHash })
            .SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException($"lot {lotNumber} does not exist");
        return Summary(row.Lot, row.PartNumber, row.Revision, row.ContentHash);
    }

    /// <summary>Lots matching <paramref name="query"/>, newest first.</summary>
    public async Task<IReadOnlyList<LotSummary>> FindLotsAsync(LotQuery query, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(query);
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        IQueryable<LotRecord> lots = context.Lots.AsNoTracking();
        if (query.PartNumber is { } partNumber)
        {
            lots = lots.Where(l => l.Part!.PartNumber == partNumber);
        }
        if (query.Supplier is { } supplier)
        {
            lots = lots.Where(l => l.Supplier == supplier);
        }
        if (query.Status is { } status)
        {
            lots = lots.Where(l => l.Status == status);
        }
        if (query.CreatedFrom is { } from)
        {
            lots = lots.Where(l => l.CreatedAt >= from);
        }
        if (query.CreatedTo is { } to)
        {
            lots = lots.Where(l => l.CreatedAt < to);
        }
        var rows = await lots.OrderByDescending(l => l.CreatedAt).ThenByDescending(l => l.Id)
            .Skip(query.Skip).Take(query.Take)
            .Select(l => new { Lot = l, l.Part!.PartNumber, l.TemplateRevision!.Revision, l.TemplateRevision.ContentHash })
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        return rows.Select(r => Summary(r.Lot, r.PartNumber, r.Revision, r.ContentHash)).ToArray();
    }

    /// <summary>The switching state of a part from a supplier over its decided MIL-STD-105E lots, in disposition order.</summary>
    public async Task<SwitchingState> GetSwitchingStateAsync(string partNumber, string supplier, SwitchingOptions? options = null, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        PartRecord part = await context.Parts.SingleOrDefaultAsync(p => p.PartNumber == partNumber, cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException($"part {partNumber} is not registered");
        return await SwitchingAsync(context, part.Id, supplier, options, cancellationToken).ConfigureAwait(false);
    }

    /// <summary>
    /// Yield (<see cref="YieldCalculator"/>) under the part's retest policy, Pareto
    /// (<see cref="ParetoChart"/>) of blocking rules in the counted measurements, and a
    /// <see cref="ParameterSummary"/> per rule with the rule's limits. Reads rule results, not sweeps.
    /// </summary>
    public async Task<LotStatistics> GetStatisticsAsync(string lotNumber, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var lot = await context.Lots.AsNoTracking().Where(l => l.LotNumber == lotNumber)
            .Select(l => new { l.Id, l.Part!.MaxRetests, l.Part.RetestCounts, l.TemplateRevision!.DecisionRule })
            .SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException($"lot {lotNumber} does not exist");

        var attempts = await context.Measurements.AsNoTracking().Where(m => m.LotId == lot.Id)
            .OrderBy(m => m.UnitId).ThenBy(m => m.Attempt)
            .Select(m => new { m.UnitId, m.Verdict })
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        RetestPolicy policy = lot.RetestCounts ? new RetestPolicy(lot.MaxRetests) : RetestPolicy.None;
        LotYield yield = YieldCalculator.Compute(
            attempts.GroupBy(a => a.UnitId).Select(g => (IReadOnlyList<bool>)g.Select(a => a.Verdict == UnitVerdict.Go).ToArray()), policy);

        List<RuleResultRecord> rules = await context.Units.AsNoTracking().Where(u => u.LotId == lot.Id)
            .Join(context.RuleResults.AsNoTracking(), u => u.CountedMeasurementId, r => (long?)r.MeasurementId, (u, r) => r)
            .OrderBy(r => r.Ordinal).ThenBy(r => r.MeasurementId)
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        ParetoChart pareto = ParetoChart.FromFailures(rules.Where(r => !UnitEvaluation.Passes(r.Outcome, lot.DecisionRule)).Select(r => r.RuleId));
        return new LotStatistics(yield, pareto, RuleParameters.Summarise(rules));
    }

    /// <summary>
    /// The trend of one rule's measured value across the lots of a part (and, when given, one supplier), in the
    /// order the lots were registered: per lot the mean, Cpk (performance index from the overall s, null when the
    /// rule has no limit) and first-pass and final yield. Lots with no unit tested or no value of that rule are
    /// left out. Reads rule results only, lot by lot (<see cref="GetStatisticsAsync"/>), never sweeps.
    /// </summary>
    /// <param name="partNumber">The part.</param>
    /// <param name="supplier">One supplier, or null for every supplier of the part.</param>
    /// <param name="ruleId">The rule whose measured value is followed (its id in the template).</param>
    /// <param name="maxLots">The most recent lots to include, 1 to 1000.</param>
    /// <param name="cancellationToken">Stops the reading.</param>
    public async Task<LotTrend> GetTrendAsync(string partNumber, string? supplier, string ruleId, int maxLots = 200,
        CancellationToken cancellationToken = default)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(partNumber);
        ArgumentException.ThrowIfNullOrWhiteSpace(ruleId);
        ArgumentOutOfRangeException.ThrowIfLessThan(maxLots, 1);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(maxLots, 1000);
        IReadOnlyList<LotSummary> lots = await FindLotsAsync(new LotQuery { PartNumber = partNumber, Supplier = supplier, Take = maxLots },
            cancellationToken).ConfigureAwait(false);
        var points = new List<LotTrendPoint>(lots.Count);
        foreach (LotSummary lot in lots.Where(l => l.UnitsTested > 0))
        {
            LotStatistics statistics = await GetStatisticsAsync(lot.LotNumber, cancellationToken).ConfigureAwait(false);
            if (statistics.Parameters.FirstOrDefault(p => p.Parameter == ruleId) is { } parameter)
            {
                points.Add(new LotTrendPoint(lot.LotNumber, lot.CreatedAt, parameter.Moments.Mean, parameter.Capability is { Cpk: var cpk } && double.IsFinite(cpk) ? cpk : null,
                    statistics.Yield.FirstPassYield, statistics.Yield.FinalYield));
            }
        }
        return LotTrend.Create(ruleId, points);
    }

    /// <summary>The lot's plan rebuilt by the planner from its stored inputs (and checked against the stored fields).</summary>
    public async Task<SamplingPlan> GetPlanAsync(string lotNumber, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        LotPlan stored = await context.Lots.AsNoTracking().Where(l => l.LotNumber == lotNumber).Select(l => l.Plan)
            .SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException($"lot {lotNumber} does not exist");
        return PlanRecords.FromRecord(stored, lotNumber);
    }

    internal static LotSummary Summary(LotRecord lot, string partNumber, int revision, string hash)
    {
        SamplingPlan plan = PlanRecords.FromRecord(lot.Plan, lot.LotNumber);
        LotCounters c = lot.Counters;
        return new LotSummary(lot.Id, lot.LotNumber, partNumber, revision, hash, lot.Supplier, lot.SupplierLot, lot.DateCode, lot.QuantityReceived,
            lot.PurchaseOrder, lot.Customer, plan, lot.Plan.SeverityReason, lot.Status, c.UnitsTested, c.Go, c.NoGo, c.NotVerifiable, c.Defectives,
            c.FirstPassGo, c.UnitsRetested, c.Measurements, LotDisposition.Decide(plan, c.UnitsTested, c.Defectives), lot.SampleDecision,
            lot.CreatedAt, lot.CreatedBy, lot.DispositionAt, lot.DispositionBy, lot.DispositionReason, lot.DispositionIsOverride);
    }

    private Task<LotSummary> ChangeAsync(string lotNumber, Actor actor, Action<FilterQaDbContext, LotRecord> change, CancellationToken cancellationToken) =>
        ChangeAsync(lotNumber, actor, (context, lot) =>
        {
            change(context, lot);
            return Task.CompletedTask;
        }, cancellationToken);

    private async Task<LotSummary> ChangeAsync(string lotNumber, Actor actor, Func<FilterQaDbContext, LotRecord, Task> change, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(actor);
        for (int attempt = 1; ; attempt++)
        {
            await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
            await using var transaction = await context.Database.BeginTransactionAsync(cancellationToken).ConfigureAwait(false);
            // Under the same lot lock as a unit being stored, so the change is decided on the latest row.
            await LotLock.AcquireAsync(context, lotNumber, cancellationToken).ConfigureAwait(false);
            LotRecord lot = await FindAsync(context, lotNumber, cancellationToken).ConfigureAwait(false);
            // A signed certificate vouches for the lot's record as it stands (its digest): the record is final from then on.
            if (await context.Certificates.AsNoTracking().Where(c => c.LotId == lot.Id)
                    .Select(c => new { c.CertificateNumber, c.SignerName, c.IssuedAt }).SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false) is { } certificate)
            {
                throw new StorageRuleException(string.Create(CultureInfo.InvariantCulture,
                    $"lot {lotNumber} has certificate of conformance {certificate.CertificateNumber}, signed by {certificate.SignerName} at {certificate.IssuedAt.UtcDateTime:yyyy-MM-dd HH:mm} UTC; a certified lot's record is final and is not changed"));
            }
            await change(context, lot).ConfigureAwait(false);
            lot.Version++;
            try
            {
                // The Version token still catches a writer that bypasses the lock; the change is then
                // decided again on the fresh row (its checks included).
                await context.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
                await transaction.CommitAsync(cancellationToken).ConfigureAwait(false);
                return Summary(lot, lot.Part!.PartNumber, lot.TemplateRevision!.Revision, lot.TemplateRevision.ContentHash);
            }
            catch (DbUpdateConcurrencyException) when (attempt < MaxConflictRetries)
            {
                await Task.Delay(TimeSpan.FromMilliseconds(10 * attempt), clock, cancellationToken).ConfigureAwait(false);
            }
        }
    }

    private static async Task<LotRecord> FindAsync(FilterQaDbContext context, string lotNumber, CancellationToken cancellationToken) =>
        await context.Lots.Include(l => l.Part).Include(l => l.TemplateRevision)
            .SingleOrDefaultAsync(l => l.LotNumber == lotNumber, cancellationToken).ConfigureAwait(false)
        ?? throw new RecordNotFoundException($"lot {lotNumber} does not exist");

    private static async Task<TemplateRevisionRecord> ReleasedRevisionAsync(FilterQaDbContext context, PartRecord part, int? revision, CancellationToken cancellationToken)
    {
        if (revision is { } wanted)
        {
            TemplateRevisionRecord found = await context.TemplateRevisions
                .SingleOrDefaultAsync(r => r.PartId == part.Id && r.Revision == wanted, cancellationToken).ConfigureAwait(false)
                ?? throw new RecordNotFoundException($"{TemplateCatalog.Key(part.PartNumber, wanted)} is not registered");
            return found.Status == TemplateStatus.Released
                ? found
                : throw new StorageRuleException($"{TemplateCatalog.Key(part.PartNumber, wanted)} is {found.Status}; a lot is tested against a released revision");
        }
        return await context.TemplateRevisions.Where(r => r.PartId == part.Id && r.Status == TemplateStatus.Released)
            .OrderByDescending(r => r.Revision).FirstOrDefaultAsync(cancellationToken).ConfigureAwait(false)
            ?? throw new StorageRuleException($"part {part.PartNumber} has no released template revision");
    }

    private async Task<(SamplingPlan Plan, string Reason)> PlanAsync(FilterQaDbContext context, PartRecord part, NewLot request, Actor actor, CancellationToken cancellationToken)
    {
        PlanRequest plan = request.Plan;
        int lotSize = request.QuantityReceived;
        switch (plan.Kind)
        {
            case SamplingPlanKind.Mil105ESingle:
                InspectionSeverity severity;
                string reason;
                if (plan.Severity is { } given)
                {
                    severity = given;
                    reason = $"severity {given} set by {actor.Name}";
                }
                else
                {
                    SwitchingState state = await SwitchingAsync(context, part.Id, request.Supplier, plan.Switching, cancellationToken).ConfigureAwait(false);
                    if (state.IsDiscontinued)
                    {
                        throw new StorageRuleException(
                            $"inspection of {part.PartNumber} from {request.Supplier} is discontinued ({state.Reason}); after corrective action give the severity explicitly");
                    }
                    severity = state.Severity;
                    reason = "switching rules: " + state.Reason;
                }
                return (SamplingPlanner.Mil105E(lotSize, plan.Level!.Value, severity, plan.AqlPercent!.Value), reason);
            case SamplingPlanKind.ZeroAcceptance:
                return (SamplingPlanner.ZeroAcceptance(lotSize, plan.LtpdFraction!.Value, plan.Confidence!.Value), "c = 0 plan: no switching");
            default:
                return (SamplingPlanner.FullInspection(lotSize, plan.AcceptanceNumber), "100 % inspection: no switching");
        }
    }

    private static async Task<SwitchingState> SwitchingAsync(FilterQaDbContext context, long partId, string supplier, SwitchingOptions? options, CancellationToken cancellationToken)
    {
        var decided = await context.Lots.AsNoTracking()
            .Where(l => l.PartId == partId && l.Supplier == supplier && l.DispositionAt != null && l.SampleDecision != null
                && l.SampleDecision != LotDecision.Pending && l.Plan.Kind == SamplingPlanKind.Mil105ESingle)
            .OrderBy(l => l.DispositionAt).ThenBy(l => l.Id)
            .Select(l => new { l.SampleDecision, l.Counters.Defectives, l.Plan.SampleSize, l.Plan.AcceptanceNumber })
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        LotOutcome[] history = decided.Select(l => new LotOutcome(
                l.SampleDecision is LotDecision.Accept or LotDecision.AcceptReturnToNormal, Math.Min(l.Defectives, l.SampleSize), l.SampleSize)
        {
            BetweenAcAndRe = l.SampleDecision == LotDecision.AcceptReturnToNormal,
            AcceptanceNumber = l.AcceptanceNumber,
        }).ToArray();
        return SwitchingRules.Evaluate(history, options);
    }
}
