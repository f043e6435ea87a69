using System.IO.Compression;
using FilterQA.Cli.Storage;
using FilterQA.Core.Decisions;
using FilterQA.Core.Synthesis;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Text;
using FilterQA.Data.Hosting;
using FilterQA.Data.Services;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Cli.Tests;

/// <summary>
/// A data folder of its own (SQLite) with the shipped TME-CF455-15 template released and a lot created against it,
/// and a folder of demo sweep files, for the commands that work on the database.
/// </summary>
internal sealed class StorageCommandFixture : IDisposable
{
    public const string Part = "TME-CF455-15";
    public const string Station = "IQC-1";
    public const string LotNumber = "VP-2611-0042";

    public static readonly Actor Engineer = new("u-jlindqvist", "J. Lindqvist");

    private readonly CliFixture _files = new();

    public StorageCommandFixture(int quantity = 10)
    {
        DataFolder = Path.Combine(_files.Folder, "data");
        Sweeps = Directory.CreateDirectory(Path.Combine(_files.Folder, "sweeps")).FullName;
        TemplateReadResult read = LimitTemplateReader.ReadFile(CliFixture.ShippedTemplate(Part));
        Template = read.Template ?? throw new InvalidOperationException("the shipped template does not read");
        using CliStorage storage = Open();
        storage.Catalog.RegisterAsync(Template, Engineer).GetAwaiter().GetResult();
        storage.Lots.CreateLotAsync(new NewLot(LotNumber, Part, null, "Veltrane Piezo", quantity, PlanRequest.FullInspection()), Engineer).GetAwaiter().GetResult();
    }

    public string DataFolder { get; }

    public string Sweeps { get; }

    public string Folder => _files.Folder;

    public LimitTemplate Template { get; }

    public CliStorage Open() => CliStorage.Open(new StorageOptions { DataFolder = DataFolder }, "test", TextWriter.Null)
        ?? throw new InvalidOperationException("the test database does not open");

    /// <summary>Writes demo unit <paramref name="serialIndex"/> as Touchstone into the sweeps folder, named e.g. S0001.s2p.</summary>
    public string Unit(int serialIndex, DefectKind defect = DefectKind.None, string? fileName = null)
    {
        string path = _files.Unit(Part, serialIndex, defect);
        string target = Path.Combine(Sweeps, fileName ?? UnitSynthesiser.Serial(serialIndex) + ".s2p");
        File.Move(path, target);
        return target;
    }

    public string Zip(string name)
    {
        string path = Path.Combine(Folder, name);
        ZipFile.CreateFromDirectory(Sweeps, path);
        return path;
    }

    /// <summary>The stored counted measurements' measured values of one rule, with their stored verdicts.</summary>
    public IReadOnlyList<(string Serial, UnitVerdict Verdict, double? Value)> Counted(string ruleId)
    {
        using CliStorage storage = Open();
        using var context = storage.Contexts.CreateDbContext();
        return context.Units.Join(context.RuleResults.Where(r => r.RuleId == ruleId), u => u.CountedMeasurementId, r => (long?)r.MeasurementId,
                (u, r) => new { u.Serial, u.CountedVerdict, r.MeasuredValue })
            .AsEnumerable().Select(x => (x.Serial, x.CountedVerdict, x.MeasuredValue)).ToArray();
    }

    public string[] Data(params string[] args) => [.. args, "--data", DataFolder];

    public void Dispose()
    {
        SqliteConnection.ClearAllPools();
        _files.Dispose();
    }
}
