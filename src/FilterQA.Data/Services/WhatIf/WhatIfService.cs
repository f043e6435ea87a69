using System.Globalization;
using System.Threading.Channels;
using FilterQA.Core.Decisions;
using FilterQA.Core.Formats;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Data.Codecs;
using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Services;

/// <summary>
/// What-if re-evaluation: judges every stored measurement of a part that matters for its lots (each unit's counted
/// measurement, and its first measurement for the first-pass yield) against another template revision, a draft that
/// need not be stored, and reports per lot the yield it would have given beside the recorded one, and which units
/// change verdict. Read-only: nothing is stored or changed.
/// </summary>
/// <remarks>
/// <para>Each measurement is judged from its compact trace (the normalised response the recorded evaluation used, to
/// float32 precision; see <see cref="ResponseTraceCodec"/>) with the thru age it had when measured. The compact trace
/// holds the transmission loss and phase only, so a template that needs more (a resonator model fitted to the complex
/// network data; a return-loss rule on S11/S22), and a stored one-port reflection, are judged from the original sweep
/// file instead, normalised by the thru the measurement recorded, as the intake did. That is slower (the file is
/// decompressed and parsed again) and the report says so.</para>
/// <para>A value within about 1e-7 relative of a limit may be judged differently from the record, because the record
/// was made on the full-precision response (the compact trace is float32).</para>
/// <para>Rows are read in pages by ascending id (never all at once) by one reader, and judged by
/// <see cref="WhatIfOptions.MaxDegreeOfParallelism"/> workers through a bounded channel; the measurements stored after
/// the run began are not included.</para>
/// </remarks>
public sealed class WhatIfService(IDbContextFactory<FilterQaDbContext> contexts)
{
    /// <summary>Judges the part's stored measurements against <paramref name="draft"/>.</summary>
    /// <param name="partNumber">The part; <paramref name="draft"/> must be a template of it.</param>
    /// <param name="draft">The template revision to try (any status; it is not stored).</param>
    /// <param name="progress">Told every <see cref="WhatIfOptions.ProgressInterval"/> measurements and at the end.</param>
    /// <param name="options">Page size, parallelism and progress interval; null for <see cref="WhatIfOptions.Default"/>.</param>
    /// <param name="cancellationToken">Stops the run (an <see cref="OperationCanceledException"/> is thrown).</param>
    /// <exception cref="ArgumentException">The draft is for another part or device kind, or an option is below 1.</exception>
    /// <exception cref="RecordNotFoundException">The part is not registered.</exception>
    /// <exception cref="InvalidDataException">A stored trace or sweep file cannot be read back; the message names the measurement.</exception>
    public async Task<WhatIfReport> ReevaluateAsync(string partNumber, LimitTemplate draft, IProgress<WhatIfProgress>? progress = null,
        WhatIfOptions? options = null, CancellationToken cancellationToken = default)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(partNumber);
        ArgumentNullException.ThrowIfNull(draft);
        options ??= WhatIfOptions.Default;
        if (options.PageSize < 1 || options.MaxDegreeOfParallelism < 1 || options.ProgressInterval < 1)
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                $"page size {options.PageSize}, parallelism {options.MaxDegreeOfParallelism} and progress interval {options.ProgressInterval} must each be 1 or more"), nameof(options));
        }
        if (!string.Equals(draft.PartNumber, partNumber, StringComparison.Ordinal))
        {
            throw new ArgumentException($"the draft is a template of {draft.PartNumber}, not of {partNumber}", nameof(draft));
        }

        WhatIfScope scope = await ScopeAsync(partNumber, draft, cancellationToken).ConfigureAwait(false);
        string? whyOriginal = EvaluationInputs.WhyOriginalNeeded(draft);
        var run = new WhatIfRun(draft, scope, whyOriginal is not null, progress, options.ProgressInterval, this);

        var channel = Channel.CreateBounded<WhatIfRow>(new BoundedChannelOptions(2 * options.PageSize)
        {
            SingleWriter = true,
            FullMode = BoundedChannelFullMode.Wait,
        });
        using var stop = CancellationTokenSource.CreateLinkedTokenSource(cancellationToken);
        Task reader = ReadPagesAsync(scope, whyOriginal is not null, options.PageSize, channel.Writer, stop.Token);
        try
        {
            await Parallel.ForEachAsync(channel.Reader.ReadAllAsync(stop.Token),
                new ParallelOptions { MaxDegreeOfParallelism = options.MaxDegreeOfParallelism, CancellationToken = stop.Token },
                (row, token) => run.JudgeAsync(row, token)).ConfigureAwait(false);
        }
        catch
        {
            await stop.CancelAsync().ConfigureAwait(false);
            try
            {
                await reader.ConfigureAwait(false);
            }
            catch (OperationCanceledException)
            {
                // The reader stops because the workers did; their exception is the one to report.
            }
            throw;
        }
        await reader.ConfigureAwait(false);

        IReadOnlyList<WhatIfFlip> flips = await run.FlipsAsync(cancellationToken).ConfigureAwait(false);
        progress?.Report(new WhatIfProgress(run.Evaluated, run.Evaluated));
        return new WhatIfReport(partNumber, draft.Revision, draft.ContentHash, run.Lots(), flips, run.Evaluated, run.FromOriginalFiles,
            run.FromOriginalFiles > 0 ? whyOriginal ?? "the stored trace is a one-port reflection, which the compact trace cannot judge with the reflection rules" : null);
    }

    /// <summary>The part, its lots, the thrus' times, the last measurement id and the number of rows to judge.</summary>
    private async Task<WhatIfScope> ScopeAsync(string partNumber, LimitTemplate draft, CancellationToken cancellationToken)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var part = await context.Parts.AsNoTracking().Where(p => p.PartNumber == partNumber).Select(p => new { p.Id, p.DeviceKind })
            .SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException($"part {partNumber} is not registered");
        if (part.DeviceKind != draft.Device.ToString())
        {
            throw new ArgumentException($"part {partNumber} is a {part.DeviceKind}; the draft is a template for a {draft.Device}", nameof(draft));
        }
        var lots = await context.Lots.AsNoTracking().Where(l => l.PartId == part.Id)
            .OrderBy(l => l.Id)
            .Select(l => new WhatIfScope.Lot(l.Id, l.LotNumber, l.TemplateRevision!.Revision, l.TemplateRevision.DecisionRule, l.Counters.UnitsTested))
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        Dictionary<long, DateTimeOffset> thrus = await context.ThruReferences.AsNoTracking()
            .Where(t => context.Measurements.Any(m => m.ThruReferenceId == t.Id && context.Lots.Any(l => l.Id == m.LotId && l.PartId == part.Id)))
            .Select(t => new { t.Id, t.MeasuredAt })
            .ToDictionaryAsync(t => t.Id, t => t.MeasuredAt, cancellationToken).ConfigureAwait(false);
        long lastId = await PartMeasurements(context, part.Id).MaxAsync(m => (long?)m.Id, cancellationToken).ConfigureAwait(false) ?? 0;
        int total = await Judged(context, part.Id, 0, lastId).CountAsync(cancellationToken).ConfigureAwait(false);
        return new WhatIfScope(part.Id, lots, thrus, lastId, total);
    }

    private async Task ReadPagesAsync(WhatIfScope scope, bool withOriginal, int pageSize, ChannelWriter<WhatIfRow> writer, CancellationToken cancellationToken)
    {
        Exception? failure = null;
        try
        {
            await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
            long after = 0;
            while (after < scope.LastMeasurementId)
            {
                IQueryable<WhatIfRow> page = Rows(context, Judged(context, scope.PartId, after, scope.LastMeasurementId), withOriginal).Take(pageSize);
                int count = 0;
                await foreach (WhatIfRow row in page.AsAsyncEnumerable().WithCancellation(cancellationToken).ConfigureAwait(false))
                {
                    await writer.WriteAsync(row, cancellationToken).ConfigureAwait(false);
                    after = row.Id;
                    count++;
                }
                if (count < pageSize)
                {
                    break;
                }
            }
        }
        catch (Exception e)
        {
            failure = e;
            throw;
        }
        finally
        {
            writer.TryComplete(failure);
        }
    }

    private static IQueryable<MeasurementRecord> PartMeasurements(FilterQaDbContext context, long partId) =>
        context.Measurements.AsNoTracking().Where(m => context.Lots.Any(l => l.Id == m.LotId && l.PartId == partId));

    /// <summary>The measurements judged: each unit's first and counted measurement, ids in (after, last].</summary>
    private static IQueryable<MeasurementRecord> Judged(FilterQaDbContext context, long partId, long after, long last) =>
        PartMeasurements(context, partId)
            .Where(m => m.Id > after && m.Id <= last && (m.Attempt == 1 || context.Units.Any(u => u.Id == m.UnitId && u.CountedMeasurementId == m.Id)));

    private static IQueryable<WhatIfRow> Rows(FilterQaDbContext context, IQueryable<MeasurementRecord> measurements, bool withOriginal) =>
        from m in measurements
        join u in context.Units on m.UnitId equals u.Id
        orderby m.Id
        select new WhatIfRow(m.Id, m.LotId, m.Attempt, u.CountedMeasurementId == m.Id, u.Serial, m.Verdict, m.MeasuredAt, m.ThruReferenceId,
            m.Sweep.Path, m.Sweep.Trace, m.Sweep.FileName, withOriginal ? m.Sweep.RawCompressed : null, m.Sweep.RawLength, m.Sweep.RawSha256);

    /// <summary>The original file of one measurement (for a row read without it).</summary>
    internal async Task<byte[]> OriginalBytesAsync(long measurementId, CancellationToken cancellationToken)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        StoredSweep sweep = await context.Measurements.AsNoTracking().Where(m => m.Id == measurementId).Select(m => m.Sweep)
            .SingleAsync(cancellationToken).ConfigureAwait(false);
        return SweepBytes.Decompress(sweep.RawCompressed, sweep.RawLength, sweep.RawSha256);
    }

    /// <summary>A thru's sweep, read from its original file.</summary>
    internal async Task<Sweep> ThruSweepAsync(long thruId, CancellationToken cancellationToken)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        StoredSweep sweep = await context.ThruReferences.AsNoTracking().Where(t => t.Id == thruId).Select(t => t.Sweep)
            .SingleAsync(cancellationToken).ConfigureAwait(false);
        byte[] raw = SweepBytes.Decompress(sweep.RawCompressed, sweep.RawLength, sweep.RawSha256);
        return SweepFileReader.Read(raw, sweep.FileName);
    }

    /// <summary>The recorded rule results of the given measurements, in rule order.</summary>
    internal async Task<ILookup<long, RuleResultRecord>> RecordedRulesAsync(IReadOnlyCollection<long> measurementIds, CancellationToken cancellationToken)
    {
        var all = new List<RuleResultRecord>();
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        foreach (long[] chunk in measurementIds.Chunk(500))
        {
            all.AddRange(await context.RuleResults.AsNoTracking().Where(r => chunk.Contains(r.MeasurementId))
                .OrderBy(r => r.MeasurementId).ThenBy(r => r.Ordinal).ToListAsync(cancellationToken).ConfigureAwait(false));
        }
        return all.ToLookup(r => r.MeasurementId);
    }
}
