using System.Globalization;
using System.Text;
using BenchmarkDotNet.Attributes;
using BenchmarkDotNet.Engines;
using FilterQA.Benchmarks.Storage;
using FilterQA.Core.Formats.Touchstone;
using FilterQA.Core.Synthesis;
using FilterQA.Core.Templates;
using FilterQA.Data.Services;
using FilterQA.Reports.Documents;
using FilterQA.Reports.Pdf;
using FilterQA.Reports.Sources;

namespace FilterQA.Benchmarks;

/// <summary>
/// The yield report of one lot of 10,000 measured units of the demo 455 kHz ceramic IF filter, end to end from SQLite:
/// <see cref="ReportContentSource.LotYieldAsync"/> (lot summary and statistics, the envelope of every counted compact
/// trace, the non-conforming units with their rule results, the limit lines) and then the A4 PDF. Target: at most 5 s on
/// the project's 2-core machine.
/// </summary>
/// <remarks>
/// The database is built once and kept in the temp folder (<see cref="BenchmarkDatabase"/>, named with
/// <see cref="DataVersion"/>). Every unit is a distinct synthesised unit (3 % defective), written as the 2-port
/// Touchstone file a network-analyser bench sends, judged against the shipped template and stored as the intake stores
/// it (original file compressed, compact trace, every rule result), but through the context a few hundred units at a
/// time in one transaction rather than unit by unit through the intake. The lot has a 100 % inspection plan with an
/// acceptance number of 500 and is decided by the plan, so its counters and status are those the intake would leave.
/// One warm-up report comes before the measured one: the first report of a process also pays for the JIT, the EF Core
/// model and query compilation and a cold page cache (the warm-up line of the output shows it), which a running server
/// pays once.
/// </remarks>
[MemoryDiagnoser]
[SimpleJob(RunStrategy.Monitoring, launchCount: 1, warmupCount: 1, iterationCount: 1)]
public class StoredReportBenchmarks
{
    /// <summary>Names the cached database; change it when the seeding below changes.</summary>
    public const string DataVersion = "stored-report-v1";

    private const string PartNumber = "TME-CF455-15", LotNumber = "VP-2611-0500";
    private const int Units = 10_000, BatchSize = 250;
    private const double DefectShare = 0.03;

    private BenchmarkDatabase _database = null!;
    private ReportContentSource _source = null!;
    private readonly ReportFonts _fonts = ReportFonts.Load();

    [GlobalSetup]
    public void Setup()
    {
        _database = new BenchmarkDatabase(DataVersion);
        LimitTemplate released = BenchmarkDatabase.ShippedTemplate(PartNumber);
        _database.EnsureSeeded(() => SeedAsync(released));
        TimeProvider clock = TimeProvider.System;
        _source = new ReportContentSource(_database, new LotService(_database, clock), new MeasurementStore(_database, clock),
            new TemplateCatalog(_database, clock), clock);
    }

    [Benchmark(Description = "yield report PDF, one stored lot of 10,000 units, SQLite")]
    public async Task<long> LotYieldReport()
    {
        YieldReportContent content = await _source.LotYieldAsync(LotNumber, "J. Lindqvist");
        if (content.Envelope.TraceCount != Units || content.NonConforming.Count == 0 || content.Pareto.Count == 0)
        {
            throw new InvalidOperationException(string.Create(CultureInfo.InvariantCulture,
                $"the report holds {content.Envelope.TraceCount} sweeps, {content.NonConforming.Count} non-conforming units and {content.Pareto.Count} Pareto bars; expected {Units} sweeps and some of each"));
        }
        using var stream = new MemoryStream();
        new YieldReportDocument(_fonts).Render(content, PaperSize.A4, stream);
        return stream.Length;
    }

    private async Task SeedAsync(LimitTemplate released)
    {
        TimeProvider clock = TimeProvider.System;
        var engineer = new Actor("u-jlindqvist", "J. Lindqvist");
        await new TemplateCatalog(_database, clock).RegisterAsync(released, engineer);
        long stationId = await new StationRegistry(_database, clock).RegisterStationAsync("IQC-1", "VNA bench", engineer);
        var lots = new LotService(_database, clock);
        LotSummary lot = await lots.CreateLotAsync(new NewLot(LotNumber, PartNumber, released.Revision, "Veltrane Piezo", Units, PlanRequest.FullInspection(500))
        {
            SupplierLot = "VPZ-88412", DateCode = "2544", PurchaseOrder = "PO-7731", Customer = "Brackwater Shipyards",
        }, engineer);

        // The lot's defective serials depend on the whole lot, so the units are drawn once (lazily, a sweep each) and
        // each is written as a Touchstone file and judged when its batch is stored.
        var synthesiser = new UnitSynthesiser(2611);
        DemoPart part = DemoParts.Get(PartNumber);
        (int SerialIndex, DefectKind Defect, string Serial)[] units = synthesiser.Lot(part, Units, DefectShare).Select(u => (u.SerialIndex, u.Defect, u.Serial)).ToArray();
        DateTimeOffset start = new(2026, 11, 2, 7, 0, 0, TimeSpan.Zero);
        await _database.WriteUnitsAsync(lot.Id, stationId, released.ContentHash, Units, BatchSize, u =>
        {
            (int serialIndex, DefectKind defect, string serial) = units[u];
            byte[] bytes = Encoding.ASCII.GetBytes(TouchstoneWriter.WriteToString(synthesiser.Unit(part, serialIndex, defect)));
            return StoredSample.FromFile(bytes, $"{LotNumber}__{serial}.s2p", released);
        }, u => start.AddSeconds(12 * u));
        await lots.DecideAsync(LotNumber, new Actor("u-spetrova", "S. Petrova", isApprover: true));
    }
}
