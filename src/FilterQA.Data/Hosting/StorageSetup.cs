using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Hosting;

/// <summary>Turns <see cref="StorageOptions"/> into DbContext options; the same code for both providers.</summary>
public static class StorageSetup
{
    /// <summary>The SQLite connection string with its Data Source made absolute in the data folder.</summary>
    public static string SqliteConnectionString(StorageOptions options)
    {
        ArgumentNullException.ThrowIfNull(options);
        var builder = new SqliteConnectionStringBuilder(options.ConnectionString ?? "");
        if (string.IsNullOrWhiteSpace(builder.DataSource))
        {
            builder.DataSource = "filterqa.db";
        }
        if (builder.DataSource != ":memory:" && !Path.IsPathRooted(builder.DataSource))
        {
            string folder = DataFolder.Resolve(options.DataFolder);
            Directory.CreateDirectory(folder);
            builder.DataSource = Path.Combine(folder, builder.DataSource);
        }
        // Writers wait for each other's short transactions instead of failing at once.
        if (builder.DefaultTimeout < 30)
        {
            builder.DefaultTimeout = 30;
        }
        return builder.ToString();
    }

    /// <summary>Configures <paramref name="builder"/> for the provider named in <paramref name="options"/>.</summary>
    public static DbContextOptionsBuilder Configure(DbContextOptionsBuilder builder, StorageOptions options)
    {
        ArgumentNullException.ThrowIfNull(builder);
        ArgumentNullException.ThrowIfNull(options);
        switch (options.Provider)
        {
            case StorageProvider.Sqlite:
                builder.UseSqlite(SqliteConnectionString(options), sqlite => sqlite.MigrationsAssembly(StorageOptions.SqliteMigrationsAssembly));
                break;
            case StorageProvider.Postgres:
                if (string.IsNullOrWhiteSpace(options.ConnectionString))
                {
                    throw new InvalidOperationException("Storage:Provider is Postgres but Storage:ConnectionString is empty; give Host, Port, Username and Database");
                }
                builder.UseNpgsql(options.ConnectionString, npgsql => npgsql.MigrationsAssembly(StorageOptions.PostgresMigrationsAssembly));
                break;
            default:
                throw new InvalidOperationException($"Storage:Provider '{options.Provider}' is not known; use Sqlite or Postgres");
        }
        return builder;
    }
}
