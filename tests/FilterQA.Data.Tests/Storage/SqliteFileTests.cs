using FilterQA.Core.Decisions;
using FilterQA.Data.Hosting;
using FilterQA.Data.Services;
using FilterQA.Data.Tests.Infrastructure;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;

namespace FilterQA.Data.Tests.Storage;

/// <summary>What only the SQLite file has: WAL mode, start-up through configuration, and the online backup.</summary>
public sealed class SqliteFileTests : ProviderTestBase
{
    protected override Task<TestStore> OpenAsync() => TestStore.SqliteAsync();

    [Fact]
    public async Task Start_up_from_configuration_migrates_the_file_in_the_data_folder_in_wal_mode()
    {
        string folder = Path.Combine(Store.Folder!, "app-data");
        IConfiguration configuration = new ConfigurationBuilder().AddInMemoryCollection(new Dictionary<string, string?>
        {
            ["Storage:Provider"] = "Sqlite",
            ["Storage:DataFolder"] = folder,
        }).Build();
        await using ServiceProvider services = new ServiceCollection().AddFilterQaStorage(configuration).BuildServiceProvider();

        await StorageStartup.MigrateAsync(services);

        string file = Path.Combine(folder, "filterqa.db");
        Assert.True(File.Exists(file));
        await using var connection = new SqliteConnection($"Data Source={file};Pooling=False");
        await connection.OpenAsync();
        await using SqliteCommand mode = connection.CreateCommand();
        mode.CommandText = "PRAGMA journal_mode;";
        Assert.Equal("wal", (string?)await mode.ExecuteScalarAsync());
        await using AsyncServiceScope scope = services.CreateAsyncScope();
        Assert.NotNull(scope.ServiceProvider.GetRequiredService<MeasurementStore>());
        SqliteConnection.ClearAllPools();
    }

    [Fact]
    public void An_unknown_provider_in_configuration_is_refused_by_name()
    {
        IConfiguration configuration = new ConfigurationBuilder().AddInMemoryCollection(new Dictionary<string, string?> { ["Storage:Provider"] = "Oracle" }).Build();

        var problem = Assert.Throws<InvalidOperationException>(() => new ServiceCollection().AddFilterQaStorage(configuration));
        Assert.Contains("'Oracle'", problem.Message, StringComparison.Ordinal);
    }

    [Fact]
    public async Task An_online_backup_taken_while_a_writer_stores_units_is_sound_and_consistent()
    {
        PreparedLot prepared = await Store.PrepareLotAsync(PlanRequest.FullInspection(), quantity: 200);
        using var stop = new CancellationTokenSource();
        int written = 0;
        Task writer = Task.Run(async () =>
        {
            for (int i = 0; i < 200 && !stop.IsCancellationRequested; i++)
            {
                await Store.Measurements.StoreAsync(Samples.Measurement(prepared.LotNumber, $"S-{i:D3}", prepared.Template,
                    i % 9 == 0 ? UnitVerdict.NoGo : UnitVerdict.Go, prepared.Station, Store.Clock.GetUtcNow(), i));
                Interlocked.Increment(ref written);
            }
        });
        // Start the copy while the writer is busy.
        while (Volatile.Read(ref written) < 5)
        {
            await Task.Delay(5);
        }
        string copy = Path.Combine(Store.Folder!, "backup.db");

        BackupResult result = await Store.Backup.BackupSqliteAsync(copy);
        int writtenAtCopy = Volatile.Read(ref written);
        stop.Cancel();
        await writer;

        Assert.True(result.IsSound, result.IntegrityCheck);
        var options = new DbContextOptionsBuilder<FilterQaDbContext>().UseSqlite($"Data Source={copy};Pooling=False").Options;
        await using var context = new FilterQaDbContext(options);
        var lot = await context.Lots.AsNoTracking().SingleAsync(l => l.LotNumber == prepared.LotNumber);
        int measurements = await context.Measurements.CountAsync(m => m.LotId == lot.Id);
        int rules = await context.RuleResults.CountAsync();
        // One snapshot: the summary in the copy counts exactly the measurements in the copy, each with all its rule results.
        Assert.Equal(measurements, lot.Counters.Measurements);
        Assert.Equal(measurements, await context.Units.CountAsync(u => u.LotId == lot.Id));
        Assert.Equal(measurements * prepared.Template.Rules.Count, rules);
        Assert.InRange(measurements, 5, writtenAtCopy + 1);
        await Assert.ThrowsAsync<IOException>(() => Store.Backup.BackupSqliteAsync(copy));
    }
}
