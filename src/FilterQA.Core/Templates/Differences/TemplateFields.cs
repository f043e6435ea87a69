using System.Text;
using FilterQA.Core.Templates.Rules;
using FilterQA.Core.Templates.Text;
using YamlDotNet.RepresentationModel;

namespace FilterQA.Core.Templates.Differences;

/// <summary>
/// The fields of a template as its canonical text writes them, flattened to (key, value) pairs in text order. Reading
/// them back from the canonical text (rather than from the model) keeps the difference in the words and units a
/// quality engineer reads in the file, and keeps it right for every rule kind the writer knows.
/// </summary>
internal static class TemplateFields
{
    internal const string GuardBand = "guard band";

    // Identity, not content: every pair of revisions differs in these, so a difference would only be noise.
    private static readonly HashSet<string> Skipped = new(StringComparer.Ordinal) { "format-version", "revision", "rules" };

    internal static (List<KeyValuePair<string, string>> Header, List<RuleFields> Rules) Of(LimitTemplate template)
    {
        var stream = new YamlStream();
        using (var reader = new StringReader(template.CanonicalText))
        {
            stream.Load(reader);
        }
        var root = (YamlMappingNode)stream.Documents[0].RootNode;
        var header = new List<KeyValuePair<string, string>>();
        var rules = new List<RuleFields>();
        foreach ((YamlNode keyNode, YamlNode value) in root.Children)
        {
            string key = ((YamlScalarNode)keyNode).Value ?? "";
            if (key == "rules")
            {
                foreach (YamlMappingNode rule in ((YamlSequenceNode)value).Children.Cast<YamlMappingNode>())
                {
                    rules.Add(Rule(template, rule));
                }
            }
            else if (Skipped.Contains(key))
            {
                continue;
            }
            else if (value is YamlMappingNode nested)
            {
                foreach ((YamlNode subKey, YamlNode subValue) in nested.Children)
                {
                    header.Add(new($"{key}.{((YamlScalarNode)subKey).Value}", Text(subValue)));
                }
            }
            else
            {
                header.Add(new(key, Text(value)));
            }
        }
        return (header, rules);
    }

    private static RuleFields Rule(LimitTemplate template, YamlMappingNode node)
    {
        var fields = new List<KeyValuePair<string, string>>();
        foreach ((YamlNode key, YamlNode value) in node.Children)
        {
            fields.Add(new(((YamlScalarNode)key).Value ?? "", Text(value)));
        }
        string id = Find(fields, "id");
        LimitRule rule = template.FindRule(id)
            ?? throw new InvalidOperationException($"the canonical text of {template.PartNumber} names rule '{id}', which the template does not hold");
        // The guard band is not written per rule: it follows from the decision rule (ILAC-G8:09/2019: w = U under
        // guarded acceptance, 0 under simple acceptance), so a change of decision rule shows on every rule it moves.
        fields.Add(new(GuardBand, template.DecisionRule == DecisionRule.GuardedAcceptance
            ? Find(fields, "uncertainty")
            : "none (simple acceptance)"));
        return new RuleFields(id, rule.Title, Find(fields, "kind"), fields);
    }

    private static string Find(List<KeyValuePair<string, string>> fields, string key) =>
        fields.First(pair => pair.Key == key).Value;

    /// <summary>A scalar as written; a sequence (the points of a limit line) as "[a, b], [c, d]".</summary>
    private static string Text(YamlNode node)
    {
        switch (node)
        {
            case YamlScalarNode scalar:
                return scalar.Value ?? "";
            case YamlSequenceNode sequence:
                var text = new StringBuilder();
                foreach (YamlNode item in sequence.Children)
                {
                    if (text.Length > 0)
                    {
                        text.Append(", ");
                    }
                    text.Append(item is YamlSequenceNode ? "[" + Text(item) + "]" : Text(item));
                }
                return text.ToString();
            default:
                return node.ToString();
        }
    }

    internal sealed record RuleFields(string Id, string Title, string Kind, List<KeyValuePair<string, string>> Fields);
}
