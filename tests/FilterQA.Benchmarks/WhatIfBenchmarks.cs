using System.Diagnostics;
using System.Globalization;
using System.Text;
using BenchmarkDotNet.Attributes;
using BenchmarkDotNet.Engines;
using FilterQA.Core.Decisions;
using FilterQA.Core.Formats;
using FilterQA.Core.Formats.Delimited;
using FilterQA.Core.Sampling;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Synthesis;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;
using FilterQA.Core.Templates.Text;
using FilterQA.Data;
using FilterQA.Data.Codecs;
using FilterQA.Data.Entities;
using FilterQA.Data.Hosting;
using FilterQA.Data.Services;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Benchmarks;

/// <summary>
/// What-if re-evaluation of 100 000 stored 1,601-point measurements (the demo LC trap, 100 lots of 1 000 units) from
/// SQLite against a draft with a tightened notch-depth limit. Target: at most 20 s on the project's 2-core machine.
/// </summary>
/// <remarks>
/// The database is built once and kept in the temp folder under a name with <see cref="DataVersion"/>, so later runs
/// reuse it (change the version when the seeding changes). Each unit is stored as a bench would store it (its original
/// file compressed, its compact trace, every rule result), but the traces of 250 synthetic units are reused across the
/// 100 000 units and the rows are inserted through the context in batches of one lot per transaction.
/// </remarks>
[MemoryDiagnoser]
[SimpleJob(RunStrategy.Monitoring, launchCount: 1, warmupCount: 0, iterationCount: 1)]
public class WhatIfBenchmarks
{
    /// <summary>Names the cached database; change it when the seeding below changes.</summary>
    public const string DataVersion = "whatif-v1";

    private const string PartNumber = "TME-LC92-TRAP";
    private const int Lots = 100, UnitsPerLot = 1_000, DistinctUnits = 250;

    private StorageOptions _storage = null!;
    private LimitTemplate _draft = null!;

    [GlobalSetup]
    public void Setup()
    {
        string path = Path.Combine(Path.GetTempPath(), $"filterqa-bench-{DataVersion}.db");
        _storage = new StorageOptions { Provider = StorageProvider.Sqlite, ConnectionString = $"Data Source={path}" };
        LimitTemplate released = ShippedTemplate();
        if (!File.Exists(path + ".complete"))
        {
            foreach (string stale in new[] { path, path + "-wal", path + "-shm" }.Where(File.Exists))
            {
                File.Delete(stale);
            }
            var watch = Stopwatch.StartNew();
            SeedAsync(released).GetAwaiter().GetResult();
            File.WriteAllText(path + ".complete", string.Create(CultureInfo.InvariantCulture, $"seeded in {watch.Elapsed.TotalSeconds:0} s\n"));
            Console.WriteLine($"// seeded {path} ({new FileInfo(path).Length / 1e6:0} MB) in {watch.Elapsed.TotalSeconds:0} s");
        }
        // Notch depth "minimum: 25 dB" tightened to 29 dB: the demo traps' depth is about 29.5 dB with a spread, so
        // a good share of the units flip.
        _draft = LimitTemplate.Create(PartNumber, released.Revision + 1, released.Description, released.Device, released.NominalHz, TemplateStatus.Draft,
            released.Author, null, released.Sweep, released.DecisionRule,
            released.Rules.Select(r => r is NotchDepthRule d ? new NotchDepthRule(d.Id, d.Title, 29, d.Reference, d.Uncertainty) : r).ToArray());
    }

    [Benchmark(Description = "what-if, 100 000 stored 1,601-point measurements, SQLite")]
    public async Task<int> ReevaluateAll()
    {
        WhatIfReport report = await new WhatIfService(new Contexts(Options(_storage))).ReevaluateAsync(PartNumber, _draft);
        if (report.MeasurementsEvaluated != Lots * UnitsPerLot)
        {
            throw new InvalidOperationException($"{report.MeasurementsEvaluated} measurements judged, not {Lots * UnitsPerLot}");
        }
        return report.Flips.Count;
    }

    private static LimitTemplate ShippedTemplate()
    {
        string? root = AppContext.BaseDirectory;
        while (root is not null && !File.Exists(Path.Combine(root, "FilterQA.sln")))
        {
            root = Path.GetDirectoryName(root);
        }
        string file = Path.Combine(root ?? throw new InvalidOperationException("FilterQA.sln not found above " + AppContext.BaseDirectory), "limit-templates", PartNumber + ".yaml");
        TemplateReadResult read = LimitTemplateReader.ReadFile(file);
        return read.Template ?? throw new InvalidOperationException($"{file} does not read: {string.Join("; ", read.Problems)}");
    }

    private static DbContextOptions<FilterQaDbContext> Options(StorageOptions storage)
    {
        var builder = new DbContextOptionsBuilder<FilterQaDbContext>();
        StorageSetup.Configure(builder, storage);
        return builder.Options;
    }

    private async Task SeedAsync(LimitTemplate released)
    {
        var contexts = new Contexts(Options(_storage));
        await using (FilterQaDbContext context = contexts.CreateDbContext())
        {
            await StorageStartup.MigrateAsync(context);
        }
        var clock = TimeProvider.System;
        var engineer = new Actor("u-jlindqvist", "J. Lindqvist");
        var catalog = new TemplateCatalog(contexts, clock);
        await catalog.RegisterAsync(released, engineer);
        long stationId = await new StationRegistry(contexts, clock).RegisterStationAsync("IQC-2", "stepped generator and spectrum analyser", engineer);
        var lotService = new LotService(contexts, clock);

        // A few hundred synthetic units, each as a normalised gain trace in delimited text (the file a scalar bench
        // sends), judged once; their rows are reused across the lots.
        DemoPart part = DemoParts.Get(PartNumber);
        var synthesiser = new UnitSynthesiser(2544);
        var samples = synthesiser.Lot(part, DistinctUnits, 0.08).AsParallel().AsOrdered().Select(u => Prepare(u, released)).ToArray();
        DateTimeOffset start = new(2026, 11, 2, 7, 0, 0, TimeSpan.Zero);
        for (int l = 0; l < Lots; l++)
        {
            string lotNumber = string.Create(CultureInfo.InvariantCulture, $"LC-2611-{l + 1:D3}");
            LotSummary lot = await lotService.CreateLotAsync(new NewLot(lotNumber, PartNumber, released.Revision, "Harlow Passives", UnitsPerLot,
                PlanRequest.FullInspection(UnitsPerLot / 10)), engineer);
            await using FilterQaDbContext context = contexts.CreateDbContext();
            context.ChangeTracker.AutoDetectChangesEnabled = false;
            await using var transaction = await context.Database.BeginTransactionAsync();
            LotRecord record = await context.Lots.Include(x => x.TemplateRevision).SingleAsync(x => x.Id == lot.Id);
            var rows = new List<(UnitRecord Unit, MeasurementRecord Measurement, UnitVerdict Verdict)>(UnitsPerLot);
            for (int u = 0; u < UnitsPerLot; u++)
            {
                Sample sample = samples[(l * 37 + u) % samples.Length];
                DateTimeOffset at = start.AddDays(l).AddSeconds(20 * u);
                var unit = new UnitRecord
                {
                    LotId = record.Id, Serial = UnitSynthesiser.Serial(u + 1), SamplePosition = u + 1, Attempts = 1,
                    FirstVerdict = sample.Verdict, LatestVerdict = sample.Verdict, CountedVerdict = sample.Verdict, FirstTestedAt = at, LastTestedAt = at,
                };
                var measurement = new MeasurementRecord
                {
                    Unit = unit, LotId = record.Id, Attempt = 1, CountsForLot = true, TemplateRevisionId = record.TemplateRevisionId,
                    TemplateHash = released.ContentHash, StationId = stationId, OperatorId = "u-rhaldane", OperatorName = "R. Haldane",
                    MeasuredAt = at, StoredAt = at, Verdict = sample.Verdict, Warnings = sample.Warnings, Sweep = sample.Stored(),
                    Rules = sample.Rules.Select(Copy).ToList(),
                };
                context.Units.Add(unit);
                context.Measurements.Add(measurement);
                rows.Add((unit, measurement, sample.Verdict));
            }
            context.ChangeTracker.DetectChanges();
            await context.SaveChangesAsync();
            foreach ((UnitRecord unit, MeasurementRecord measurement, UnitVerdict verdict) in rows)
            {
                unit.CountedMeasurementId = measurement.Id;
                unit.LatestMeasurementId = measurement.Id;
                record.Counters.UnitsTested++;
                record.Counters.Measurements++;
                record.Counters.Go += verdict == UnitVerdict.Go ? 1 : 0;
                record.Counters.FirstPassGo += verdict == UnitVerdict.Go ? 1 : 0;
                record.Counters.NoGo += verdict == UnitVerdict.NoGo ? 1 : 0;
                record.Counters.NotVerifiable += verdict == UnitVerdict.NotVerifiable ? 1 : 0;
            }
            record.Counters.Defectives = record.Counters.NoGo + record.Counters.NotVerifiable;
            record.Status = LotStatus.InTest;
            record.Version++;
            context.ChangeTracker.DetectChanges();
            await context.SaveChangesAsync();
            await transaction.CommitAsync();
        }
        SqliteConnection.ClearAllPools();
    }

    private static RuleResultRecord Copy(RuleResultRecord r) => new()
    {
        Ordinal = r.Ordinal, RuleId = r.RuleId, Kind = r.Kind, Title = r.Title, Unit = r.Unit, MeasuredValue = r.MeasuredValue, LimitValue = r.LimitValue,
        Sense = r.Sense, Margin = r.Margin, GuardBand = r.GuardBand, Outcome = r.Outcome, IsLowerBound = r.IsLowerBound, AtHz = r.AtHz, Message = r.Message,
    };

    private static Sample Prepare(SyntheticUnit unit, LimitTemplate template)
    {
        ReadOnlySpan<System.Numerics.Complex> s21 = unit.Sweep.Network!.Trace(2, 1);
        var gainDb = new double[s21.Length];
        for (int i = 0; i < gainDb.Length; i++)
        {
            gainDb[i] = 20 * Math.Log10(s21[i].Magnitude);
        }
        string fileName = PartNumber + "_" + unit.Serial + ".csv";
        Sweep scalar = Sweep.FromScalar(ScalarTrace.Create(unit.Sweep.Grid, ScalarQuantity.GainDb, gainDb), SweepSource.Of(fileName, SweepFormat.DelimitedText));
        using var text = new StringWriter();
        DelimitedTextWriter.Write(scalar, text);
        byte[] bytes = Encoding.UTF8.GetBytes(text.ToString());
        Sweep read = SweepFileReader.Read(bytes, fileName);
        var input = MeasurementInput.FromSweep(read);
        UnitEvaluation evaluation = TemplateEvaluator.Evaluate(template, input);
        return new Sample(fileName, read.Source.Format, bytes.Length, SweepBytes.Sha256Hex(bytes), SweepBytes.Compress(bytes), ResponseTraceCodec.Encode(input.Primary), input.Primary,
            evaluation.Verdict, string.Join('\n', evaluation.Warnings),
            evaluation.Rules.Select((r, i) => new RuleResultRecord
            {
                Ordinal = i, RuleId = r.RuleId, Kind = r.Kind, Title = r.Title, Unit = r.Unit, MeasuredValue = r.MeasuredValue, LimitValue = r.LimitValue,
                Sense = r.Sense, Margin = r.Margin, GuardBand = r.GuardBand, Outcome = r.Outcome, IsLowerBound = r.IsLowerBound, AtHz = r.AtHz, Message = r.Message,
            }).ToArray());
    }

    private sealed record Sample(string FileName, SweepFormat Format, int RawLength, string RawSha256, byte[] RawCompressed, byte[] Trace, ResponseTrace Response,
        UnitVerdict Verdict, string Warnings, RuleResultRecord[] Rules)
    {
        public StoredSweep Stored() => new()
        {
            FileName = FileName, Format = Format, RawLength = RawLength, RawSha256 = RawSha256, RawCompressed = RawCompressed,
            Path = Response.Path, PointCount = Response.Grid.Count, StartHz = Response.Grid.StartHz, StopHz = Response.Grid.StopHz, Trace = Trace,
        };
    }

    private sealed class Contexts(DbContextOptions<FilterQaDbContext> options) : IDbContextFactory<FilterQaDbContext>
    {
        public FilterQaDbContext CreateDbContext() => new(options);
    }
}
