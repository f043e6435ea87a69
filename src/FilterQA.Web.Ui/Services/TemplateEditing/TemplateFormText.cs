using System.Globalization;
using System.Text;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Text;
using YamlDotNet.RepresentationModel;

namespace FilterQA.Web.Ui.Services;

/// <summary>
/// The two directions between the form and the template text. Form to text writes the fields as typed, one per line,
/// and remembers which line is whose, so each problem the reader reports with its line lands on its field. Text to form
/// reads a template's canonical text (as <see cref="LimitTemplateWriter"/> writes it) field by field.
/// </summary>
public static class TemplateFormText
{
    /// <summary>The text of the form and, per 1-based line, where a problem at that line belongs.</summary>
    public static (string Text, IReadOnlyDictionary<int, List<string>> Owners) Compose(TemplateForm form)
    {
        ArgumentNullException.ThrowIfNull(form);
        var text = new StringBuilder();
        var owners = new Dictionary<int, List<string>>();
        int line = 0;
        void Line(string content, List<string> owner)
        {
            text.Append(content).Append('\n');
            owners[++line] = owner;
        }
        void Field(string indent, FormField field)
        {
            if (field.TextValue is { } value)
            {
                Line(indent + field.Spec.Key + ": " + Scalar(field, value), field.Problems);
            }
        }
        Line("format-version: 1", form.Problems);
        Line("part: " + Quote(form.PartNumber), form.Problems);
        Line("revision: " + form.Revision.ToString(CultureInfo.InvariantCulture), form.Problems);
        Field("", form.HeaderField("description"));
        Line("device: " + TemplateFieldSpecs.WordOf(form.Device), form.Problems);
        Field("", form.HeaderField("nominal"));
        Line("status: draft", form.Problems);
        Field("", form.HeaderField("author"));
        Field("", form.HeaderField("decision-rule"));
        Line("sweep:", form.Problems);
        foreach (FormField field in form.Sweep)
        {
            Field("  ", field);
        }
        Line("rules:", form.Problems);
        foreach (RuleForm rule in form.Rules)
        {
            // The kind opens the rule's lines: problems about the rule as a whole are reported where its fields begin.
            Line("  - kind: " + rule.KindWord, rule.Problems);
            Field("    ", rule.Id);
            Field("    ", rule.Title);
            foreach (FormField field in rule.Fields)
            {
                if (rule.Kind == RuleKind.LimitLine && field.Spec.Key == "uncertainty")
                {
                    Line("    points:", rule.Problems);
                    foreach (PointForm point in rule.Points)
                    {
                        Line("      - [" + (point.Frequency.TextValue ?? "''") + ", " + (point.Loss.TextValue ?? "''") + "]", point.Problems);
                    }
                }
                Field("    ", field);
            }
        }
        return (text.ToString(), owners);
    }

    /// <summary>A form holding the fields of a template (its canonical text read field by field).</summary>
    public static TemplateForm FromTemplate(LimitTemplate template)
    {
        ArgumentNullException.ThrowIfNull(template);
        var form = new TemplateForm(template.PartNumber, template.Revision, template.Device);
        var stream = new YamlStream();
        stream.Load(new StringReader(LimitTemplateWriter.Write(template)));
        var root = (YamlMappingNode)stream.Documents[0].RootNode;
        Fill(form.Header, root);
        Fill(form.Sweep, (YamlMappingNode)root.Children[new YamlScalarNode("sweep")]);
        foreach (YamlMappingNode node in ((YamlSequenceNode)root.Children[new YamlScalarNode("rules")]).Children.Cast<YamlMappingNode>())
        {
            string kindWord = Scalar(node, "kind") ?? "";
            RuleKind kind = Enum.GetValues<RuleKind>().First(k => TemplateFieldSpecs.WordOf(k) == kindWord);
            var rule = new RuleForm(kind);
            rule.Id.Value = Scalar(node, "id") ?? "";
            rule.Title.Value = Scalar(node, "title") ?? "";
            Fill(rule.Fields, node);
            if (node.Children.TryGetValue(new YamlScalarNode("points"), out YamlNode? points))
            {
                foreach (YamlSequenceNode pair in ((YamlSequenceNode)points).Children.Cast<YamlSequenceNode>())
                {
                    var point = new PointForm();
                    point.Frequency.SetFromText(((YamlScalarNode)pair.Children[0]).Value ?? "");
                    point.Loss.SetFromText(((YamlScalarNode)pair.Children[1]).Value ?? "");
                    rule.Points.Add(point);
                }
            }
            form.Rules.Add(rule);
        }
        return form;
    }

    private static void Fill(IEnumerable<FormField> fields, YamlMappingNode node)
    {
        foreach (FormField field in fields)
        {
            field.SetFromText(Scalar(node, field.Spec.Key) ?? "");
        }
    }

    private static string? Scalar(YamlMappingNode node, string key) =>
        node.Children.TryGetValue(new YamlScalarNode(key), out YamlNode? value) && value is YamlScalarNode scalar ? scalar.Value : null;

    private static string Scalar(FormField field, string value) => field.Spec.Type == FieldType.Text ? Quote(value) : value;

    // Single quotes keep any text (colons, '#', leading dashes) a plain string; a quote inside is doubled.
    private static string Quote(string text) => "'" + text.Replace("'", "''", StringComparison.Ordinal) + "'";
}
