using FilterQA.Core.Templates;

namespace FilterQA.Web.Ui.Services;

/// <summary>One rule in the editor's form: its kind (fixed; remove the rule and add another to change it), id, title and fields.</summary>
public sealed class RuleForm
{
    /// <summary>A rule of <paramref name="kind"/> with empty fields.</summary>
    public RuleForm(RuleKind kind)
    {
        Kind = kind;
        Fields = TemplateFieldSpecs.For(kind).Select(spec => new FormField(spec)).ToList();
    }

    /// <summary>The rule kind.</summary>
    public RuleKind Kind { get; }

    /// <summary>The rule kind as the text writes it.</summary>
    public string KindWord => TemplateFieldSpecs.WordOf(Kind);

    /// <summary>The rule's id (letters, digits, '-', '_'; unique in the template).</summary>
    public FormField Id { get; } = new(new FieldSpec("id", "Rule id", FieldType.Text, [], []));

    /// <summary>The rule's title in plain words.</summary>
    public FormField Title { get; } = new(new FieldSpec("title", "Title", FieldType.Text, [], []));

    /// <summary>The kind's fields, in the order of the text.</summary>
    public IReadOnlyList<FormField> Fields { get; }

    /// <summary>A limit line's points; empty for every other kind.</summary>
    public List<PointForm> Points { get; } = [];

    /// <summary>The reader's problems about the rule as a whole (at its first line).</summary>
    public List<string> Problems { get; } = [];

    /// <summary>The field with the key; null when the kind has none.</summary>
    public FormField? Field(string key) => Fields.FirstOrDefault(f => f.Spec.Key == key);
}
