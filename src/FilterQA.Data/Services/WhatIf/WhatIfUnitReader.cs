using FilterQA.Core.Decisions;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Data.Codecs;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Services;

/// <summary>Reads one stored measurement for the what-if's chart: its trace and both sets of limit lines. Read-only.</summary>
public sealed class WhatIfUnitReader(IDbContextFactory<FilterQaDbContext> contexts, TemplateCatalog templates)
{
    /// <summary>The measurement's stored trace with the limit lines of its recorded revision and of <paramref name="draft"/>.</summary>
    /// <param name="measurementId">A stored measurement of the draft's part.</param>
    /// <param name="draft">The template tried in the what-if.</param>
    /// <param name="cancellationToken">Stops the reading.</param>
    /// <exception cref="RecordNotFoundException">No such measurement.</exception>
    /// <exception cref="ArgumentException">The measurement belongs to another part than the draft.</exception>
    public async Task<WhatIfUnitView> ReadAsync(long measurementId, LimitTemplate draft, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(draft);
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var row = await (from m in context.Measurements.AsNoTracking()
                         where m.Id == measurementId
                         join u in context.Units on m.UnitId equals u.Id
                         join l in context.Lots on m.LotId equals l.Id
                         select new
                         {
                             l.LotNumber,
                             l.Part!.PartNumber,
                             u.Serial,
                             m.Attempt,
                             m.Verdict,
                             m.Sweep.Trace,
                             m.Sweep.FileName,
                             Revision = context.TemplateRevisions.Where(r => r.Id == m.TemplateRevisionId).Select(r => r.Revision).Single(),
                         }).SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException(FormattableString.Invariant($"measurement {measurementId} is not stored"));
        if (!string.Equals(row.PartNumber, draft.PartNumber, StringComparison.Ordinal))
        {
            throw new ArgumentException(FormattableString.Invariant($"measurement {measurementId} is of part {row.PartNumber}, the draft of {draft.PartNumber}"), nameof(draft));
        }
        LimitTemplate recorded = await templates.LoadAsync(row.PartNumber, row.Revision, cancellationToken).ConfigureAwait(false);
        ResponseTrace trace = ResponseTraceCodec.Decode(row.Trace);
        if (trace.Path != ResponsePath.Transmission)
        {
            return new WhatIfUnitView(measurementId, row.LotNumber, row.Serial, row.Attempt, row.Revision, row.Verdict, trace, [], [],
                "This measurement is a reflection; the limit lines apply to transmission.");
        }
        (IReadOnlyList<MaskLine> recordedLines, string? recordedProblem) = Place(recorded, trace, row.FileName);
        (IReadOnlyList<MaskLine> draftLines, string? draftProblem) = Place(draft, trace, row.FileName);
        string? note = recordedProblem ?? draftProblem;
        return new WhatIfUnitView(measurementId, row.LotNumber, row.Serial, row.Attempt, row.Revision, row.Verdict, trace, recordedLines, draftLines, note);
    }

    // Lines anchored to a measured centre or to the least loss depend on the unit, so each template is judged on the
    // stored trace (as the what-if did) and its resolved lines are taken.
    private static (IReadOnlyList<MaskLine>, string?) Place(LimitTemplate template, ResponseTrace trace, string fileName)
    {
        try
        {
            UnitEvaluation evaluation = TemplateEvaluator.Evaluate(template, EvaluationInputs.FromCompactTrace(trace, null, fileName));
            return (evaluation.MaskLines, null);
        }
        catch (ArgumentException e)
        {
            return ([], FormattableString.Invariant($"The limit lines of revision {template.Revision} cannot be placed on this trace: {e.Message}"));
        }
    }
}
