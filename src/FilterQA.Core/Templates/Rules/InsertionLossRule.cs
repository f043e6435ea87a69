namespace FilterQA.Core.Templates.Rules;

/// <summary>
/// Insertion loss (dB, positive for attenuation, as measured after thru normalisation) at most
/// <see cref="MaximumDb"/>, read as the minimum loss, at the nominal frequency, or at a stated frequency.
/// Bandpass and band-stop parts (for a trap: the pass loss either side of the notch).
/// </summary>
public sealed record InsertionLossRule : LimitRule
{
    /// <summary>Makes the rule.</summary>
    /// <param name="id">Short name.</param>
    /// <param name="title">Plain-words title.</param>
    /// <param name="maximumDb">Largest allowed loss, dB; above zero.</param>
    /// <param name="measure">Where the loss is read.</param>
    /// <param name="at">The frequency, required with <see cref="InsertionLossMeasure.AtFrequency"/> and null otherwise.</param>
    /// <param name="uncertaintyDb">U (k = 2) of the loss, dB.</param>
    /// <exception cref="ArgumentException">A value out of range, or <paramref name="at"/> given or missing against <paramref name="measure"/>.</exception>
    public InsertionLossRule(string id, string title, double maximumDb, InsertionLossMeasure measure, AnchoredFrequency? at, double uncertaintyDb)
        : base(id, title, uncertaintyDb)
    {
        MaximumDb = Checks.Positive(maximumDb, "the maximum insertion loss");
        Measure = Checks.Defined(measure, "the insertion-loss measure");
        if (measure == InsertionLossMeasure.AtFrequency && at is null)
        {
            throw new ArgumentException("an insertion-loss rule read at a frequency needs that frequency");
        }
        if (measure != InsertionLossMeasure.AtFrequency && at is not null)
        {
            throw new ArgumentException("a frequency is given only when the insertion loss is read at a frequency");
        }
        At = at;
    }

    /// <summary>Largest allowed loss, dB (positive).</summary>
    public double MaximumDb { get; }

    /// <summary>Where the loss is read.</summary>
    public InsertionLossMeasure Measure { get; }

    /// <summary>The frequency for <see cref="InsertionLossMeasure.AtFrequency"/>; null otherwise.</summary>
    public AnchoredFrequency? At { get; }

    /// <inheritdoc/>
    public override RuleKind Kind => RuleKind.InsertionLoss;

    /// <inheritdoc/>
    public override RuleUnit Unit => RuleUnit.Decibel;

    /// <inheritdoc/>
    public override bool FitsDevice(DeviceKind device) => device is DeviceKind.BandpassFilter or DeviceKind.BandStop;

    internal override (FrequencyAnchor Anchor, double StartHz, double StopHz)? Extent => At is null ? null : (At.Anchor, At.ValueHz, At.ValueHz);
}
