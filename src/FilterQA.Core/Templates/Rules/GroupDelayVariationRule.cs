namespace FilterQA.Core.Templates.Rules;

/// <summary>
/// Group-delay variation: max − min of τ = −dφ/dω over <see cref="Band"/>, seconds, at most
/// <see cref="MaximumS"/>; the derivative is taken as a central difference over <see cref="ApertureHz"/>
/// (0 = neighbouring points). Needs the transmission phase. Bandpass and band-stop parts.
/// </summary>
public sealed record GroupDelayVariationRule : LimitRule
{
    /// <summary>Makes the rule.</summary>
    /// <param name="id">Short name.</param>
    /// <param name="title">Plain-words title.</param>
    /// <param name="band">Where the variation is taken.</param>
    /// <param name="maximumS">Largest allowed variation, s; above zero.</param>
    /// <param name="apertureHz">Smoothing aperture, Hz; zero or more, below the band width.</param>
    /// <param name="uncertaintyS">U (k = 2) of the variation, s.</param>
    /// <exception cref="ArgumentException">A value out of range, or the aperture not below the band width.</exception>
    public GroupDelayVariationRule(string id, string title, FrequencyBand band, double maximumS, double apertureHz, double uncertaintyS)
        : base(id, title, uncertaintyS)
    {
        Band = band ?? throw new ArgumentNullException(nameof(band));
        MaximumS = Checks.Positive(maximumS, "the maximum group-delay variation");
        ApertureHz = Checks.NonNegative(apertureHz, "the smoothing aperture");
        if (apertureHz >= band.WidthHz)
        {
            throw new ArgumentException(Checks.Say($"the smoothing aperture ({apertureHz:R} Hz) must be narrower than the band ({band.WidthHz:R} Hz)"));
        }
    }

    /// <summary>Where the variation is taken.</summary>
    public FrequencyBand Band { get; }

    /// <summary>Largest allowed variation (max − min group delay), s.</summary>
    public double MaximumS { get; }

    /// <summary>Width of the central difference, Hz; 0 means neighbouring points.</summary>
    public double ApertureHz { get; }

    /// <inheritdoc/>
    public override RuleKind Kind => RuleKind.GroupDelayVariation;

    /// <inheritdoc/>
    public override RuleUnit Unit => RuleUnit.Second;

    /// <inheritdoc/>
    public override bool NeedsPhase => true;

    /// <inheritdoc/>
    public override bool FitsDevice(DeviceKind device) => device is DeviceKind.BandpassFilter or DeviceKind.BandStop;

    internal override (FrequencyAnchor Anchor, double StartHz, double StopHz)? Extent => (Band.Anchor, Band.StartHz, Band.StopHz);
}
