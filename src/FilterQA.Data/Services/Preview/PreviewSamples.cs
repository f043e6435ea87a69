using FilterQA.Core.Decisions;
using FilterQA.Core.Formats;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Data.Codecs;
using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Services;

/// <summary>
/// Stored measurements of a part as inputs for judging them against a draft while it is edited. Uses the same pieces
/// as the what-if (<see cref="WhatIfService"/>): the compact trace when the draft needs only the transmission, else the
/// original file normalised by the thru the measurement recorded, with the thru age it had. Read-only.
/// </summary>
public sealed class PreviewSamples(IDbContextFactory<FilterQaDbContext> contexts)
{
    /// <summary>Why <paramref name="draft"/> cannot be judged from compact traces (then load with the original file); null when it can.</summary>
    public static string? WhyOriginalNeeded(LimitTemplate draft)
    {
        ArgumentNullException.ThrowIfNull(draft);
        return EvaluationInputs.WhyOriginalNeeded(draft);
    }

    /// <summary>The part's most recent stored measurements, newest first.</summary>
    /// <param name="partNumber">The part.</param>
    /// <param name="max">At most this many (1 or more).</param>
    /// <param name="cancellationToken">Stops the query.</param>
    public async Task<IReadOnlyList<PreviewCandidate>> CandidatesAsync(string partNumber, int max, CancellationToken cancellationToken = default)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(max, 1);
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        return await (from m in context.Measurements.AsNoTracking()
                      join l in context.Lots on m.LotId equals l.Id
                      join u in context.Units on m.UnitId equals u.Id
                      where l.Part!.PartNumber == partNumber
                      orderby m.Id descending
                      select new PreviewCandidate(m.Id, l.LotNumber, u.Serial, m.Attempt, m.Verdict, m.MeasuredAt))
            .Take(max).ToListAsync(cancellationToken).ConfigureAwait(false);
    }

    /// <summary>One stored measurement as the evaluation input a draft is judged on.</summary>
    /// <param name="measurementId">The measurement.</param>
    /// <param name="fromOriginalFile">True to read the original file (needed when <see cref="WhyOriginalNeeded"/> says so).</param>
    /// <param name="cancellationToken">Stops the reading.</param>
    /// <exception cref="RecordNotFoundException">No such measurement.</exception>
    /// <exception cref="InvalidDataException">The stored trace or file cannot be read back; the message names the measurement.</exception>
    public async Task<MeasurementInput> LoadAsync(long measurementId, bool fromOriginalFile, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var row = await context.Measurements.AsNoTracking().Where(m => m.Id == measurementId)
            .Select(m => new { m.MeasuredAt, m.ThruReferenceId, m.Sweep })
            .SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException(FormattableString.Invariant($"measurement {measurementId} is not stored"));
        TimeSpan? thruAge = null;
        StoredSweep? thruSweep = null;
        if (row.ThruReferenceId is { } thruId)
        {
            var thru = await context.ThruReferences.AsNoTracking().Where(t => t.Id == thruId).Select(t => new { t.MeasuredAt, t.Sweep })
                .SingleAsync(cancellationToken).ConfigureAwait(false);
            thruAge = row.MeasuredAt - thru.MeasuredAt;
            thruSweep = thru.Sweep;
        }
        try
        {
            if (!fromOriginalFile && row.Sweep.Path == ResponsePath.Transmission)
            {
                return EvaluationInputs.FromCompactTrace(ResponseTraceCodec.Decode(row.Sweep.Trace), thruAge, row.Sweep.FileName);
            }
            Sweep sweep = SweepFileReader.Read(SweepBytes.Decompress(row.Sweep.RawCompressed, row.Sweep.RawLength, row.Sweep.RawSha256), row.Sweep.FileName);
            Sweep? thruRead = thruSweep is null ? null
                : SweepFileReader.Read(SweepBytes.Decompress(thruSweep.RawCompressed, thruSweep.RawLength, thruSweep.RawSha256), thruSweep.FileName);
            return EvaluationInputs.FromSweep(sweep, thruRead, thruAge, row.Sweep.FileName);
        }
        catch (Exception e) when (e is SweepReadException or ArgumentException)
        {
            throw new InvalidDataException(FormattableString.Invariant($"measurement {measurementId} cannot be judged again: {e.Message}"), e);
        }
    }
}
