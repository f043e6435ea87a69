using System.Globalization;
using FilterQA.Core.Decisions;
using FilterQA.Core.Templates;
using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Services;

/// <summary>
/// The reference (known-good) units of each part: stored go measurements a quality engineer marks, with a note, so a
/// draft template can be checked against units whose goodness is known before it is released. Marking and removing
/// are audited; a removal keeps the record with who, when and why.
/// </summary>
public sealed class ReferenceUnitService(IDbContextFactory<FilterQaDbContext> contexts, TimeProvider clock)
{
    private const string Subject = "reference-unit";

    /// <summary>The part's current reference units, by lot, serial and attempt.</summary>
    /// <exception cref="RecordNotFoundException">The part is not registered.</exception>
    public async Task<IReadOnlyList<ReferenceUnitInfo>> ListAsync(string partNumber, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        long partId = await PartIdAsync(context, partNumber, cancellationToken).ConfigureAwait(false);
        return await (
                from r in context.ReferenceUnits.AsNoTracking()
                where r.PartId == partId && r.RemovedAt == null
                join m in context.Measurements on r.MeasurementId equals m.Id
                join u in context.Units on m.UnitId equals u.Id
                join l in context.Lots on m.LotId equals l.Id
                orderby l.LotNumber, u.Serial, m.Attempt
                select new ReferenceUnitInfo(r.Id, partNumber, m.Id, l.LotNumber, u.Serial, m.Attempt, m.MeasuredAt, m.Verdict, r.Note, r.MarkedBy, r.MarkedAt))
            .ToListAsync(cancellationToken).ConfigureAwait(false);
    }

    /// <summary>The part's lots that hold at least one stored measurement, by lot number.</summary>
    /// <exception cref="RecordNotFoundException">The part is not registered.</exception>
    public async Task<IReadOnlyList<string>> LotsAsync(string partNumber, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        long partId = await PartIdAsync(context, partNumber, cancellationToken).ConfigureAwait(false);
        return await context.Lots.AsNoTracking()
            .Where(l => l.PartId == partId && context.Measurements.Any(m => m.LotId == l.Id))
            .OrderBy(l => l.LotNumber).Select(l => l.LotNumber)
            .ToListAsync(cancellationToken).ConfigureAwait(false);
    }

    /// <summary>The stored measurements of one lot of the part, by serial and attempt, to pick a reference unit from.</summary>
    /// <exception cref="RecordNotFoundException">The part is not registered, or the lot is not a lot of it.</exception>
    public async Task<IReadOnlyList<ReferenceCandidate>> CandidatesAsync(string partNumber, string lotNumber, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        long partId = await PartIdAsync(context, partNumber, cancellationToken).ConfigureAwait(false);
        long lotId = await context.Lots.AsNoTracking().Where(l => l.LotNumber == lotNumber && l.PartId == partId).Select(l => (long?)l.Id)
            .SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException($"lot {lotNumber} is not a lot of {partNumber}");
        return await (
                from m in context.Measurements.AsNoTracking()
                where m.LotId == lotId
                join u in context.Units on m.UnitId equals u.Id
                orderby u.Serial, m.Attempt
                select new ReferenceCandidate(m.Id, u.Serial, m.Attempt, m.MeasuredAt, m.Verdict,
                    context.ReferenceUnits.Any(r => r.MeasurementId == m.Id && r.RemovedAt == null)))
            .ToListAsync(cancellationToken).ConfigureAwait(false);
    }

    /// <summary>Marks a stored go measurement of the part as a reference unit (audited).</summary>
    /// <param name="partNumber">The part the measurement must belong to.</param>
    /// <param name="measurementId">The stored measurement.</param>
    /// <param name="note">Why the unit is known good; required.</param>
    /// <param name="actor">Who marks it.</param>
    /// <param name="cancellationToken">Stops the work.</param>
    /// <exception cref="ArgumentException">The note is empty.</exception>
    /// <exception cref="RecordNotFoundException">The part or the measurement is not stored, or the measurement is of another part.</exception>
    /// <exception cref="StorageRuleException">The measurement's recorded verdict is not go, or it is already a reference unit.</exception>
    public async Task<ReferenceUnitInfo> AddAsync(string partNumber, long measurementId, string note, Actor actor, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(actor);
        ArgumentException.ThrowIfNullOrWhiteSpace(note);
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        await using var transaction = await context.Database.BeginTransactionAsync(cancellationToken).ConfigureAwait(false);
        long partId = await PartIdAsync(context, partNumber, cancellationToken).ConfigureAwait(false);
        var measurement = await (
                from m in context.Measurements.AsNoTracking()
                where m.Id == measurementId
                join u in context.Units on m.UnitId equals u.Id
                join l in context.Lots on m.LotId equals l.Id
                select new { m.Id, m.Attempt, m.MeasuredAt, m.Verdict, u.Serial, l.LotNumber, l.PartId })
            .SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false);
        if (measurement is null || measurement.PartId != partId)
        {
            throw new RecordNotFoundException(string.Create(CultureInfo.InvariantCulture, $"measurement {measurementId} is not a stored measurement of {partNumber}"));
        }
        string key = Key(partNumber, measurement.LotNumber, measurement.Serial, measurement.Attempt);
        if (measurement.Verdict != UnitVerdict.Go)
        {
            throw new StorageRuleException($"{key} was judged {measurement.Verdict}; only a go measurement can be a reference (known-good) unit");
        }
        if (await context.ReferenceUnits.AnyAsync(r => r.MeasurementId == measurementId && r.RemovedAt == null, cancellationToken).ConfigureAwait(false))
        {
            throw new StorageRuleException($"{key} is already a reference unit");
        }
        var record = new ReferenceUnitRecord
        {
            PartId = partId,
            MeasurementId = measurementId,
            Note = note.Trim(),
            MarkedAt = clock.GetUtcNow(),
            MarkedById = actor.Id,
            MarkedBy = actor.Name,
        };
        context.ReferenceUnits.Add(record);
        Audit.Add(context, clock, actor, AuditAction.ReferenceUnitAdded, Subject, key,
            string.Create(CultureInfo.InvariantCulture, $"measurement {measurementId} marked as a reference unit: {record.Note}"), reason: record.Note);
        await context.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        await transaction.CommitAsync(cancellationToken).ConfigureAwait(false);
        return new ReferenceUnitInfo(record.Id, partNumber, measurementId, measurement.LotNumber, measurement.Serial, measurement.Attempt,
            measurement.MeasuredAt, measurement.Verdict, record.Note, record.MarkedBy, record.MarkedAt);
    }

    /// <summary>Takes a reference unit out of the part's reference set, with why (audited; the record stays as history).</summary>
    /// <param name="partNumber">The part.</param>
    /// <param name="referenceUnitId">The reference unit (<see cref="ReferenceUnitInfo.Id"/>).</param>
    /// <param name="note">Why it is removed; required.</param>
    /// <param name="actor">Who removes it.</param>
    /// <param name="cancellationToken">Stops the work.</param>
    /// <exception cref="ArgumentException">The note is empty.</exception>
    /// <exception cref="RecordNotFoundException">No current reference unit of the part has that id.</exception>
    public async Task RemoveAsync(string partNumber, long referenceUnitId, string note, Actor actor, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(actor);
        ArgumentException.ThrowIfNullOrWhiteSpace(note);
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        long partId = await PartIdAsync(context, partNumber, cancellationToken).ConfigureAwait(false);
        ReferenceUnitRecord record = await context.ReferenceUnits
                .SingleOrDefaultAsync(r => r.Id == referenceUnitId && r.PartId == partId && r.RemovedAt == null, cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException(string.Create(CultureInfo.InvariantCulture, $"{partNumber} has no current reference unit {referenceUnitId}"));
        var where = await (
                from m in context.Measurements.AsNoTracking()
                where m.Id == record.MeasurementId
                join u in context.Units on m.UnitId equals u.Id
                join l in context.Lots on m.LotId equals l.Id
                select new { u.Serial, l.LotNumber, m.Attempt })
            .SingleAsync(cancellationToken).ConfigureAwait(false);
        record.RemovedAt = clock.GetUtcNow();
        record.RemovedBy = actor.Name;
        record.RemovalNote = note.Trim();
        Audit.Add(context, clock, actor, AuditAction.ReferenceUnitRemoved, Subject, Key(partNumber, where.LotNumber, where.Serial, where.Attempt),
            string.Create(CultureInfo.InvariantCulture, $"measurement {record.MeasurementId} is no longer a reference unit: {record.RemovalNote}"), reason: record.RemovalNote);
        await context.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
    }

    /// <summary>Judges a stored revision of the part against its current reference units (stores nothing).</summary>
    /// <exception cref="RecordNotFoundException">The part or revision is not registered.</exception>
    /// <exception cref="InvalidDataException">A stored text, trace or sweep file cannot be read back; the message names it.</exception>
    public async Task<ReferenceCheck> CheckAsync(string partNumber, int revision, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        long partId = await PartIdAsync(context, partNumber, cancellationToken).ConfigureAwait(false);
        TemplateRevisionRecord stored = await context.TemplateRevisions.AsNoTracking()
                .SingleOrDefaultAsync(r => r.PartId == partId && r.Revision == revision, cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException($"{TemplateCatalog.Key(partNumber, revision)} is not registered");
        LimitTemplate template = TemplateCatalog.Parse(stored, partNumber);
        return await ReferenceChecker.CheckAsync(context, partId, template, cancellationToken).ConfigureAwait(false);
    }

    /// <summary>Judges a template of the part (stored or not) against its current reference units (stores nothing).</summary>
    /// <exception cref="ArgumentException">The template is of another part.</exception>
    /// <exception cref="RecordNotFoundException">The part is not registered.</exception>
    /// <exception cref="InvalidDataException">A stored trace or sweep file cannot be read back; the message names it.</exception>
    public async Task<ReferenceCheck> CheckAsync(LimitTemplate draft, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(draft);
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        long partId = await PartIdAsync(context, draft.PartNumber, cancellationToken).ConfigureAwait(false);
        return await ReferenceChecker.CheckAsync(context, partId, draft, cancellationToken).ConfigureAwait(false);
    }

    private static async Task<long> PartIdAsync(FilterQaDbContext context, string partNumber, CancellationToken cancellationToken) =>
        await context.Parts.AsNoTracking().Where(p => p.PartNumber == partNumber).Select(p => (long?)p.Id)
            .SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false)
        ?? throw new RecordNotFoundException($"part {partNumber} is not registered");

    private static string Key(string partNumber, string lotNumber, string serial, int attempt) =>
        string.Create(CultureInfo.InvariantCulture, $"{partNumber} lot {lotNumber} unit {serial} attempt {attempt}");
}
