using FilterQA.Core.Templates;

namespace FilterQA.Web.Ui.Services;

/// <summary>The whole draft as the editor's form: fixed identity, editable header, sweep section and rules.</summary>
public sealed class TemplateForm
{
    /// <summary>An empty form for a draft of <paramref name="partNumber"/> revision <paramref name="revision"/>.</summary>
    public TemplateForm(string partNumber, int revision, DeviceKind device)
    {
        PartNumber = partNumber;
        Revision = revision;
        Device = device;
    }

    /// <summary>The part (fixed).</summary>
    public string PartNumber { get; }

    /// <summary>The draft's revision (fixed).</summary>
    public int Revision { get; }

    /// <summary>The device kind (fixed by the part).</summary>
    public DeviceKind Device { get; }

    /// <summary>Description, nominal frequency, author, decision rule.</summary>
    public IReadOnlyList<FormField> Header { get; } = TemplateFieldSpecs.Header.Select(s => new FormField(s)).ToArray();

    /// <summary>The sweep requirements.</summary>
    public IReadOnlyList<FormField> Sweep { get; } = TemplateFieldSpecs.Sweep.Select(s => new FormField(s)).ToArray();

    /// <summary>The rules, in order.</summary>
    public List<RuleForm> Rules { get; } = [];

    /// <summary>The reader's problems that belong to no field (the text as a whole, a section).</summary>
    public List<string> Problems { get; } = [];

    /// <summary>The header field with the key.</summary>
    public FormField HeaderField(string key) => Header.First(f => f.Spec.Key == key);

    /// <summary>The sweep field with the key.</summary>
    public FormField SweepField(string key) => Sweep.First(f => f.Spec.Key == key);

    /// <summary>Every field, rules' fields and points included.</summary>
    public IEnumerable<FormField> AllFields() => Header.Concat(Sweep).Concat(Rules.SelectMany(r =>
        new[] { r.Id, r.Title }.Concat(r.Fields).Concat(r.Points.SelectMany(p => new[] { p.Frequency, p.Loss }))));

    /// <summary>True when any field, rule, point or the form has a problem.</summary>
    public bool HasProblems => Problems.Count > 0 || AllFields().Any(f => f.Problems.Count > 0)
        || Rules.Any(r => r.Problems.Count > 0 || r.Points.Any(p => p.Problems.Count > 0));
}
