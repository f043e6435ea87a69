namespace FilterQA.Core.Templates.Rules;

/// <summary>
/// Spurious responses: every unwanted response (local loss minimum) in <see cref="Band"/> must lie at least
/// <see cref="MinimumSuppressionDb"/> below the passband, i.e. its loss relative to the minimum loss is at
/// least that many dB. Bandpass filters only.
/// </summary>
public sealed record SpuriousResponseRule : LimitRule
{
    /// <summary>Makes the rule.</summary>
    /// <param name="id">Short name.</param>
    /// <param name="title">Plain-words title.</param>
    /// <param name="band">Where spurious responses are looked for.</param>
    /// <param name="minimumSuppressionDb">Smallest allowed relative attenuation of a spurious response, dB; above zero.</param>
    /// <param name="uncertaintyDb">U (k = 2), dB.</param>
    /// <exception cref="ArgumentException">A value out of range.</exception>
    public SpuriousResponseRule(string id, string title, FrequencyBand band, double minimumSuppressionDb, double uncertaintyDb)
        : base(id, title, uncertaintyDb)
    {
        Band = band ?? throw new ArgumentNullException(nameof(band));
        MinimumSuppressionDb = Checks.Positive(minimumSuppressionDb, "the minimum suppression");
    }

    /// <summary>Where spurious responses are looked for.</summary>
    public FrequencyBand Band { get; }

    /// <summary>Smallest allowed distance below the passband, dB (positive).</summary>
    public double MinimumSuppressionDb { get; }

    /// <inheritdoc/>
    public override RuleKind Kind => RuleKind.SpuriousResponse;

    /// <inheritdoc/>
    public override RuleUnit Unit => RuleUnit.Decibel;

    /// <inheritdoc/>
    public override bool FitsDevice(DeviceKind device) => device == DeviceKind.BandpassFilter;

    internal override (FrequencyAnchor Anchor, double StartHz, double StopHz)? Extent => (Band.Anchor, Band.StartHz, Band.StopHz);
}
