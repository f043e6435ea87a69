using FilterQA.Core.Decisions;
using FilterQA.Core.Formats;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Data.Codecs;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Services;

/// <summary>
/// Judges a draft against the part's current reference units on a given context, so a release can make the check in
/// its own transaction. It is the what-if's re-evaluation of a stored measurement, unit by unit: the compact trace
/// with the thru age the measurement had (<see cref="EvaluationInputs.FromCompactTrace"/>), or, when the draft needs
/// more than the compact trace holds (<see cref="EvaluationInputs.WhyOriginalNeeded"/>) or the stored trace is a
/// reflection, the original file normalised by the recorded thru (<see cref="EvaluationInputs.FromSweep"/>), both
/// judged by <see cref="TemplateEvaluator"/>.
/// </summary>
internal static class ReferenceChecker
{
    internal static async Task<ReferenceCheck> CheckAsync(FilterQaDbContext context, long partId, LimitTemplate draft, CancellationToken cancellationToken)
    {
        var rows = await (
                from r in context.ReferenceUnits.AsNoTracking()
                where r.PartId == partId && r.RemovedAt == null
                join m in context.Measurements on r.MeasurementId equals m.Id
                join u in context.Units on m.UnitId equals u.Id
                join l in context.Lots on m.LotId equals l.Id
                orderby l.LotNumber, u.Serial, m.Attempt
                select new
                {
                    ReferenceId = r.Id,
                    l.LotNumber,
                    Row = new WhatIfRow(m.Id, m.LotId, m.Attempt, u.CountedMeasurementId == m.Id, u.Serial, m.Verdict, m.MeasuredAt, m.ThruReferenceId,
                        m.Sweep.Path, m.Sweep.Trace, m.Sweep.FileName, m.Sweep.RawCompressed, m.Sweep.RawLength, m.Sweep.RawSha256),
                })
            .ToListAsync(cancellationToken).ConfigureAwait(false);

        bool originalForAll = EvaluationInputs.WhyOriginalNeeded(draft) is not null;
        var thrus = new Dictionary<long, (DateTimeOffset MeasuredAt, Sweep? Sweep)>();
        var units = new List<ReferenceCheckUnit>(rows.Count);
        foreach (var item in rows)
        {
            WhatIfRow row = item.Row;
            bool fromOriginal = originalForAll || row.Path != ResponsePath.Transmission;
            TimeSpan? thruAge = null;
            Sweep? thru = null;
            if (row.ThruReferenceId is { } thruId)
            {
                if (!thrus.TryGetValue(thruId, out var known) || (fromOriginal && known.Sweep is null))
                {
                    known = await ThruAsync(context, thruId, fromOriginal, cancellationToken).ConfigureAwait(false);
                    thrus[thruId] = known;
                }
                thruAge = row.MeasuredAt - known.MeasuredAt;
                thru = known.Sweep;
            }
            MeasurementInput input;
            try
            {
                input = fromOriginal
                    ? EvaluationInputs.FromSweep(SweepFileReader.Read(SweepBytes.Decompress(row.RawCompressed!, row.RawLength, row.RawSha256), row.FileName),
                        thru, thruAge, row.FileName)
                    : EvaluationInputs.FromCompactTrace(ResponseTraceCodec.Decode(row.Trace), thruAge, row.FileName);
            }
            catch (Exception e) when (e is InvalidDataException or SweepReadException or ArgumentException)
            {
                throw new InvalidDataException(FormattableString.Invariant(
                    $"reference unit {row.Serial} of lot {item.LotNumber} (measurement {row.Id}) cannot be judged again: {e.Message}"), e);
            }
            UnitEvaluation evaluation = TemplateEvaluator.Evaluate(draft, input);
            units.Add(new ReferenceCheckUnit(item.ReferenceId, row.Id, item.LotNumber, row.Serial, row.Attempt, evaluation.Verdict,
                evaluation.Verdict == UnitVerdict.Go ? [] : evaluation.BlockingRules.ToArray(), evaluation.Warnings));
        }
        return new ReferenceCheck(draft.PartNumber, draft.Revision, draft.ContentHash, units);
    }

    private static async Task<(DateTimeOffset MeasuredAt, Sweep? Sweep)> ThruAsync(FilterQaDbContext context, long thruId, bool withSweep, CancellationToken cancellationToken)
    {
        var thru = await context.ThruReferences.AsNoTracking().Where(t => t.Id == thruId)
            .Select(t => new { t.MeasuredAt, t.Sweep.FileName, Raw = withSweep ? t.Sweep.RawCompressed : null, t.Sweep.RawLength, t.Sweep.RawSha256 })
            .SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false)
            ?? throw new InvalidDataException(FormattableString.Invariant($"thru reference {thruId} is not stored"));
        Sweep? sweep = thru.Raw is { } raw ? SweepFileReader.Read(SweepBytes.Decompress(raw, thru.RawLength, thru.RawSha256), thru.FileName) : null;
        return (thru.MeasuredAt, sweep);
    }
}
