namespace FilterQA.Core.Templates.Rules;

/// <summary>
/// Passband ripple: the largest minus the smallest loss over <see cref="Band"/>, dB, at most
/// <see cref="MaximumDb"/>. The band should stay inside the 3 dB edges. Bandpass filters only.
/// </summary>
public sealed record PassbandRippleRule : LimitRule
{
    /// <summary>Makes the rule.</summary>
    /// <param name="id">Short name.</param>
    /// <param name="title">Plain-words title.</param>
    /// <param name="band">Where the ripple is taken.</param>
    /// <param name="maximumDb">Largest allowed ripple, dB; above zero.</param>
    /// <param name="uncertaintyDb">U (k = 2) of the ripple, dB.</param>
    /// <exception cref="ArgumentException">A value out of range.</exception>
    public PassbandRippleRule(string id, string title, FrequencyBand band, double maximumDb, double uncertaintyDb)
        : base(id, title, uncertaintyDb)
    {
        Band = band ?? throw new ArgumentNullException(nameof(band));
        MaximumDb = Checks.Positive(maximumDb, "the maximum ripple");
    }

    /// <summary>Where the ripple is taken.</summary>
    public FrequencyBand Band { get; }

    /// <summary>Largest allowed ripple (max − min loss), dB (positive).</summary>
    public double MaximumDb { get; }

    /// <inheritdoc/>
    public override RuleKind Kind => RuleKind.PassbandRipple;

    /// <inheritdoc/>
    public override RuleUnit Unit => RuleUnit.Decibel;

    /// <inheritdoc/>
    public override bool FitsDevice(DeviceKind device) => device == DeviceKind.BandpassFilter;

    internal override (FrequencyAnchor Anchor, double StartHz, double StopHz)? Extent => (Band.Anchor, Band.StartHz, Band.StopHz);
}
