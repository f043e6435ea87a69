namespace FilterQA.Core.Templates.Rules;

/// <summary>Motional resistance R1 of a resonator at most <see cref="MaximumOhm"/>. Resonators only.</summary>
public sealed record MotionalResistanceRule : LimitRule
{
    /// <summary>Makes the rule.</summary>
    /// <param name="id">Short name.</param>
    /// <param name="title">Plain-words title.</param>
    /// <param name="maximumOhm">Largest allowed R1, Ω; above zero.</param>
    /// <param name="uncertaintyOhm">U (k = 2) of R1, Ω.</param>
    /// <exception cref="ArgumentException">A value out of range.</exception>
    public MotionalResistanceRule(string id, string title, double maximumOhm, double uncertaintyOhm)
        : base(id, title, uncertaintyOhm)
    {
        MaximumOhm = Checks.Positive(maximumOhm, "the maximum motional resistance");
    }

    /// <summary>Largest allowed R1, Ω.</summary>
    public double MaximumOhm { get; }

    /// <inheritdoc/>
    public override RuleKind Kind => RuleKind.MotionalResistance;

    /// <inheritdoc/>
    public override RuleUnit Unit => RuleUnit.Ohm;

    /// <inheritdoc/>
    public override bool FitsDevice(DeviceKind device) => device == DeviceKind.Resonator;
}
