namespace FilterQA.Core.Templates.Rules;

/// <summary>
/// Notch frequency of a band-stop part or trap (the frequency of greatest loss) within ± <see cref="Tolerance"/>
/// of the template's nominal frequency. Band-stop parts only.
/// </summary>
public sealed record NotchFrequencyRule : LimitRule
{
    /// <summary>Makes the rule.</summary>
    /// <param name="id">Short name.</param>
    /// <param name="title">Plain-words title.</param>
    /// <param name="tolerance">Allowed deviation from nominal, Hz or ppm.</param>
    /// <param name="uncertainty">U (k = 2) of the notch frequency, in the tolerance's unit.</param>
    /// <exception cref="ArgumentException">A value out of range.</exception>
    public NotchFrequencyRule(string id, string title, FrequencyTolerance tolerance, double uncertainty)
        : base(id, title, uncertainty)
    {
        Tolerance = tolerance ?? throw new ArgumentNullException(nameof(tolerance));
    }

    /// <summary>Allowed deviation of the notch from the nominal frequency.</summary>
    public FrequencyTolerance Tolerance { get; }

    /// <inheritdoc/>
    public override RuleKind Kind => RuleKind.NotchFrequency;

    /// <inheritdoc/>
    public override RuleUnit Unit => Tolerance.RuleUnit;

    /// <inheritdoc/>
    public override bool FitsDevice(DeviceKind device) => device == DeviceKind.BandStop;
}
