using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;

namespace FilterQA.Data.Hosting;

/// <summary>What the application runs once at start: bring the schema up to date.</summary>
public static class StorageStartup
{
    /// <summary>
    /// Applies every pending migration, then on SQLite switches the file to WAL mode (readers
    /// do not block the writer; the mode persists in the file, so once is enough).
    /// </summary>
    public static async Task MigrateAsync(IServiceProvider services, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(services);
        await using AsyncServiceScope scope = services.CreateAsyncScope();
        await using FilterQaDbContext context = await scope.ServiceProvider.GetRequiredService<IDbContextFactory<FilterQaDbContext>>()
            .CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        await MigrateAsync(context, cancellationToken).ConfigureAwait(false);
    }

    /// <summary>As <see cref="MigrateAsync(IServiceProvider, CancellationToken)"/> on a given context.</summary>
    public static async Task MigrateAsync(FilterQaDbContext context, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(context);
        await context.Database.MigrateAsync(cancellationToken).ConfigureAwait(false);
        if (context.Database.IsSqlite())
        {
            await context.Database.ExecuteSqlRawAsync("PRAGMA journal_mode=WAL;", cancellationToken).ConfigureAwait(false);
        }
    }
}
