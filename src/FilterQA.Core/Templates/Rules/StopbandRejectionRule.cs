namespace FilterQA.Core.Templates.Rules;

/// <summary>
/// Stopband rejection: the smallest loss over <see cref="Band"/> at least <see cref="MinimumDb"/>, either
/// relative to the unit's minimum loss or as measured (<see cref="Reference"/>). A requirement beyond the
/// bench's verifiable dynamic range cannot pass. Bandpass filters only.
/// </summary>
public sealed record StopbandRejectionRule : LimitRule
{
    /// <summary>Makes the rule.</summary>
    /// <param name="id">Short name.</param>
    /// <param name="title">Plain-words title.</param>
    /// <param name="band">The stopband.</param>
    /// <param name="minimumDb">Smallest allowed loss over the band, dB; above zero.</param>
    /// <param name="reference">Relative to the minimum loss, or absolute.</param>
    /// <param name="uncertaintyDb">U (k = 2) of the loss, dB.</param>
    /// <exception cref="ArgumentException">A value out of range.</exception>
    public StopbandRejectionRule(string id, string title, FrequencyBand band, double minimumDb, LossReference reference, double uncertaintyDb)
        : base(id, title, uncertaintyDb)
    {
        Band = band ?? throw new ArgumentNullException(nameof(band));
        MinimumDb = Checks.Positive(minimumDb, "the minimum rejection");
        Reference = Checks.Defined(reference, "the loss reference");
    }

    /// <summary>The stopband.</summary>
    public FrequencyBand Band { get; }

    /// <summary>Smallest allowed loss over the band, dB (positive).</summary>
    public double MinimumDb { get; }

    /// <summary>Relative to the minimum loss, or absolute.</summary>
    public LossReference Reference { get; }

    /// <inheritdoc/>
    public override RuleKind Kind => RuleKind.StopbandRejection;

    /// <inheritdoc/>
    public override RuleUnit Unit => RuleUnit.Decibel;

    /// <inheritdoc/>
    public override bool FitsDevice(DeviceKind device) => device == DeviceKind.BandpassFilter;

    internal override (FrequencyAnchor Anchor, double StartHz, double StopHz)? Extent => (Band.Anchor, Band.StartHz, Band.StopHz);
}
