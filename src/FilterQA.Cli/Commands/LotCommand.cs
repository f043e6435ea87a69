using System.Globalization;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using FilterQA.Cli.Arguments;
using FilterQA.Cli.Storage;
using FilterQA.Core.Sampling;
using FilterQA.Core.Statistics;
using FilterQA.Data;
using FilterQA.Data.Services;

namespace FilterQA.Cli.Commands;

/// <summary><c>lot</c>: a lot's summary (plan, counts, yield, the rules that fail most, the plan's decision), and the small set of lot changes a bench needs.</summary>
internal sealed class LotCommand : ICommand
{
    private const string JsonFlag = "--json", DecideFlag = "--decide", HoldOption = "--hold", ReleaseHoldFlag = "--release-hold",
        OverrideOption = "--override", ReasonOption = "--reason", ByOption = "--by", ApproverFlag = "--approver";

    private const int ParetoRows = 5;

    private static readonly JsonWriterOptions JsonOptions = new() { Indented = false, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping };

    public string Summary => "lot <lotNumber> [--json] [--decide | --hold <reason> | --release-hold | --override ...] --by <name>   show or decide a lot";

    public string Usage => $"""
        usage: filterqa lot <lotNumber> [--json] [storage options]
               filterqa lot <lotNumber> --decide --by <name>
               filterqa lot <lotNumber> --hold <reason> --by <name>
               filterqa lot <lotNumber> --release-hold --by <name>
               filterqa lot <lotNumber> --override accept|reject --reason <text> --by <name> --approver

        Shows the lot: its sampling plan (n, Ac, Re), status, counts under the part's retest policy, first-pass and
        final yield, the rules that keep most counted units from go (top {ParetoRows}) and what the plan decides for the
        units tested so far. With one change option the change is made first (audited under --by), then the lot shown.

          --decide                accepts or rejects the lot as its plan decides (the sample must be complete,
                                  or the defectives already reach the rejection number)
          --hold <reason>         holds the lot: no unit is stored until the hold is released
          --release-hold          releases a hold
          --override accept|reject  accepts or rejects against the plan; needs --reason and --approver
          --by <name>             who makes the change (required with a change)
          --approver              the person named by --by may approve overrides
          --json                  the summary as one JSON object
        {CliStorage.Usage}
        Exit codes: 0 shown (and changed); 1 a usage error, or the change is refused (the message says why);
        2 the lot does not exist or the database cannot be opened.
        """;

    public int InternalErrorExitCode => ExitCodes.BadInput;

    public int Run(IReadOnlyList<string> args, TextWriter stdout, TextWriter stderr)
    {
        ParsedArguments parsed = ParsedArguments.Parse(args, [HoldOption, OverrideOption, ReasonOption, ByOption, .. CliStorage.Options],
            [JsonFlag, DecideFlag, ReleaseHoldFlag, ApproverFlag]);
        if (parsed.Positionals.Count != 1)
        {
            throw new UsageException("give one lot number");
        }
        string lotNumber = parsed.Positionals[0];
        Func<LotService, Actor, Task<LotSummary>>? change = Change(parsed);
        Actor? actor = null;
        if (change is not null)
        {
            string by = parsed.Single(ByOption) is { } name && !string.IsNullOrWhiteSpace(name) ? name : throw new UsageException("--by <name> is required with a change");
            actor = new Actor("cli:" + by, by, parsed.Has(ApproverFlag));
        }
        var storageOptions = CliStorage.OptionsFrom(parsed);
        using CliStorage? storage = CliStorage.Open(storageOptions, "lot", stderr);
        if (storage is null)
        {
            return ExitCodes.BadInput;
        }
        try
        {
            if (change is not null)
            {
                LotSummary changed = change(storage.Lots, actor!).GetAwaiter().GetResult();
                stderr.WriteLine($"lot {changed.LotNumber}: {Words.Status(changed.Status)}{(changed.DispositionReason is { } why ? " (" + why + ")" : "")}");
            }
            LotSummary summary = storage.Lots.GetSummaryAsync(lotNumber).GetAwaiter().GetResult();
            LotStatistics statistics = storage.Lots.GetStatisticsAsync(lotNumber).GetAwaiter().GetResult();
            stdout.Write(parsed.Has(JsonFlag) ? Json(summary, statistics) + Environment.NewLine : Text(summary, statistics));
            return ExitCodes.Success;
        }
        catch (RecordNotFoundException e)
        {
            stderr.WriteLine($"filterqa lot: {e.Message}");
            return ExitCodes.BadInput;
        }
        catch (StorageRuleException e)
        {
            stderr.WriteLine($"filterqa lot: {e.Message}");
            return ExitCodes.Rejected;
        }
    }

    private static Func<LotService, Actor, Task<LotSummary>>? Change(ParsedArguments parsed)
    {
        var changes = new List<Func<LotService, Actor, Task<LotSummary>>>();
        string? reason = parsed.Single(ReasonOption);
        if (parsed.Has(DecideFlag))
        {
            changes.Add((lots, actor) => lots.DecideAsync(parsed.Positionals[0], actor));
        }
        if (parsed.Single(HoldOption) is { } hold)
        {
            changes.Add(string.IsNullOrWhiteSpace(hold) ? throw new UsageException("--hold needs a reason") : (lots, actor) => lots.HoldAsync(parsed.Positionals[0], hold, actor));
        }
        if (parsed.Has(ReleaseHoldFlag))
        {
            changes.Add((lots, actor) => lots.ReleaseHoldAsync(parsed.Positionals[0], actor));
        }
        if (parsed.Single(OverrideOption) is { } verdict)
        {
            bool accept = verdict switch
            {
                "accept" => true,
                "reject" => false,
                _ => throw new UsageException($"--override: '{verdict}' is neither accept nor reject"),
            };
            string why = reason is { } r && !string.IsNullOrWhiteSpace(r) ? r : throw new UsageException("--override needs --reason <text>");
            changes.Add((lots, actor) => lots.OverrideAsync(parsed.Positionals[0], accept, why, actor));
        }
        else if (reason is not null)
        {
            throw new UsageException("--reason goes with --override (a hold takes its reason as --hold <reason>)");
        }
        return changes.Count switch
        {
            0 => null,
            1 => changes[0],
            _ => throw new UsageException("give one change at a time (--decide, --hold, --release-hold or --override)"),
        };
    }

    private static string PlanText(SamplingPlan plan) => string.Create(CultureInfo.InvariantCulture,
        $"{plan.StandardName}: lot {plan.LotSize}, sample n {plan.SampleSize}, Ac {plan.AcceptanceNumber}, Re {plan.RejectionNumber}");

    private static string Text(LotSummary s, LotStatistics statistics)
    {
        var text = new StringBuilder();
        var c = CultureInfo.InvariantCulture;
        text.AppendLine(c, $"lot {s.LotNumber}: {s.PartNumber} revision {s.TemplateRevision}, supplier {s.Supplier}, {Words.Status(s.Status)}");
        text.AppendLine(c, $"plan: {PlanText(s.Plan)} ({s.SeverityReason})");
        text.AppendLine(c, $"tested {s.UnitsTested} of {s.Plan.SampleSize}: go {s.Go}, no-go {s.NoGo}, not verifiable {s.NotVerifiable}; defectives {s.Defectives}; retested {s.UnitsRetested}; measurements {s.Measurements}");
        text.AppendLine(c, $"yield: first pass {Words.Percent(statistics.Yield.FirstPassYield)}, final {Words.Percent(statistics.Yield.FinalYield)}");
        if (statistics.FailingRules.Entries.Count > 0)
        {
            text.AppendLine("failing rules:");
            foreach (ParetoEntry entry in statistics.FailingRules.Entries.Take(ParetoRows))
            {
                text.AppendLine(c, $"  {entry.Rule}: {entry.Count} ({Words.Percent(entry.Share)}, cumulative {Words.Percent(entry.CumulativeShare)})");
            }
        }
        text.AppendLine(c, $"decision by the plan: {Words.Decision(s.Decision)}");
        if (s.DispositionAt is { } at)
        {
            text.AppendLine(c, $"disposition: {Words.Status(s.Status)} by {s.DispositionBy} at {at:u}{(s.DispositionIsOverride ? " (override)" : "")}: {s.DispositionReason}");
        }
        return text.ToString();
    }

    private static string Json(LotSummary s, LotStatistics statistics)
    {
        using var buffer = new MemoryStream();
        using (var json = new Utf8JsonWriter(buffer, JsonOptions))
        {
            json.WriteStartObject();
            json.WriteString("lotNumber", s.LotNumber);
            json.WriteString("partNumber", s.PartNumber);
            json.WriteNumber("templateRevision", s.TemplateRevision);
            json.WriteString("supplier", s.Supplier);
            json.WriteString("status", Words.Status(s.Status));
            json.WriteStartObject("plan");
            json.WriteString("standard", s.Plan.StandardName);
            json.WriteNumber("lotSize", s.Plan.LotSize);
            json.WriteNumber("sampleSize", s.Plan.SampleSize);
            json.WriteNumber("acceptanceNumber", s.Plan.AcceptanceNumber);
            json.WriteNumber("rejectionNumber", s.Plan.RejectionNumber);
            json.WriteString("severityReason", s.SeverityReason);
            json.WriteEndObject();
            json.WriteNumber("unitsTested", s.UnitsTested);
            json.WriteNumber("go", s.Go);
            json.WriteNumber("noGo", s.NoGo);
            json.WriteNumber("notVerifiable", s.NotVerifiable);
            json.WriteNumber("defectives", s.Defectives);
            json.WriteNumber("unitsRetested", s.UnitsRetested);
            json.WriteNumber("measurements", s.Measurements);
            Fraction(json, "firstPassYield", statistics.Yield.FirstPassYield);
            Fraction(json, "finalYield", statistics.Yield.FinalYield);
            json.WriteStartArray("failingRules");
            foreach (ParetoEntry entry in statistics.FailingRules.Entries.Take(ParetoRows))
            {
                json.WriteStartObject();
                json.WriteString("ruleId", entry.Rule);
                json.WriteNumber("count", entry.Count);
                json.WriteNumber("share", entry.Share);
                json.WriteEndObject();
            }
            json.WriteEndArray();
            json.WriteString("decision", Words.Decision(s.Decision));
            if (s.DispositionAt is { } at)
            {
                json.WriteString("dispositionAt", at);
                json.WriteString("dispositionBy", s.DispositionBy);
                json.WriteString("dispositionReason", s.DispositionReason);
                json.WriteBoolean("dispositionIsOverride", s.DispositionIsOverride);
            }
            json.WriteEndObject();
        }
        return Encoding.UTF8.GetString(buffer.ToArray());
    }

    /// <summary>A 0..1 fraction as a JSON number, or null when there is none (NaN).</summary>
    internal static void Fraction(Utf8JsonWriter json, string name, double value)
    {
        if (double.IsFinite(value))
        {
            json.WriteNumber(name, value);
        }
        else
        {
            json.WriteNull(name);
        }
    }
}
