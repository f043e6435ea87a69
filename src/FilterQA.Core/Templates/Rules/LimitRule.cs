namespace FilterQA.Core.Templates.Rules;

/// <summary>
/// One limit of a template. Every rule has a short <see cref="Id"/>, a plain-words <see cref="Title"/> for
/// messages and reports, and the expanded measurement uncertainty U (k = 2) of what it measures, in
/// <see cref="Unit"/>. Rules are immutable records, validated when made; two rules are equal when every
/// field is equal. The concrete classes are sealed; switch on the type or on <see cref="Kind"/>.
/// </summary>
public abstract record LimitRule
{
    /// <summary>Sets the common fields.</summary>
    /// <exception cref="ArgumentException">The id is not a short name, the title is empty or multi-line, or the uncertainty is negative or not finite.</exception>
    private protected LimitRule(string id, string title, double uncertainty)
    {
        Id = Checks.RuleId(id);
        Title = Checks.Text(title, "a rule title");
        Uncertainty = Checks.NonNegative(uncertainty, "the uncertainty");
    }

    /// <summary>Short name, unique in the template: 1–32 lower-case letters, digits, hyphens; starts with a letter.</summary>
    public string Id { get; }

    /// <summary>What the rule checks, in plain words, one line (for messages and reports).</summary>
    public string Title { get; }

    /// <summary>
    /// Expanded uncertainty U (coverage factor k = 2) of the measured quantity, in <see cref="Unit"/>; zero or more.
    /// Under guarded acceptance it is also the guard band w.
    /// </summary>
    public double Uncertainty { get; }

    /// <summary>Which kind of rule this is (one value per rule class).</summary>
    public abstract RuleKind Kind { get; }

    /// <summary>The unit of the limit and of <see cref="Uncertainty"/>.</summary>
    public abstract RuleUnit Unit { get; }

    /// <summary>True when the rule needs the phase of the transmission (group delay).</summary>
    public virtual bool NeedsPhase => false;

    /// <summary>The port whose reflection the rule needs (1 → S11, 2 → S22), or null when it needs none.</summary>
    public virtual int? ReflectionPort => null;

    /// <summary>True when the rule makes sense for a part of kind <paramref name="device"/>.</summary>
    public abstract bool FitsDevice(DeviceKind device);

    /// <summary>The frequency range the rule looks at, when it states one (for checking the required sweep span).</summary>
    internal virtual (FrequencyAnchor Anchor, double StartHz, double StopHz)? Extent => null;
}
