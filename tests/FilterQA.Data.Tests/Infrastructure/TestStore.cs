using FilterQA.Data.Hosting;
using FilterQA.Data.Services;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Diagnostics;

namespace FilterQA.Data.Tests.Infrastructure;

/// <summary>A migrated database for one test (SQLite: its own temp file) or one test class (PostgreSQL), with the services over it.</summary>
public sealed class TestStore : IAsyncDisposable
{
    private readonly string? _folder;

    private TestStore(StorageOptions storage, string? folder)
    {
        Storage = storage;
        _folder = folder;
        Options = Build(storage, []);
        Contexts = new OptionsContextFactory(Options);
        Catalog = new TemplateCatalog(Contexts, Clock);
        Stations = new StationRegistry(Contexts, Clock);
        Lots = new LotService(Contexts, Clock);
        Measurements = new MeasurementStore(Contexts, Clock);
        Backup = new StorageBackup(Contexts);
        Intake = new SweepIntake(Lots, Catalog, Stations, Measurements, Clock);
        WhatIf = new WhatIfService(Contexts);
        ReferenceUnits = new ReferenceUnitService(Contexts, Clock);
    }

    public StorageOptions Storage { get; }

    public StorageProvider Provider => Storage.Provider;

    public string? Folder => _folder;

    public ManualClock Clock { get; } = new(new DateTimeOffset(2026, 11, 3, 8, 0, 0, TimeSpan.Zero));

    public DbContextOptions<FilterQaDbContext> Options { get; }

    public IDbContextFactory<FilterQaDbContext> Contexts { get; }

    public TemplateCatalog Catalog { get; }

    public StationRegistry Stations { get; }

    public LotService Lots { get; }

    public MeasurementStore Measurements { get; }

    public StorageBackup Backup { get; }

    public SweepIntake Intake { get; }

    public WhatIfService WhatIf { get; }

    public ReferenceUnitService ReferenceUnits { get; }

    public FilterQaDbContext NewContext() => new(Options);

    /// <summary>A measurement store whose contexts carry <paramref name="interceptor"/> (for injected failures).</summary>
    public MeasurementStore MeasurementsWith(IInterceptor interceptor) =>
        new(new OptionsContextFactory(Build(Storage, [interceptor])), Clock);

    public static async Task<TestStore> SqliteAsync()
    {
        string folder = Path.Combine(Path.GetTempPath(), "filterqa-data-tests", Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(folder);
        var store = new TestStore(new StorageOptions
        {
            Provider = StorageProvider.Sqlite,
            ConnectionString = "Data Source=filterqa.db",
            DataFolder = folder,
        }, folder);
        await using FilterQaDbContext context = store.NewContext();
        await StorageStartup.MigrateAsync(context);
        return store;
    }

    public static TestStore Postgres(PostgresDatabase database)
    {
        ArgumentNullException.ThrowIfNull(database);
        if (database.ConnectionString is not { } connection)
        {
            throw new InvalidOperationException(PostgresEnvironment.MissingMessage);
        }
        return new TestStore(new StorageOptions { Provider = StorageProvider.Postgres, ConnectionString = connection }, null);
    }

    public ValueTask DisposeAsync()
    {
        if (_folder is not null)
        {
            SqliteConnection.ClearAllPools();
            try
            {
                Directory.Delete(_folder, recursive: true);
            }
            catch (IOException)
            {
                // A file still open by a finalising connection: the temp folder is cleaned by the OS.
            }
        }
        return ValueTask.CompletedTask;
    }

    private static DbContextOptions<FilterQaDbContext> Build(StorageOptions storage, IInterceptor[] interceptors)
    {
        var builder = new DbContextOptionsBuilder<FilterQaDbContext>();
        StorageSetup.Configure(builder, storage);
        builder.ConfigureWarnings(w => w.Ignore(CoreEventId.ManyServiceProvidersCreatedWarning));
        if (interceptors.Length > 0)
        {
            builder.AddInterceptors(interceptors);
        }
        return builder.Options;
    }
}
