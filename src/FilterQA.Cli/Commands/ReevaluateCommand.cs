using System.Globalization;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using FilterQA.Cli.Arguments;
using FilterQA.Cli.Storage;
using FilterQA.Core.Decisions;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Text;
using FilterQA.Data;
using FilterQA.Data.Services;

namespace FilterQA.Cli.Commands;

/// <summary><c>reevaluate</c>: the what-if of a draft template over a part's stored lots. Reads only; stores nothing.</summary>
internal sealed class ReevaluateCommand : ICommand
{
    private const string PartOption = "--part", TemplateOption = "--template", JsonFlag = "--json";

    private static readonly JsonWriterOptions JsonOptions = new() { Indented = false, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping };

    public string Summary => "reevaluate --part <part> --template <draft.yaml> [--json]   what a draft template would make of the stored lots";

    public string Usage => $"""
        usage: filterqa reevaluate --part <partNumber> --template <draft.yaml> [--json] [storage options]

        Judges every stored measurement of the part that matters for its lots (each unit's counted measurement, and
        its first one for the first-pass yield) again against the template file, which need not be stored or
        released, and prints per lot the recorded and the what-if yield, then every measurement whose verdict
        changes with the rules that decide it. Nothing is stored.

          --part <partNumber>     the part whose lots are judged again
          --template <file>       the template to try (YAML); it must be a template of that part
          --json                  one JSON object instead of text
        {CliStorage.Usage}
        Exit codes: 0 done; 1 a usage error; 2 the template cannot be read or is for another part, the part is
        not registered, a stored sweep cannot be read back, or the database cannot be opened.
        """;

    public int InternalErrorExitCode => ExitCodes.BadInput;

    public int Run(IReadOnlyList<string> args, TextWriter stdout, TextWriter stderr)
    {
        ParsedArguments parsed = ParsedArguments.Parse(args, [PartOption, TemplateOption, .. CliStorage.Options], [JsonFlag]);
        if (parsed.Positionals.Count > 0)
        {
            throw new UsageException($"unexpected argument '{parsed.Positionals[0]}'");
        }
        string part = parsed.Single(PartOption) ?? throw new UsageException("--part <partNumber> is required");
        string templatePath = parsed.Single(TemplateOption) ?? throw new UsageException("--template <file> is required");
        var storageOptions = CliStorage.OptionsFrom(parsed);

        TemplateReadResult read = LimitTemplateReader.ReadFile(templatePath);
        if (read.Template is not { } draft)
        {
            ValidateTemplateCommand.WriteProblems(templatePath, read.Problems, stderr);
            return ExitCodes.BadInput;
        }
        if (!string.Equals(draft.PartNumber, part, StringComparison.Ordinal))
        {
            stderr.WriteLine($"filterqa reevaluate: {templatePath} is a template of {draft.PartNumber}, not of {part}");
            return ExitCodes.BadInput;
        }
        using CliStorage? storage = CliStorage.Open(storageOptions, "reevaluate", stderr);
        if (storage is null)
        {
            return ExitCodes.BadInput;
        }
        WhatIfReport report;
        try
        {
            report = storage.WhatIf.ReevaluateAsync(part, draft).GetAwaiter().GetResult();
        }
        catch (Exception e) when (e is RecordNotFoundException or InvalidDataException or ArgumentException)
        {
            stderr.WriteLine($"filterqa reevaluate: {e.Message}");
            return ExitCodes.BadInput;
        }
        stdout.Write(parsed.Has(JsonFlag) ? Json(report) + Environment.NewLine : Text(report));
        return ExitCodes.Success;
    }

    private static string Text(WhatIfReport report)
    {
        var text = new StringBuilder();
        var c = CultureInfo.InvariantCulture;
        text.AppendLine(c, $"{report.PartNumber}: what-if of revision {report.DraftRevision} ({report.DraftHash}) over {report.Lots.Count} lots, {report.MeasurementsEvaluated} measurements");
        if (report.WhyOriginalFiles is { } why)
        {
            text.AppendLine(c, $"{report.FromOriginalFiles} measurements judged from their original files: {why}");
        }
        foreach (WhatIfLot lot in report.Lots)
        {
            text.AppendLine(c, $"{lot.LotNumber} (revision {lot.RecordedTemplateRevision}, {lot.UnitsTested} units): yield {Words.Percent(lot.RecordedYield)} -> {Words.Percent(lot.WhatIfYield)}; first pass {Words.Percent(lot.RecordedFirstPassYield)} -> {Words.Percent(lot.WhatIfFirstPassYield)}");
        }
        text.AppendLine(c, $"{report.Flips.Count} measurements change verdict");
        foreach (WhatIfFlip flip in report.Flips)
        {
            string role = (flip.IsCounted, flip.IsFirstPass) switch { (true, true) => "counted, first", (true, false) => "counted", _ => "first" };
            string rules = string.Join("; ", flip.DecidingRules.Select(r => $"{r.RuleId} ({EvaluationJson.Outcome(r.Outcome)}): {r.Message}"));
            text.AppendLine(c, $"  {flip.LotNumber}/{flip.Serial} measurement {flip.MeasurementId} attempt {flip.Attempt} ({role}): {Words.Verdict(flip.RecordedVerdict)} -> {Words.Verdict(flip.WhatIfVerdict)}: {rules}");
        }
        return text.ToString();
    }

    private static string Json(WhatIfReport report)
    {
        using var buffer = new MemoryStream();
        using (var json = new Utf8JsonWriter(buffer, JsonOptions))
        {
            json.WriteStartObject();
            json.WriteString("partNumber", report.PartNumber);
            json.WriteNumber("draftRevision", report.DraftRevision);
            json.WriteString("draftHash", report.DraftHash);
            json.WriteNumber("measurementsEvaluated", report.MeasurementsEvaluated);
            json.WriteNumber("fromOriginalFiles", report.FromOriginalFiles);
            json.WriteString("whyOriginalFiles", report.WhyOriginalFiles);
            json.WriteStartArray("lots");
            foreach (WhatIfLot lot in report.Lots)
            {
                json.WriteStartObject();
                json.WriteString("lotNumber", lot.LotNumber);
                json.WriteNumber("recordedTemplateRevision", lot.RecordedTemplateRevision);
                json.WriteNumber("unitsTested", lot.UnitsTested);
                json.WriteNumber("recordedGo", lot.RecordedGo);
                json.WriteNumber("whatIfGo", lot.WhatIfGo);
                LotCommand.Fraction(json, "recordedYield", lot.RecordedYield);
                LotCommand.Fraction(json, "whatIfYield", lot.WhatIfYield);
                LotCommand.Fraction(json, "recordedFirstPassYield", lot.RecordedFirstPassYield);
                LotCommand.Fraction(json, "whatIfFirstPassYield", lot.WhatIfFirstPassYield);
                json.WriteEndObject();
            }
            json.WriteEndArray();
            json.WriteStartArray("flips");
            foreach (WhatIfFlip flip in report.Flips)
            {
                json.WriteStartObject();
                json.WriteString("lotNumber", flip.LotNumber);
                json.WriteString("serial", flip.Serial);
                json.WriteNumber("measurementId", flip.MeasurementId);
                json.WriteNumber("attempt", flip.Attempt);
                json.WriteBoolean("counted", flip.IsCounted);
                json.WriteBoolean("firstPass", flip.IsFirstPass);
                json.WriteString("recordedVerdict", Words.Verdict(flip.RecordedVerdict));
                json.WriteString("whatIfVerdict", Words.Verdict(flip.WhatIfVerdict));
                json.WriteStartArray("decidingRules");
                foreach (RuleResult rule in flip.DecidingRules)
                {
                    json.WriteStartObject();
                    json.WriteString("ruleId", rule.RuleId);
                    json.WriteString("outcome", EvaluationJson.Outcome(rule.Outcome));
                    Number(json, "measured", rule.MeasuredValue);
                    Number(json, "limit", rule.LimitValue);
                    json.WriteString("message", rule.Message);
                    json.WriteEndObject();
                }
                json.WriteEndArray();
                json.WriteEndObject();
            }
            json.WriteEndArray();
            json.WriteEndObject();
        }
        return Encoding.UTF8.GetString(buffer.ToArray());
    }

    private static void Number(Utf8JsonWriter json, string name, double? value)
    {
        if (value is { } v && double.IsFinite(v))
        {
            json.WriteNumber(name, v);
        }
        else
        {
            json.WriteNull(name);
        }
    }
}
