namespace FilterQA.Core.Templates.Rules;

/// <summary>Unloaded quality factor Qu of a resonator at least <see cref="MinimumQ"/>. Resonators only.</summary>
public sealed record UnloadedQRule : LimitRule
{
    /// <summary>Makes the rule.</summary>
    /// <param name="id">Short name.</param>
    /// <param name="title">Plain-words title.</param>
    /// <param name="minimumQ">Smallest allowed Qu (a plain number); above zero.</param>
    /// <param name="uncertainty">U (k = 2) of Qu (a plain number).</param>
    /// <exception cref="ArgumentException">A value out of range.</exception>
    public UnloadedQRule(string id, string title, double minimumQ, double uncertainty)
        : base(id, title, uncertainty)
    {
        MinimumQ = Checks.Positive(minimumQ, "the minimum unloaded Q");
    }

    /// <summary>Smallest allowed unloaded Q.</summary>
    public double MinimumQ { get; }

    /// <inheritdoc/>
    public override RuleKind Kind => RuleKind.UnloadedQ;

    /// <inheritdoc/>
    public override RuleUnit Unit => RuleUnit.Ratio;

    /// <inheritdoc/>
    public override bool FitsDevice(DeviceKind device) => device == DeviceKind.Resonator;
}
