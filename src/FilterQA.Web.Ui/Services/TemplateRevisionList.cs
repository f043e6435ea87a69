using FilterQA.Data;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Web.Ui.Services;

/// <summary>Read-only list of a part's stored template revisions, for the revision pickers.</summary>
public sealed class TemplateRevisionList(IDbContextFactory<FilterQaDbContext> contexts)
{
    /// <summary>The part's revisions, lowest first.</summary>
    /// <exception cref="RecordNotFoundException">The part is not registered.</exception>
    public async Task<IReadOnlyList<RevisionChoice>> ListAsync(string partNumber, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        if (!await context.Parts.AnyAsync(p => p.PartNumber == partNumber, cancellationToken).ConfigureAwait(false))
        {
            throw new RecordNotFoundException($"part {partNumber} is not registered");
        }
        return await context.TemplateRevisions.AsNoTracking().Where(r => r.Part!.PartNumber == partNumber).OrderBy(r => r.Revision)
            .Select(r => new RevisionChoice(r.Revision, r.Status)).ToListAsync(cancellationToken).ConfigureAwait(false);
    }
}
