using System.Diagnostics;
using System.Globalization;
using FilterQA.Core.Decisions;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Text;
using FilterQA.Data;
using FilterQA.Data.Entities;
using FilterQA.Data.Hosting;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Benchmarks.Storage;

/// <summary>
/// A SQLite database for the benchmarks that read stored measurements: built once and kept in the temp folder under a
/// name with its data version (a marker file says the seeding finished), and the quick way to write a lot's stored units
/// (through the context, one transaction per lot) instead of the per-unit intake.
/// </summary>
internal sealed class BenchmarkDatabase : IDbContextFactory<FilterQaDbContext>
{
    private readonly DbContextOptions<FilterQaDbContext> _options;

    public BenchmarkDatabase(string dataVersion)
    {
        FilePath = Path.Combine(Path.GetTempPath(), $"filterqa-bench-{dataVersion}.db");
        Storage = new StorageOptions { Provider = StorageProvider.Sqlite, ConnectionString = $"Data Source={FilePath}" };
        var builder = new DbContextOptionsBuilder<FilterQaDbContext>();
        StorageSetup.Configure(builder, Storage);
        _options = builder.Options;
    }

    public string FilePath { get; }

    public StorageOptions Storage { get; }

    public FilterQaDbContext CreateDbContext() => new(_options);

    /// <summary>Runs <paramref name="seed"/> on a fresh, migrated file unless a finished one is cached.</summary>
    public void EnsureSeeded(Func<Task> seed)
    {
        if (File.Exists(FilePath + ".complete"))
        {
            return;
        }
        foreach (string stale in new[] { FilePath, FilePath + "-wal", FilePath + "-shm" }.Where(File.Exists))
        {
            File.Delete(stale);
        }
        var watch = Stopwatch.StartNew();
        using (FilterQaDbContext context = CreateDbContext())
        {
            StorageStartup.MigrateAsync(context).GetAwaiter().GetResult();
        }
        seed().GetAwaiter().GetResult();
        SqliteConnection.ClearAllPools();
        File.WriteAllText(FilePath + ".complete", string.Create(CultureInfo.InvariantCulture, $"seeded in {watch.Elapsed.TotalSeconds:0} s\n"));
        Console.WriteLine($"// seeded {FilePath} ({new FileInfo(FilePath).Length / 1e6:0} MB) in {watch.Elapsed.TotalSeconds:0} s");
    }

    /// <summary>
    /// Stores <paramref name="count"/> units of an open lot, each tested once and counted, in one transaction, saving
    /// <paramref name="batchSize"/> units at a time (<paramref name="sample"/> is asked for a batch at once, in parallel),
    /// then sets the lot's counters and moves it to in test, as the intake would have left it.
    /// </summary>
    public async Task WriteUnitsAsync(long lotId, long stationId, string templateHash, int count, int batchSize, Func<int, StoredSample> sample,
        Func<int, DateTimeOffset> testedAt)
    {
        await using FilterQaDbContext context = CreateDbContext();
        context.ChangeTracker.AutoDetectChangesEnabled = false;
        await using var transaction = await context.Database.BeginTransactionAsync();
        long revisionId = await context.Lots.Where(x => x.Id == lotId).Select(x => x.TemplateRevisionId).SingleAsync();
        var counters = new LotCounters();
        for (int first = 0; first < count; first += batchSize)
        {
            StoredSample[] samples = Enumerable.Range(first, Math.Min(batchSize, count - first)).AsParallel().AsOrdered().Select(sample).ToArray();
            var rows = new List<(UnitRecord Unit, MeasurementRecord Measurement)>(samples.Length);
            for (int i = 0; i < samples.Length; i++)
            {
                int u = first + i;
                StoredSample s = samples[i];
                DateTimeOffset at = testedAt(u);
                var unit = new UnitRecord
                {
                    LotId = lotId, Serial = Core.Synthesis.UnitSynthesiser.Serial(u + 1), SamplePosition = u + 1, Attempts = 1,
                    FirstVerdict = s.Verdict, LatestVerdict = s.Verdict, CountedVerdict = s.Verdict, FirstTestedAt = at, LastTestedAt = at,
                };
                var measurement = new MeasurementRecord
                {
                    Unit = unit, LotId = lotId, Attempt = 1, CountsForLot = true, TemplateRevisionId = revisionId,
                    TemplateHash = templateHash, StationId = stationId, OperatorId = "u-rhaldane", OperatorName = "R. Haldane",
                    MeasuredAt = at, StoredAt = at, Verdict = s.Verdict, Warnings = s.Warnings, Sweep = s.Stored(), Rules = s.RuleRows(),
                };
                context.Units.Add(unit);
                context.Measurements.Add(measurement);
                rows.Add((unit, measurement));
                counters.UnitsTested++;
                counters.Measurements++;
                counters.Go += s.Verdict == UnitVerdict.Go ? 1 : 0;
                counters.FirstPassGo += s.Verdict == UnitVerdict.Go ? 1 : 0;
                counters.NoGo += s.Verdict == UnitVerdict.NoGo ? 1 : 0;
                counters.NotVerifiable += s.Verdict == UnitVerdict.NotVerifiable ? 1 : 0;
            }
            context.ChangeTracker.DetectChanges();
            await context.SaveChangesAsync();
            foreach ((UnitRecord unit, MeasurementRecord measurement) in rows)
            {
                unit.CountedMeasurementId = measurement.Id;
                unit.LatestMeasurementId = measurement.Id;
            }
            context.ChangeTracker.DetectChanges();
            await context.SaveChangesAsync();
            context.ChangeTracker.Clear();
        }
        counters.Defectives = counters.NoGo + counters.NotVerifiable;
        LotRecord record = await context.Lots.SingleAsync(x => x.Id == lotId);
        record.Counters.UnitsTested += counters.UnitsTested;
        record.Counters.Measurements += counters.Measurements;
        record.Counters.Go += counters.Go;
        record.Counters.FirstPassGo += counters.FirstPassGo;
        record.Counters.NoGo += counters.NoGo;
        record.Counters.NotVerifiable += counters.NotVerifiable;
        record.Counters.Defectives += counters.Defectives;
        record.Status = LotStatus.InTest;
        record.Version++;
        context.ChangeTracker.DetectChanges();
        await context.SaveChangesAsync();
        await transaction.CommitAsync();
    }

    /// <summary>The shipped limit template of a demo part, read from limit-templates/ at the repository root.</summary>
    public static LimitTemplate ShippedTemplate(string partNumber)
    {
        string? root = AppContext.BaseDirectory;
        while (root is not null && !File.Exists(Path.Combine(root, "FilterQA.sln")))
        {
            root = Path.GetDirectoryName(root);
        }
        string file = Path.Combine(root ?? throw new InvalidOperationException("FilterQA.sln not found above " + AppContext.BaseDirectory), "limit-templates", partNumber + ".yaml");
        TemplateReadResult read = LimitTemplateReader.ReadFile(file);
        return read.Template ?? throw new InvalidOperationException($"{file} does not read: {string.Join("; ", read.Problems)}");
    }
}
