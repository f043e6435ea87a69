namespace FilterQA.Core.Templates.Rules;

/// <summary>Shunt capacitance C0 of a resonator at most <see cref="MaximumF"/>. Resonators only.</summary>
public sealed record ShuntCapacitanceRule : LimitRule
{
    /// <summary>Makes the rule.</summary>
    /// <param name="id">Short name.</param>
    /// <param name="title">Plain-words title.</param>
    /// <param name="maximumF">Largest allowed C0, F; above zero (e.g. 5e-12).</param>
    /// <param name="uncertaintyF">U (k = 2) of C0, F.</param>
    /// <exception cref="ArgumentException">A value out of range.</exception>
    public ShuntCapacitanceRule(string id, string title, double maximumF, double uncertaintyF)
        : base(id, title, uncertaintyF)
    {
        MaximumF = Checks.Positive(maximumF, "the maximum shunt capacitance");
    }

    /// <summary>Largest allowed C0, F.</summary>
    public double MaximumF { get; }

    /// <inheritdoc/>
    public override RuleKind Kind => RuleKind.ShuntCapacitance;

    /// <inheritdoc/>
    public override RuleUnit Unit => RuleUnit.Farad;

    /// <inheritdoc/>
    public override bool FitsDevice(DeviceKind device) => device == DeviceKind.Resonator;
}
