using System.Text;
using FilterQA.Core.Decisions;
using FilterQA.Core.Formats.Delimited;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Text;
using FilterQA.Data.Services;

namespace FilterQA.Data.Tests.Infrastructure;

/// <summary>Inputs for the storage tests, from the demo scenario (invented names).</summary>
public static class Samples
{
    public static readonly Actor Operator = new("u-rhaldane", "R. Haldane");
    public static readonly Actor SecondOperator = new("u-mokafor", "M. Okafor");
    public static readonly Actor Engineer = new("u-jlindqvist", "J. Lindqvist");
    public static readonly Actor Approver = new("u-spetrova", "S. Petrova", isApprover: true);

    public const string Supplier = "Veltrane Piezo";

    private static readonly Lazy<LimitTemplate> Shipped = new(() =>
    {
        TemplateReadResult read = LimitTemplateReader.ReadFile(Path.Combine(RepositoryRoot(), "limit-templates", "TME-CF455-15.yaml"));
        return read.Template ?? throw new InvalidOperationException("the shipped TME-CF455-15 template does not read: " + string.Join("; ", read.Problems));
    });

    /// <summary>A part number of its own for one test, so tests sharing a PostgreSQL database do not meet.</summary>
    public static string UniquePart() => "TME-CF455-" + Guid.NewGuid().ToString("N")[..10].ToUpperInvariant();

    public static string UniqueLot() => "VP-2611-" + Guid.NewGuid().ToString("N")[..10].ToUpperInvariant();

    public static string UniqueStation() => "IQC-" + Guid.NewGuid().ToString("N")[..8].ToUpperInvariant();

    /// <summary>The shipped 455 kHz filter template under another part number, released.</summary>
    public static LimitTemplate Released(string partNumber, int revision = 1)
    {
        LimitTemplate t = Shipped.Value;
        return LimitTemplate.Create(partNumber, revision, t.Description, t.Device, t.NominalHz, TemplateStatus.Released, t.Author,
            t.ReleaseDate, t.Sweep, t.DecisionRule, t.Rules);
    }

    public static LimitTemplate Draft(string partNumber, int revision, string description = "455 kHz ceramic IF filter, draft")
    {
        LimitTemplate t = Shipped.Value;
        return LimitTemplate.Create(partNumber, revision, description, t.Device, t.NominalHz, TemplateStatus.Draft, t.Author,
            null, t.Sweep, t.DecisionRule, t.Rules);
    }

    /// <summary>
    /// A 401-point gain sweep from 255 kHz to 655 kHz written as delimited text and read back, so
    /// the sweep's source hash is that of the bytes. <paramref name="seed"/> shifts the level.
    /// </summary>
    public static SampleSweep Sweep(int seed, string fileName = "unit.csv")
    {
        FrequencyGrid grid = FrequencyGrid.Linear(255e3, 655e3, 401);
        var gainDb = new double[grid.Count];
        for (int i = 0; i < gainDb.Length; i++)
        {
            double offsetKHz = (grid[i] - 455e3) / 1e3;
            // A smooth bandpass-like shape; the numbers only need to be distinct and repeatable.
            gainDb[i] = -(5.5 + 0.01 * seed + 60 * (1 - Math.Exp(-(offsetKHz * offsetKHz) / 400)));
        }
        Sweep source = Core.Sweeps.Sweep.FromScalar(ScalarTrace.Create(grid, ScalarQuantity.GainDb, gainDb), SweepSource.Of(fileName, SweepFormat.DelimitedText));
        using var text = new StringWriter();
        DelimitedTextWriter.Write(source, text);
        byte[] bytes = Encoding.UTF8.GetBytes(text.ToString());
        Sweep read = DelimitedTextReader.Read(bytes, fileName);
        return new SampleSweep(bytes, read, ResponseTrace.Primary(read));
    }

    /// <summary>
    /// An evaluation of <paramref name="template"/>: each rule measures 10 + rule index + seed/100
    /// against an upper limit of 100 and passes, except the rules named in <paramref name="failing"/>,
    /// which measure 150 and fail.
    /// </summary>
    public static UnitEvaluation Evaluation(LimitTemplate template, UnitVerdict verdict, int seed = 0, params string[] failing)
    {
        ArgumentNullException.ThrowIfNull(template);
        var rules = template.Rules.Select((rule, index) =>
        {
            bool fails = failing.Contains(rule.Id);
            double measured = fails ? 150 : 10 + index + seed / 100.0;
            return new RuleResult(rule.Id, rule.Kind, rule.Title, rule.Unit, measured, 100, LimitSense.AtMost, 100 - measured, 0,
                fails ? RuleOutcome.Fail : RuleOutcome.Pass, false, 455e3, fails ? "above the limit" : "within the limit");
        }).ToArray();
        return new UnitEvaluation(verdict, rules, verdict == UnitVerdict.NotVerifiable ? ["sweep does not cover the stopband"] : [],
            template.PartNumber, template.Revision, template.ContentHash, template.DecisionRule, []);
    }

    /// <summary>A measurement of serial <paramref name="serial"/> in <paramref name="lotNumber"/> with the given verdict.</summary>
    public static UnitMeasurement Measurement(string lotNumber, string serial, LimitTemplate template, UnitVerdict verdict, string station,
        DateTimeOffset measuredAt, int seed = 0, params string[] failing)
    {
        SampleSweep sweep = Sweep(seed, serial + ".csv");
        return new UnitMeasurement(lotNumber, serial, station, Operator, measuredAt, sweep.Bytes, sweep.Sweep, sweep.Response,
            Evaluation(template, verdict, seed, failing));
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
}
