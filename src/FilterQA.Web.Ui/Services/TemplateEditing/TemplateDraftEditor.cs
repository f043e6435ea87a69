using System.Globalization;
using System.Text.RegularExpressions;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Text;

namespace FilterQA.Web.Ui.Services;

/// <summary>
/// The editor's state for one draft: the form and the text kept in step, and the last good template (the last state
/// that read without a problem), which alone is previewed and saved. Editing the form rewrites the text; editing the
/// text re-reads it and refreshes the form; a text with problems keeps the form and the last good template as they were.
/// </summary>
public sealed partial class TemplateDraftEditor
{
    private string _savedHash;

    /// <summary>Opens a stored draft text.</summary>
    /// <exception cref="ArgumentException">The stored text does not read as a draft of this part and revision.</exception>
    public TemplateDraftEditor(string partNumber, int revision, string storedText)
    {
        ArgumentNullException.ThrowIfNull(storedText);
        PartNumber = partNumber;
        Revision = revision;
        TemplateReadResult read = LimitTemplateReader.Read(storedText);
        LimitTemplate template = read.Template
            ?? throw new ArgumentException("the stored draft does not read: " + string.Join("; ", read.Problems), nameof(storedText));
        if (Mismatch(template) is { } problem)
        {
            throw new ArgumentException(problem, nameof(storedText));
        }
        LastGood = template;
        Device = template.Device;
        Form = TemplateFormText.FromTemplate(template);
        Text = storedText;
        _savedHash = template.ContentHash;
    }

    /// <summary>The part (fixed).</summary>
    public string PartNumber { get; }

    /// <summary>The draft's revision (fixed).</summary>
    public int Revision { get; }

    /// <summary>The part's device kind (fixed).</summary>
    public DeviceKind Device { get; }

    /// <summary>The form.</summary>
    public TemplateForm Form { get; private set; }

    /// <summary>The text view's content.</summary>
    public string Text { get; private set; }

    /// <summary>The problems of the current text, each with its line; empty when it reads.</summary>
    public IReadOnlyList<TemplateProblem> TextProblems { get; private set; } = [];

    /// <summary>The last state that read without a problem: what the preview judges with and what a save stores.</summary>
    public LimitTemplate LastGood { get; private set; }

    /// <summary>True when the form and text are both free of problems (so a save stores exactly what is shown).</summary>
    public bool IsValid => TextProblems.Count == 0 && !Form.HasProblems;

    /// <summary>True when what is shown differs from the stored draft (a change not saved, or a change with problems).</summary>
    public bool IsDirty => !IsValid || LastGood.ContentHash != _savedHash;

    /// <summary>Call after any change in the form: checks each field, rewrites the text, and keeps the template when it reads.</summary>
    public void FormChanged()
    {
        foreach (FormField field in Form.AllFields())
        {
            field.Check();
        }
        Form.Problems.Clear();
        foreach (RuleForm rule in Form.Rules)
        {
            rule.Problems.Clear();
            rule.Points.ForEach(p => p.Problems.Clear());
        }
        (string composed, IReadOnlyDictionary<int, List<string>> owners) = TemplateFormText.Compose(Form);
        IReadOnlyList<TemplateProblem> problems = Judge(composed, out LimitTemplate? template);
        if (template is not null && !Form.HasProblems)
        {
            LastGood = template;
            Text = LimitTemplateWriter.Write(template);
            TextProblems = [];
            return;
        }
        // The text shows what the form holds, so its line numbers match the problems listed beside the fields.
        Text = composed;
        TextProblems = problems;
        foreach (TemplateProblem problem in problems)
        {
            List<string> owner = owners.TryGetValue(problem.Line, out List<string>? o) ? o : Form.Problems;
            string message = Sentence(problem.Message);
            if (!owner.Contains(message))
            {
                owner.Add(message);
            }
        }
    }

    /// <summary>Call after an edit of the text: re-reads it; when it reads the form is rebuilt from it, else only the problems change.</summary>
    public void TextChanged(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        Text = text;
        TextProblems = Judge(text, out LimitTemplate? template);
        if (template is not null)
        {
            LastGood = template;
            Form = TemplateFormText.FromTemplate(template);
        }
    }

    /// <summary>Adds an empty rule of <paramref name="kind"/> with a fresh id (and two points for a limit line).</summary>
    public RuleForm AddRule(RuleKind kind)
    {
        var rule = new RuleForm(kind);
        string stem = TemplateFieldSpecs.WordOf(kind);
        int n = 1;
        while (Form.Rules.Any(r => r.Id.Value == Id(stem, n)))
        {
            n++;
        }
        rule.Id.Value = Id(stem, n);
        foreach (FormField field in rule.Fields.Where(f => f.Spec.Type == FieldType.Word && !f.Spec.Optional))
        {
            field.Value = field.Spec.Choices[0];
        }
        if (kind == RuleKind.LimitLine)
        {
            rule.Points.Add(new PointForm());
            rule.Points.Add(new PointForm());
        }
        Form.Rules.Add(rule);
        FormChanged();
        return rule;
    }

    /// <summary>Removes a rule from the form.</summary>
    public void RemoveRule(RuleForm rule)
    {
        Form.Rules.Remove(rule);
        FormChanged();
    }

    /// <summary>Tells the editor the last good template was stored (it is no longer a change).</summary>
    public void Saved(string contentHash) => _savedHash = contentHash;

    /// <summary>Reads a text and adds what the reader cannot know: it must stay a draft of this part, revision and device.</summary>
    private IReadOnlyList<TemplateProblem> Judge(string text, out LimitTemplate? template)
    {
        TemplateReadResult read = LimitTemplateReader.Read(text);
        template = read.Template;
        if (template is null)
        {
            return read.Problems;
        }
        if (Mismatch(template) is { } problem)
        {
            template = null;
            return [new TemplateProblem(LineOf(text, problem.StartsWith("the status", StringComparison.Ordinal) ? "status"
                : problem.StartsWith("the device", StringComparison.Ordinal) ? "device"
                : problem.StartsWith("the revision", StringComparison.Ordinal) ? "revision" : "part"), 1, problem)];
        }
        return [];
    }

    private string? Mismatch(LimitTemplate template) =>
        !string.Equals(template.PartNumber, PartNumber, StringComparison.Ordinal) ? $"the part must stay {PartNumber}; this draft belongs to it"
        : template.Revision != Revision ? string.Create(CultureInfo.InvariantCulture, $"the revision must stay {Revision}; start a new draft for another revision")
        : template.Status != TemplateStatus.Draft ? "the status must stay draft; a draft is released on its release page"
        : Form is not null && template.Device != Device ? $"the device must stay {TemplateFieldSpecs.WordOf(Device)}, the part's device kind"
        : null;

    private static int LineOf(string text, string key)
    {
        Match match = Regex.Match(text, "^" + Regex.Escape(key) + ":", RegexOptions.Multiline | RegexOptions.CultureInvariant);
        return match.Success ? text[..match.Index].Count(c => c == '\n') + 1 : 0;
    }

    private static string Id(string stem, int n) => n == 1 ? stem : string.Create(CultureInfo.InvariantCulture, $"{stem}-{n}");

    private static string Sentence(string message) => message.Length == 0 ? message
        : char.ToUpperInvariant(message[0]) + message[1..] + (message.EndsWith('.') ? "" : ".");
}
