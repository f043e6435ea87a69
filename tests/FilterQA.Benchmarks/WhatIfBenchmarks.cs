using System.Globalization;
using System.Text;
using BenchmarkDotNet.Attributes;
using BenchmarkDotNet.Engines;
using FilterQA.Benchmarks.Storage;
using FilterQA.Core.Formats.Delimited;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Synthesis;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;
using FilterQA.Data.Services;

namespace FilterQA.Benchmarks;

/// <summary>
/// What-if re-evaluation of 100 000 stored 1,601-point measurements (the demo LC trap, 100 lots of 1 000 units) from
/// SQLite against a draft with a tightened notch-depth limit. Target: at most 20 s on the project's 2-core machine.
/// </summary>
/// <remarks>
/// The database is built once and kept in the temp folder under a name with <see cref="DataVersion"/>
/// (<see cref="BenchmarkDatabase"/>), so later runs reuse it (change the version when the seeding changes). Each unit is stored as a bench would store it (its original
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

    private BenchmarkDatabase _database = null!;
    private LimitTemplate _draft = null!;

    [GlobalSetup]
    public void Setup()
    {
        _database = new BenchmarkDatabase(DataVersion);
        LimitTemplate released = BenchmarkDatabase.ShippedTemplate(PartNumber);
        _database.EnsureSeeded(() => SeedAsync(released));
        // Notch depth "minimum: 25 dB" tightened to 29 dB: the demo traps' depth is about 29.5 dB with a spread, so
        // a good share of the units flip.
        _draft = LimitTemplate.Create(PartNumber, released.Revision + 1, released.Description, released.Device, released.NominalHz, TemplateStatus.Draft,
            released.Author, null, released.Sweep, released.DecisionRule,
            released.Rules.Select(r => r is NotchDepthRule d ? new NotchDepthRule(d.Id, d.Title, 29, d.Reference, d.Uncertainty) : r).ToArray());
    }

    [Benchmark(Description = "what-if, 100 000 stored 1,601-point measurements, SQLite")]
    public async Task<int> ReevaluateAll()
    {
        WhatIfReport report = await new WhatIfService(_database).ReevaluateAsync(PartNumber, _draft);
        if (report.MeasurementsEvaluated != Lots * UnitsPerLot)
        {
            throw new InvalidOperationException($"{report.MeasurementsEvaluated} measurements judged, not {Lots * UnitsPerLot}");
        }
        return report.Flips.Count;
    }

    private async Task SeedAsync(LimitTemplate released)
    {
        var clock = TimeProvider.System;
        var engineer = new Actor("u-jlindqvist", "J. Lindqvist");
        var catalog = new TemplateCatalog(_database, clock);
        await catalog.RegisterAsync(released, engineer);
        long stationId = await new StationRegistry(_database, clock).RegisterStationAsync("IQC-2", "stepped generator and spectrum analyser", engineer);
        var lotService = new LotService(_database, clock);

        // A few hundred synthetic units, each as a normalised gain trace in delimited text (the file a scalar bench
        // sends), judged once; their rows are reused across the lots.
        DemoPart part = DemoParts.Get(PartNumber);
        var synthesiser = new UnitSynthesiser(2544);
        StoredSample[] samples = synthesiser.Lot(part, DistinctUnits, 0.08).AsParallel().AsOrdered().Select(u => Prepare(u, released)).ToArray();
        DateTimeOffset start = new(2026, 11, 2, 7, 0, 0, TimeSpan.Zero);
        for (int l = 0; l < Lots; l++)
        {
            string lotNumber = string.Create(CultureInfo.InvariantCulture, $"LC-2611-{l + 1:D3}");
            LotSummary lot = await lotService.CreateLotAsync(new NewLot(lotNumber, PartNumber, released.Revision, "Harlow Passives", UnitsPerLot,
                PlanRequest.FullInspection(UnitsPerLot / 10)), engineer);
            int lotIndex = l;
            await _database.WriteUnitsAsync(lot.Id, stationId, released.ContentHash, UnitsPerLot, UnitsPerLot,
                u => samples[(lotIndex * 37 + u) % samples.Length], u => start.AddDays(lotIndex).AddSeconds(20 * u));
        }
    }

    private static StoredSample Prepare(SyntheticUnit unit, LimitTemplate template)
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
        return StoredSample.FromFile(Encoding.UTF8.GetBytes(text.ToString()), fileName, template);
    }
}
