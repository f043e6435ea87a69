using FilterQA.Core.Templates.Rules;

namespace FilterQA.Core.Templates;

/// <summary>
/// The changeable content of a template while <see cref="LimitTemplate.NewRevision"/> makes the next
/// revision. Starts as a copy of the template it came from; part number, revision, status and release date
/// are not editable (they are set by the life cycle).
/// </summary>
public sealed class TemplateEditor
{
    internal TemplateEditor(LimitTemplate source)
    {
        Description = source.Description;
        Device = source.Device;
        NominalHz = source.NominalHz;
        Author = source.Author;
        Sweep = source.Sweep;
        DecisionRule = source.DecisionRule;
        Rules = [.. source.Rules];
    }

    /// <summary>What the part is, one line.</summary>
    public string Description { get; set; }

    /// <summary>Kind of part.</summary>
    public DeviceKind Device { get; set; }

    /// <summary>Nominal frequency, Hz.</summary>
    public double NominalHz { get; set; }

    /// <summary>Author of the new revision; may be null for a draft.</summary>
    public string? Author { get; set; }

    /// <summary>Sweep requirements.</summary>
    public SweepRequirements Sweep { get; set; }

    /// <summary>Decision rule.</summary>
    public DecisionRule DecisionRule { get; set; }

    /// <summary>The rules, in order; add, remove or replace entries.</summary>
    public IList<LimitRule> Rules { get; }
}
