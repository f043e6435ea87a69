using System.Text.Json;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Text;

namespace FilterQA.Core.Tests.Templates;

/// <summary>
/// The published JSON Schema (draft 2020-12) stays in step with what the reader knows: the same fields, rule
/// kinds, words and unit symbols. (The schema describes the format; the reader remains the judge.)
/// </summary>
public sealed class SchemaTests
{
    private static JsonElement Schema()
    {
        using JsonDocument document = JsonDocument.Parse(File.ReadAllText(Path.Combine(TemplateSamples.Folder, "schema", "limit-template.schema.json")));
        return document.RootElement.Clone();
    }

    private static string[] Keys(JsonElement objectSchema) =>
        objectSchema.GetProperty("properties").EnumerateObject().Select(p => p.Name).Order(StringComparer.Ordinal).ToArray();

    private static string[] Sorted(IEnumerable<string> words) => words.Order(StringComparer.Ordinal).ToArray();

    private static string[] EnumOf(JsonElement element) =>
        Sorted(element.GetProperty("enum").EnumerateArray().Select(e => e.GetString()!));

    [Fact]
    public void Schema_is_JSON_of_draft_2020_12()
    {
        JsonElement schema = Schema();

        Assert.Equal("https://json-schema.org/draft/2020-12/schema", schema.GetProperty("$schema").GetString());
        Assert.Equal("object", schema.GetProperty("type").GetString());
    }

    [Fact]
    public void Schema_names_every_rule_kind_the_reader_knows_and_no_other()
    {
        JsonElement defs = Schema().GetProperty("$defs");
        string[] kinds = defs.EnumerateObject().Where(d => d.Name.StartsWith("rule-", StringComparison.Ordinal))
            .Select(d => d.Value.GetProperty("properties").GetProperty("kind").GetProperty("const").GetString()!).ToArray();
        string[] referenced = Schema().GetProperty("properties").GetProperty("rules").GetProperty("items").GetProperty("oneOf")
            .EnumerateArray().Select(r => r.GetProperty("$ref").GetString()!["#/$defs/rule-".Length..]).ToArray();

        Assert.Equal(Sorted(Words.All<RuleKind>()), Sorted(kinds));
        Assert.Equal(Sorted(Words.All<RuleKind>()), Sorted(referenced));
    }

    [Fact]
    public void Schema_gives_each_rule_kind_exactly_the_fields_the_reader_accepts()
    {
        JsonElement defs = Schema().GetProperty("$defs");
        foreach (RuleKind kind in Enum.GetValues<RuleKind>())
        {
            JsonElement rule = defs.GetProperty("rule-" + Words.Of(kind));

            Assert.Equal(Sorted(RuleKeys.AllFor(kind)), Keys(rule));
            Assert.False(rule.GetProperty("additionalProperties").GetBoolean());
        }
    }

    [Fact]
    public void Schema_top_level_and_sweep_fields_match_the_reader()
    {
        JsonElement schema = Schema();

        Assert.Equal(Sorted(RuleKeys.TopLevel), Keys(schema));
        Assert.Equal(Sorted(RuleKeys.Sweep), Keys(schema.GetProperty("properties").GetProperty("sweep")));
    }

    [Fact]
    public void Schema_words_match_the_reader()
    {
        JsonElement schema = Schema();
        JsonElement properties = schema.GetProperty("properties");
        JsonElement defs = schema.GetProperty("$defs");

        Assert.Equal(Sorted(Words.All<DeviceKind>()), EnumOf(properties.GetProperty("device")));
        Assert.Equal(Sorted(Words.All<TemplateStatus>()), EnumOf(properties.GetProperty("status")));
        Assert.Equal(Sorted(Words.All<DecisionRule>()), EnumOf(properties.GetProperty("decision-rule")));
        Assert.Equal(Sorted(Words.All<FrequencyAnchor>()), EnumOf(defs.GetProperty("anchor")));
        Assert.Equal(Sorted(Words.All<LossReference>()), EnumOf(defs.GetProperty("reference")));
        Assert.Equal(Sorted(Words.All<CentreMethod>()), EnumOf(defs.GetProperty("rule-centre-frequency").GetProperty("properties").GetProperty("method")));
        Assert.Equal(Sorted(Words.All<InsertionLossMeasure>()), EnumOf(defs.GetProperty("rule-insertion-loss").GetProperty("properties").GetProperty("measure")));
        Assert.Equal(Sorted(Words.All<LimitBoundary>()), EnumOf(defs.GetProperty("rule-limit-line").GetProperty("properties").GetProperty("boundary")));
    }

    [Theory]
    [InlineData("frequency", nameof(QuantityKind.Frequency))]
    [InlineData("level", nameof(QuantityKind.Level))]
    [InlineData("time", nameof(QuantityKind.Time))]
    [InlineData("duration", nameof(QuantityKind.Duration))]
    [InlineData("resistance", nameof(QuantityKind.Resistance))]
    [InlineData("capacitance", nameof(QuantityKind.Capacitance))]
    public void Schema_quantity_pattern_lists_every_unit_the_reader_writes(string definition, string kindName)
    {
        string pattern = Schema().GetProperty("$defs").GetProperty(definition).GetProperty("pattern").GetString()!;
        string unitGroup = pattern[(pattern.LastIndexOf("\\s*(", StringComparison.Ordinal) + 4)..pattern.LastIndexOf(')')];

        string[] symbols = unitGroup.Split('|');

        foreach (string symbol in Quantities.SymbolsOf(Enum.Parse<QuantityKind>(kindName)))
        {
            Assert.Contains(symbol, symbols);
        }
    }
}
