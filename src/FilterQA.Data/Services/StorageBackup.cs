using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Services;

/// <summary>Online backup of the SQLite database while the application keeps writing.</summary>
public sealed class StorageBackup(IDbContextFactory<FilterQaDbContext> contexts)
{
    /// <summary>
    /// Copies the live SQLite database to <paramref name="destinationPath"/> (a new file) with
    /// SQLite's backup API, which copies one consistent snapshot: every transaction committed
    /// before the copy began is in it, none that commits later is. Then runs
    /// <c>PRAGMA integrity_check</c> on the copy. PostgreSQL sites back up with the server's own
    /// tools, so this throws <see cref="NotSupportedException"/> there.
    /// </summary>
    public async Task<BackupResult> BackupSqliteAsync(string destinationPath, CancellationToken cancellationToken = default)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(destinationPath);
        string destination = Path.GetFullPath(destinationPath);
        if (File.Exists(destination))
        {
            throw new IOException($"backup destination {destination} already exists; choose a new file");
        }
        string source;
        await using (FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false))
        {
            if (!context.Database.IsSqlite())
            {
                throw new NotSupportedException($"online backup here is for SQLite; this database is {context.Database.ProviderName} (use the server's backup tools)");
            }
            source = context.Database.GetConnectionString()
                ?? throw new InvalidOperationException("the SQLite context has no connection string");
        }
        string target = new SqliteConnectionStringBuilder { DataSource = destination, Pooling = false, Mode = SqliteOpenMode.ReadWriteCreate }.ToString();
        return await Task.Run(() =>
        {
            using (var from = new SqliteConnection(source))
            using (var to = new SqliteConnection(target))
            {
                from.Open();
                to.Open();
                // One step (-1 pages) holds a read snapshot for the whole copy, so writers in WAL
                // mode go on while the copy cannot mix pages from before and after a commit.
                from.BackupDatabase(to);
            }
            string integrity;
            using (var check = new SqliteConnection(target))
            {
                check.Open();
                using SqliteCommand command = check.CreateCommand();
                command.CommandText = "PRAGMA integrity_check;";
                integrity = Convert.ToString(command.ExecuteScalar(), System.Globalization.CultureInfo.InvariantCulture) ?? "";
            }
            return new BackupResult(destination, new FileInfo(destination).Length, integrity);
        }, cancellationToken).ConfigureAwait(false);
    }
}
