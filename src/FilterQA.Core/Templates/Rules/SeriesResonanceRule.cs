namespace FilterQA.Core.Templates.Rules;

/// <summary>
/// Series resonance fs of a resonator within ± <see cref="Tolerance"/> of the template's nominal frequency
/// (usually in ppm). Resonators only.
/// </summary>
public sealed record SeriesResonanceRule : LimitRule
{
    /// <summary>Makes the rule.</summary>
    /// <param name="id">Short name.</param>
    /// <param name="title">Plain-words title (state the temperature and fixture here).</param>
    /// <param name="tolerance">Allowed deviation from nominal, ppm or Hz.</param>
    /// <param name="uncertainty">U (k = 2) of fs, in the tolerance's unit.</param>
    /// <exception cref="ArgumentException">A value out of range.</exception>
    public SeriesResonanceRule(string id, string title, FrequencyTolerance tolerance, double uncertainty)
        : base(id, title, uncertainty)
    {
        Tolerance = tolerance ?? throw new ArgumentNullException(nameof(tolerance));
    }

    /// <summary>Allowed deviation of fs from the nominal frequency.</summary>
    public FrequencyTolerance Tolerance { get; }

    /// <inheritdoc/>
    public override RuleKind Kind => RuleKind.SeriesResonance;

    /// <inheritdoc/>
    public override RuleUnit Unit => Tolerance.RuleUnit;

    /// <inheritdoc/>
    public override bool FitsDevice(DeviceKind device) => device == DeviceKind.Resonator;
}
