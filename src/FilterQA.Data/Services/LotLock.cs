using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Services;

/// <summary>
/// Serialises writers of one lot inside their transaction. PostgreSQL: a row lock on the lot
/// (SELECT ... FOR UPDATE), taken before the lot is read, so the read sees the latest commit.
/// SQLite: nothing to do, because its transactions begin IMMEDIATE and so hold the write lock.
/// </summary>
internal static class LotLock
{
    internal static async Task AcquireAsync(FilterQaDbContext context, string lotNumber, CancellationToken cancellationToken)
    {
        if (context.Database.IsNpgsql())
        {
            await context.Database.ExecuteSqlInterpolatedAsync(
                $"SELECT 1 FROM lots WHERE \"LotNumber\" = {lotNumber} FOR UPDATE", cancellationToken).ConfigureAwait(false);
        }
    }
}
