using FilterQA.Cli.Arguments;
using FilterQA.Data;
using FilterQA.Data.Hosting;
using FilterQA.Data.Services;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Diagnostics;
using Microsoft.Extensions.Logging.Abstractions;

namespace FilterQA.Cli.Storage;

/// <summary>
/// The storage behind the commands that read or write the database: chosen by <c>--data</c>, <c>--database</c> and
/// <c>--provider</c> as the application chooses it from its "Storage" settings, migrated when opened.
/// </summary>
internal sealed class CliStorage : IDisposable
{
    public const string DataOption = "--data", DatabaseOption = "--database", ProviderOption = "--provider";

    /// <summary>The options every storage command accepts.</summary>
    public static readonly string[] Options = [DataOption, DatabaseOption, ProviderOption];

    /// <summary>The usage lines for the storage options.</summary>
    public const string Usage = """
          --data <folder>        the data folder holding filterqa.db (default: $XDG_DATA_HOME/filterqa, else
                                 ~/.local/share/filterqa, as the application)
          --database <text>      a connection string: a SQLite Data Source (relative to the data folder), or
                                 a PostgreSQL server with --provider postgres
          --provider <name>      sqlite (default) or postgres
        """;

    private readonly IDbContextFactory<FilterQaDbContext> _contexts;

    private CliStorage(StorageOptions options, IDbContextFactory<FilterQaDbContext> contexts)
    {
        Settings = options;
        _contexts = contexts;
        Clock = TimeProvider.System;
        Catalog = new TemplateCatalog(contexts, Clock);
        Stations = new StationRegistry(contexts, Clock);
        Lots = new LotService(contexts, Clock);
        Measurements = new MeasurementStore(contexts, Clock);
        Intake = new SweepIntake(Lots, Catalog, Stations, Measurements, Clock);
        WhatIf = new WhatIfService(contexts);
        Backup = new StorageBackup(contexts);
    }

    public StorageOptions Settings { get; }

    /// <summary>The context factory over the opened database.</summary>
    public IDbContextFactory<FilterQaDbContext> Contexts => _contexts;

    public TimeProvider Clock { get; }

    public TemplateCatalog Catalog { get; }

    public StationRegistry Stations { get; }

    public LotService Lots { get; }

    public MeasurementStore Measurements { get; }

    public SweepIntake Intake { get; }

    public WhatIfService WhatIf { get; }

    public StorageBackup Backup { get; }

    /// <summary>The storage options from the arguments.</summary>
    /// <exception cref="UsageException">An unknown provider, or PostgreSQL without a connection string.</exception>
    public static StorageOptions OptionsFrom(ParsedArguments parsed)
    {
        ArgumentNullException.ThrowIfNull(parsed);
        StorageProvider provider = parsed.Single(ProviderOption) switch
        {
            null or "sqlite" => StorageProvider.Sqlite,
            "postgres" => StorageProvider.Postgres,
            string other => throw new UsageException($"--provider: '{other}' is not known; use sqlite or postgres"),
        };
        string? database = parsed.Single(DatabaseOption);
        if (provider == StorageProvider.Postgres && string.IsNullOrWhiteSpace(database))
        {
            throw new UsageException("--provider postgres needs --database <connection string> (Host, Port, Username, Database)");
        }
        return new StorageOptions { Provider = provider, ConnectionString = database, DataFolder = parsed.Single(DataOption) };
    }

    /// <summary>Opens and migrates the database; null (with the reason on <paramref name="stderr"/>) when it cannot be opened.</summary>
    public static CliStorage? Open(StorageOptions options, string command, TextWriter stderr)
    {
        ArgumentNullException.ThrowIfNull(options);
        ArgumentNullException.ThrowIfNull(stderr);
        try
        {
            var builder = new DbContextOptionsBuilder<FilterQaDbContext>();
            StorageSetup.Configure(builder, options);
            builder.UseLoggerFactory(NullLoggerFactory.Instance);
            builder.ConfigureWarnings(w => w.Ignore(RelationalEventId.PendingModelChangesWarning));
            var contexts = new ContextFactory(builder.Options);
            using (FilterQaDbContext context = contexts.CreateDbContext())
            {
                StorageStartup.MigrateAsync(context).GetAwaiter().GetResult();
            }
            return new CliStorage(options, contexts);
        }
#pragma warning disable CA1031 // Any failure to open the database is reported as such, with its message, and exit code 2.
        catch (Exception e)
#pragma warning restore CA1031
        {
            stderr.WriteLine($"filterqa {command}: cannot open the database ({Describe(options)}): {e.GetBaseException().Message}");
            return null;
        }
    }

    public void Dispose() => Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();

    private static string Describe(StorageOptions options) => options.Provider == StorageProvider.Sqlite
        ? "SQLite " + SafeSqlitePath(options)
        : "PostgreSQL";

    private static string SafeSqlitePath(StorageOptions options)
    {
        try
        {
            return StorageSetup.SqliteConnectionString(options);
        }
#pragma warning disable CA1031 // Only for the message: the path itself may be what fails.
        catch (Exception)
#pragma warning restore CA1031
        {
            return options.ConnectionString ?? "filterqa.db";
        }
    }

    private sealed class ContextFactory(DbContextOptions<FilterQaDbContext> options) : IDbContextFactory<FilterQaDbContext>
    {
        public FilterQaDbContext CreateDbContext() => new(options);
    }
}
