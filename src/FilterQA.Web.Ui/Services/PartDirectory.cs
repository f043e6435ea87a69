using FilterQA.Data;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Web.Ui.Services;

/// <summary>Read-only look-ups of parts for the screens (lists to pick from, retest policy).</summary>
public sealed class PartDirectory(IDbContextFactory<FilterQaDbContext> contexts)
{
    /// <summary>Every registered part number, in order.</summary>
    public async Task<IReadOnlyList<string>> PartNumbersAsync(CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        return await context.Parts.AsNoTracking().OrderBy(p => p.PartNumber).Select(p => p.PartNumber)
            .ToListAsync(cancellationToken).ConfigureAwait(false);
    }

    /// <summary>The part's retest policy.</summary>
    /// <exception cref="RecordNotFoundException">The part is not registered.</exception>
    public async Task<RetestRule> RetestRuleAsync(string partNumber, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        return await context.Parts.AsNoTracking().Where(p => p.PartNumber == partNumber)
            .Select(p => new RetestRule(p.MaxRetests, p.RetestCounts))
            .SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException($"part {partNumber} is not registered");
    }
}
