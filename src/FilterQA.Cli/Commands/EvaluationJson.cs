using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using FilterQA.Core.Decisions;
using FilterQA.Core.Templates;

namespace FilterQA.Cli.Commands;

/// <summary>
/// One unit's evaluation as one line of JSON (JSON lines): camelCase names, numbers as JSON numbers, null where a value
/// was not measured; never NaN or infinity (a value that is not finite is written as null).
/// </summary>
internal static class EvaluationJson
{
    // Relaxed escaping keeps "±", "µs" and "–" readable; the lines are data for tools and people, never embedded in HTML.
    private static readonly JsonWriterOptions Options = new() { Indented = false, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping };

    public static string Line(string file, UnitEvaluation evaluation)
    {
        using var buffer = new MemoryStream();
        using (var json = new Utf8JsonWriter(buffer, Options))
        {
            json.WriteStartObject();
            json.WriteString("file", file);
            json.WriteString("verdict", Verdict(evaluation.Verdict));
            json.WriteString("partNumber", evaluation.PartNumber);
            json.WriteNumber("templateRevision", evaluation.TemplateRevision);
            json.WriteString("templateHash", evaluation.TemplateHash);
            json.WriteString("decisionRule", evaluation.DecisionRule == DecisionRule.GuardedAcceptance ? "guarded-acceptance" : "simple-acceptance");
            json.WriteStartArray("rules");
            foreach (RuleResult rule in evaluation.Rules)
            {
                json.WriteStartObject();
                json.WriteString("ruleId", rule.RuleId);
                json.WriteString("kind", Kebab(rule.Kind.ToString()));
                json.WriteString("title", rule.Title);
                json.WriteString("unit", Unit(rule.Unit));
                Number(json, "measured", rule.MeasuredValue);
                Number(json, "limit", rule.LimitValue);
                json.WriteString("sense", rule.Sense == LimitSense.AtMost ? "at-most" : "at-least");
                Number(json, "margin", rule.Margin);
                Number(json, "guardBand", rule.GuardBand);
                json.WriteString("outcome", Outcome(rule.Outcome));
                json.WriteBoolean("lowerBound", rule.IsLowerBound);
                Number(json, "atHz", rule.AtHz);
                json.WriteString("message", rule.Message);
                json.WriteEndObject();
            }
            json.WriteEndArray();
            json.WriteStartArray("warnings");
            foreach (string warning in evaluation.Warnings)
            {
                json.WriteStringValue(warning);
            }
            json.WriteEndArray();
            json.WriteEndObject();
        }
        return Encoding.UTF8.GetString(buffer.ToArray());
    }

    public static string Verdict(UnitVerdict verdict) => verdict switch
    {
        UnitVerdict.Go => "go",
        UnitVerdict.NoGo => "no-go",
        _ => "not-verifiable",
    };

    public static string Outcome(RuleOutcome outcome) => outcome switch
    {
        RuleOutcome.Pass => "pass",
        RuleOutcome.ConditionalPass => "conditional-pass",
        RuleOutcome.ConditionalFail => "conditional-fail",
        RuleOutcome.Fail => "fail",
        _ => "not-verifiable",
    };

    // A ratio has no symbol; the JSON names it so that the field is never empty.
    public static string Unit(RuleUnit unit) => unit == RuleUnit.Ratio ? "ratio" : unit.Symbol();

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

    /// <summary>"StopbandRejection" → "stopband-rejection", the spelling of the template files.</summary>
    private static string Kebab(string name)
    {
        var text = new StringBuilder(name.Length + 4);
        foreach (char ch in name)
        {
            if (char.IsUpper(ch) && text.Length > 0)
            {
                text.Append('-');
            }
            text.Append(char.ToLowerInvariant(ch));
        }
        return text.ToString();
    }
}
