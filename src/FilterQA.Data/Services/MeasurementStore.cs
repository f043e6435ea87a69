using FilterQA.Core.Decisions;
using FilterQA.Core.Sweeps;
using FilterQA.Data.Codecs;
using FilterQA.Data.Entities;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Npgsql;

namespace FilterQA.Data.Services;

/// <summary>
/// Stores unit measurements: a unit, its measurement, every rule result, the unit's pointers and
/// the lot summary are written in one transaction, or not at all.
/// </summary>
public sealed class MeasurementStore(IDbContextFactory<FilterQaDbContext> contexts, TimeProvider clock)
{
    // Writers of one lot are serialised (row lock on PostgreSQL, BEGIN IMMEDIATE on SQLite), so a
    // conflict is rare: it needs a writer outside this class. A few attempts absorb it.
    private const int MaxAttempts = 5;

    /// <summary>
    /// Stores <paramref name="input"/>. The evaluation must be for the lot's part, template revision
    /// and template hash; the lot must be open or in test; a new unit must fit in the sample.
    /// A second measurement of a serial is a retest: attempt n + 1, superseding attempt n.
    /// </summary>
    public async Task<StoredMeasurement> StoreAsync(UnitMeasurement input, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(input);
        ArgumentNullException.ThrowIfNull(input.Operator);
        ArgumentNullException.ThrowIfNull(input.Evaluation);
        ArgumentException.ThrowIfNullOrWhiteSpace(input.LotNumber);
        ArgumentException.ThrowIfNullOrWhiteSpace(input.Serial);
        if (input.IdempotencyKey is { } key && (key.Length == 0 || key.Length > 100))
        {
            throw new ArgumentException("the idempotency key must be 1 to 100 characters", nameof(input));
        }
        // Compressing and encoding outside the transaction keeps the write lock short.
        StoredSweep sweep = SweepPacking.Pack(input.SweepBytes, input.Sweep, input.Response, $"lot {input.LotNumber} unit {input.Serial}");
        for (int attempt = 1; ; attempt++)
        {
            try
            {
                return await StoreOnceAsync(input, sweep, cancellationToken).ConfigureAwait(false);
            }
            catch (DbUpdateException conflict) when (attempt < MaxAttempts && IsConflict(conflict))
            {
                await Task.Delay(TimeSpan.FromMilliseconds(10 * attempt), clock, cancellationToken).ConfigureAwait(false);
            }
        }
    }

    /// <summary>The original sweep file bytes of a measurement, checked against the stored length and SHA-256.</summary>
    public async Task<byte[]> ReadSweepBytesAsync(long measurementId, CancellationToken cancellationToken = default)
    {
        StoredSweep sweep = await SweepAsync(measurementId, cancellationToken).ConfigureAwait(false);
        return SweepBytes.Decompress(sweep.RawCompressed, sweep.RawLength, sweep.RawSha256);
    }

    /// <summary>The measured response in its compact form (loss and phase to float32 precision; see <see cref="ResponseTraceCodec"/>).</summary>
    public async Task<ResponseTrace> ReadTraceAsync(long measurementId, CancellationToken cancellationToken = default)
    {
        StoredSweep sweep = await SweepAsync(measurementId, cancellationToken).ConfigureAwait(false);
        return ResponseTraceCodec.Decode(sweep.Trace);
    }

    private async Task<StoredSweep> SweepAsync(long measurementId, CancellationToken cancellationToken)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        return await context.Measurements.AsNoTracking().Where(m => m.Id == measurementId).Select(m => m.Sweep)
            .SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException(FormattableString.Invariant($"measurement {measurementId} does not exist"));
    }

    private async Task<StoredMeasurement> StoreOnceAsync(UnitMeasurement input, StoredSweep sweep, CancellationToken cancellationToken)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        await using var transaction = await context.Database.BeginTransactionAsync(cancellationToken).ConfigureAwait(false);
        await LotLock.AcquireAsync(context, input.LotNumber, cancellationToken).ConfigureAwait(false);
        LotRecord lot = await context.Lots.Include(l => l.Part).Include(l => l.TemplateRevision)
            .SingleOrDefaultAsync(l => l.LotNumber == input.LotNumber, cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException($"lot {input.LotNumber} does not exist");
        string where = $"lot {lot.LotNumber} unit {input.Serial}";

        if (input.IdempotencyKey is { } key)
        {
            var earlier = await context.Measurements.AsNoTracking().Where(m => m.IdempotencyKey == key)
                .Select(m => new { m.Id, m.UnitId, m.LotId, m.Attempt, m.SupersedesMeasurementId, m.Verdict, m.CountsForLot, m.Unit!.Serial })
                .SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false);
            if (earlier is not null)
            {
                if (earlier.LotId != lot.Id || earlier.Serial != input.Serial)
                {
                    throw new StorageRuleException($"{where}: idempotency key '{key}' was already used for another unit or lot");
                }
                return new StoredMeasurement(earlier.Id, earlier.UnitId, earlier.Attempt, earlier.SupersedesMeasurementId, earlier.Verdict,
                    earlier.CountsForLot, true, LotService.Summary(lot, lot.Part!.PartNumber, lot.TemplateRevision!.Revision, lot.TemplateRevision.ContentHash));
            }
        }

        Check(input, lot, where);
        long stationId = await context.Stations.Where(s => s.Name == input.Station).Select(s => (long?)s.Id)
            .SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException($"{where}: station {input.Station} is not registered");
        if (input.ThruReferenceId is { } thruId
            && !await context.ThruReferences.AnyAsync(t => t.Id == thruId && t.StationId == stationId, cancellationToken).ConfigureAwait(false))
        {
            throw new RecordNotFoundException(FormattableString.Invariant($"{where}: thru reference {thruId} is not one of station {input.Station}"));
        }

        DateTimeOffset now = clock.GetUtcNow();
        UnitVerdict verdict = input.Evaluation.Verdict;
        UnitRecord? unit = await context.Units.SingleOrDefaultAsync(u => u.LotId == lot.Id && u.Serial == input.Serial, cancellationToken).ConfigureAwait(false);
        bool isNew = unit is null;
        if (unit is null)
        {
            unit = await NewUnitAsync(context, lot, input, where, verdict, cancellationToken).ConfigureAwait(false);
        }
        else if (input.SamplePosition is { } position && position != unit.SamplePosition)
        {
            throw new StorageRuleException(FormattableString.Invariant($"{where} is at sample position {unit.SamplePosition}, not {position}"));
        }

        int attemptNumber = unit.Attempts + 1;
        bool counts = attemptNumber == 1 || (lot.Part!.RetestCounts && attemptNumber <= lot.Part.MaxRetests + 1);
        var measurement = new MeasurementRecord
        {
            Unit = unit,
            LotId = lot.Id,
            Attempt = attemptNumber,
            SupersedesMeasurementId = unit.LatestMeasurementId,
            CountsForLot = counts,
            TemplateRevisionId = lot.TemplateRevisionId,
            TemplateHash = input.Evaluation.TemplateHash,
            StationId = stationId,
            ThruReferenceId = input.ThruReferenceId,
            OperatorId = input.Operator.Id,
            OperatorName = input.Operator.Name,
            MeasuredAt = input.MeasuredAt,
            StoredAt = now,
            Verdict = verdict,
            Warnings = string.Join('\n', input.Evaluation.Warnings),
            RetestReason = attemptNumber > 1 ? input.RetestReason : null,
            IdempotencyKey = input.IdempotencyKey,
            Sweep = sweep,
            Rules = input.Evaluation.Rules.Select((r, i) => new RuleResultRecord
            {
                Ordinal = i,
                RuleId = r.RuleId,
                Kind = r.Kind,
                Title = r.Title,
                Unit = r.Unit,
                MeasuredValue = r.MeasuredValue,
                LimitValue = r.LimitValue,
                Sense = r.Sense,
                Margin = r.Margin,
                GuardBand = r.GuardBand,
                Outcome = r.Outcome,
                IsLowerBound = r.IsLowerBound,
                AtHz = r.AtHz,
                Message = r.Message,
            }).ToList(),
        };
        context.Measurements.Add(measurement);
        // First write: the unit (when new), the measurement and its rule results.
        await context.SaveChangesAsync(cancellationToken).ConfigureAwait(false);

        // Second write: the pointers that need the measurement's id, the lot summary, the audit line.
        UpdateCounters(lot.Counters, unit, isNew, counts, attemptNumber, verdict);
        unit.Attempts = attemptNumber;
        unit.LatestVerdict = verdict;
        unit.LatestMeasurementId = measurement.Id;
        unit.LastTestedAt = input.MeasuredAt;
        if (counts)
        {
            unit.CountedVerdict = verdict;
            unit.CountedMeasurementId = measurement.Id;
        }
        unit.Version++;
        lot.Status = LotStatus.InTest;
        lot.Version++;
        if (attemptNumber > 1)
        {
            Audit.Add(context, clock, input.Operator, AuditAction.UnitRetested, "unit", $"{lot.LotNumber}/{unit.Serial}", FormattableString.Invariant(
                $"attempt {attemptNumber} ({verdict}) supersedes measurement {measurement.SupersedesMeasurementId}{(counts ? "" : "; beyond the retest policy or not counted")}"),
                lot.Id, input.RetestReason);
        }
        await context.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        await transaction.CommitAsync(cancellationToken).ConfigureAwait(false);
        return new StoredMeasurement(measurement.Id, unit.Id, attemptNumber, measurement.SupersedesMeasurementId, verdict, counts, false,
            LotService.Summary(lot, lot.Part!.PartNumber, lot.TemplateRevision!.Revision, lot.TemplateRevision.ContentHash));
    }

    private static void Check(UnitMeasurement input, LotRecord lot, string where)
    {
        if (lot.Status is not (LotStatus.Open or LotStatus.InTest))
        {
            throw new StorageRuleException($"{where}: the lot is {lot.Status}; measurements are stored only while it is open or in test");
        }
        UnitEvaluation evaluation = input.Evaluation;
        if (evaluation.PartNumber != lot.Part!.PartNumber || evaluation.TemplateRevision != lot.TemplateRevision!.Revision
            || evaluation.TemplateHash != lot.TemplateRevision.ContentHash)
        {
            throw new StorageRuleException(FormattableString.Invariant(
                $"{where}: the evaluation is against {evaluation.PartNumber} revision {evaluation.TemplateRevision} ({evaluation.TemplateHash}), but the lot is tested against {lot.Part!.PartNumber} revision {lot.TemplateRevision!.Revision} ({lot.TemplateRevision.ContentHash})"));
        }
        if (!Enum.IsDefined(evaluation.Verdict))
        {
            throw new ArgumentException($"{where}: verdict {evaluation.Verdict} is not defined", nameof(input));
        }
    }

    private static async Task<UnitRecord> NewUnitAsync(FilterQaDbContext context, LotRecord lot, UnitMeasurement input, string where,
        UnitVerdict verdict, CancellationToken cancellationToken)
    {
        int sampleSize = lot.Plan.SampleSize;
        if (lot.Counters.UnitsTested >= sampleSize)
        {
            throw new StorageRuleException(FormattableString.Invariant(
                $"{where}: the sample is complete ({lot.Counters.UnitsTested} of {sampleSize} units tested); only retests of sampled units can be stored"));
        }
        int position = input.SamplePosition
            ?? (await context.Units.Where(u => u.LotId == lot.Id).MaxAsync(u => (int?)u.SamplePosition, cancellationToken).ConfigureAwait(false) ?? 0) + 1;
        if (position < 1 || position > sampleSize)
        {
            throw new StorageRuleException(FormattableString.Invariant($"{where}: sample position {position} is outside 1 to the sample size {sampleSize}"));
        }
        if (await context.Units.AnyAsync(u => u.LotId == lot.Id && u.SamplePosition == position, cancellationToken).ConfigureAwait(false))
        {
            throw new StorageRuleException(FormattableString.Invariant($"{where}: sample position {position} already holds another unit"));
        }
        var unit = new UnitRecord
        {
            LotId = lot.Id,
            Serial = input.Serial,
            SamplePosition = position,
            FirstVerdict = verdict,
            LatestVerdict = verdict,
            CountedVerdict = verdict,
            FirstTestedAt = input.MeasuredAt,
            LastTestedAt = input.MeasuredAt,
        };
        context.Units.Add(unit);
        return unit;
    }

    private static void UpdateCounters(LotCounters counters, UnitRecord unit, bool isNew, bool counts, int attemptNumber, UnitVerdict verdict)
    {
        counters.Measurements++;
        if (isNew)
        {
            counters.UnitsTested++;
            counters.FirstPassGo += verdict == UnitVerdict.Go ? 1 : 0;
            Add(counters, verdict, +1);
        }
        else if (counts)
        {
            Add(counters, unit.CountedVerdict, -1);
            Add(counters, verdict, +1);
            counters.UnitsRetested += attemptNumber == 2 ? 1 : 0;
        }
        counters.Defectives = counters.NoGo + counters.NotVerifiable;
    }

    private static void Add(LotCounters counters, UnitVerdict verdict, int step)
    {
        switch (verdict)
        {
            case UnitVerdict.Go:
                counters.Go += step;
                break;
            case UnitVerdict.NoGo:
                counters.NoGo += step;
                break;
            default:
                counters.NotVerifiable += step;
                break;
        }
    }

    private static bool IsConflict(DbUpdateException problem) => problem is DbUpdateConcurrencyException
        || problem.InnerException is SqliteException { SqliteErrorCode: 19 or 5 } // constraint, busy
        || problem.InnerException is PostgresException { SqlState: PostgresErrorCodes.UniqueViolation or PostgresErrorCodes.SerializationFailure or PostgresErrorCodes.DeadlockDetected };
}
