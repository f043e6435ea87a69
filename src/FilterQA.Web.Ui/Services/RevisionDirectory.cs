using FilterQA.Core.Templates;
using FilterQA.Data;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Web.Ui.Services;

/// <summary>Read-only list of a part's stored template revisions, for the revision pickers (what-if, difference).</summary>
public sealed class RevisionDirectory(IDbContextFactory<FilterQaDbContext> contexts)
{
    /// <summary>The part's revisions: drafts first (newest first), then the others newest first.</summary>
    /// <exception cref="RecordNotFoundException">The part is not registered.</exception>
    public async Task<IReadOnlyList<RevisionChoice>> RevisionsAsync(string partNumber, CancellationToken cancellationToken = default)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(partNumber);
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        long partId = await context.Parts.AsNoTracking().Where(p => p.PartNumber == partNumber).Select(p => (long?)p.Id)
            .SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException($"part {partNumber} is not registered");
        List<RevisionChoice> all = await context.TemplateRevisions.AsNoTracking().Where(r => r.PartId == partId)
            .Select(r => new RevisionChoice(r.Revision, r.Status, r.RegisteredAt, r.RegisteredBy))
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        return all.OrderBy(r => r.Status == TemplateStatus.Draft ? 0 : 1).ThenByDescending(r => r.Revision).ToArray();
    }
}
