using FilterQA.Core.Formats.Touchstone;
using FilterQA.Core.Synthesis;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Text;
using FilterQA.Data;
using FilterQA.Data.Hosting;
using FilterQA.Data.Services;
using FilterQA.Reports.Sources;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Time.Testing;

namespace FilterQA.Reports.Tests.Infrastructure;

/// <summary>A migrated SQLite database in a temp folder with the storage services and the report content source over it.</summary>
public sealed class ReportStore : IAsyncDisposable
{
    public const string PartNumber = "TME-CF455-15";
    public static readonly Actor Engineer = new("u-jlindqvist", "J. Lindqvist");
    public static readonly Actor Operator = new("u-rhaldane", "R. Haldane");
    public static readonly Actor Approver = new("u-spetrova", "S. Petrova", isApprover: true);

    private readonly string _folder;

    private ReportStore(string folder)
    {
        _folder = folder;
        var builder = new DbContextOptionsBuilder<FilterQaDbContext>();
        StorageSetup.Configure(builder, new StorageOptions { Provider = StorageProvider.Sqlite, ConnectionString = "Data Source=filterqa.db", DataFolder = folder });
        Options = builder.Options;
        Contexts = new Factory(Options);
        Catalog = new TemplateCatalog(Contexts, Clock);
        Stations = new StationRegistry(Contexts, Clock);
        Lots = new LotService(Contexts, Clock);
        Measurements = new MeasurementStore(Contexts, Clock);
        Intake = new SweepIntake(Lots, Catalog, Stations, Measurements, Clock);
        Source = new ReportContentSource(Contexts, Lots, Measurements, Catalog, Clock);
    }

    public FakeTimeProvider Clock { get; } = new(new DateTimeOffset(2026, 11, 3, 8, 0, 0, TimeSpan.Zero));

    public DbContextOptions<FilterQaDbContext> Options { get; }

    public IDbContextFactory<FilterQaDbContext> Contexts { get; }

    public TemplateCatalog Catalog { get; }

    public StationRegistry Stations { get; }

    public LotService Lots { get; }

    public MeasurementStore Measurements { get; }

    public SweepIntake Intake { get; }

    public ReportContentSource Source { get; }

    public FilterQaDbContext NewContext() => new(Options);

    public static async Task<ReportStore> CreateAsync()
    {
        string folder = Path.Combine(Path.GetTempPath(), "filterqa-report-tests", Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(folder);
        var store = new ReportStore(folder);
        await using FilterQaDbContext context = store.NewContext();
        await StorageStartup.MigrateAsync(context);
        TemplateReadResult read = LimitTemplateReader.ReadFile(Path.Combine(RepositoryRoot(), "limit-templates", PartNumber + ".yaml"));
        LimitTemplate template = read.Template ?? throw new InvalidOperationException("the shipped template does not read: " + string.Join("; ", read.Problems));
        await store.Catalog.RegisterAsync(template, Engineer);
        await store.Stations.RegisterStationAsync("IQC-1", "VNA bench", Engineer);
        return store;
    }

    /// <summary>A lot of <paramref name="units"/> synthesised units (100 % inspection, Ac 0), every unit submitted through the intake; decided when asked.</summary>
    public async Task<LotSummary> LotAsync(string lotNumber, int units, double defectShare, ulong seed, bool decide)
    {
        await Lots.CreateLotAsync(new NewLot(lotNumber, PartNumber, null, "Veltrane Piezo", units, PlanRequest.FullInspection(0))
        {
            SupplierLot = "VPZ-88412",
            DateCode = "2544",
            PurchaseOrder = "PO-7731",
            Customer = "Brackwater Shipyards",
        }, Engineer);
        var synthesiser = new UnitSynthesiser(seed);
        foreach (SyntheticUnit unit in synthesiser.Lot(DemoParts.Get(PartNumber), units, defectShare))
        {
            Clock.Advance(TimeSpan.FromMinutes(1));
            byte[] bytes = System.Text.Encoding.ASCII.GetBytes(TouchstoneWriter.WriteToString(unit.Sweep));
            await Intake.SubmitAsync(new SweepSubmission(lotNumber, unit.Serial, "IQC-1", Operator, bytes, $"{lotNumber}__{unit.Serial}.s2p"));
        }
        return decide ? await Lots.DecideAsync(lotNumber, Approver) : await Lots.GetSummaryAsync(lotNumber);
    }

    public ValueTask DisposeAsync()
    {
        SqliteConnection.ClearAllPools();
        try
        {
            Directory.Delete(_folder, recursive: true);
        }
        catch (IOException)
        {
            // A file still held by a finalising connection: the OS cleans the temp folder.
        }
        return ValueTask.CompletedTask;
    }

    public static string RepositoryRoot()
    {
        var directory = new DirectoryInfo(AppContext.BaseDirectory);
        while (directory is not null && !File.Exists(Path.Combine(directory.FullName, "FilterQA.sln")))
        {
            directory = directory.Parent;
        }
        return directory?.FullName ?? throw new InvalidOperationException("FilterQA.sln not found above the test binaries");
    }

    private sealed class Factory(DbContextOptions<FilterQaDbContext> options) : IDbContextFactory<FilterQaDbContext>
    {
        public FilterQaDbContext CreateDbContext() => new(options);
    }
}
