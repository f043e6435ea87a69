namespace FilterQA.Core.Templates.Rules;

/// <summary>
/// Notch depth: the greatest loss of a band-stop part, relative to its minimum loss or as measured
/// (<see cref="Reference"/>), at least <see cref="MinimumDb"/>. Band-stop parts only.
/// </summary>
public sealed record NotchDepthRule : LimitRule
{
    /// <summary>Makes the rule.</summary>
    /// <param name="id">Short name.</param>
    /// <param name="title">Plain-words title.</param>
    /// <param name="minimumDb">Smallest allowed depth, dB; above zero.</param>
    /// <param name="reference">Relative to the minimum loss, or absolute.</param>
    /// <param name="uncertaintyDb">U (k = 2) of the depth, dB.</param>
    /// <exception cref="ArgumentException">A value out of range.</exception>
    public NotchDepthRule(string id, string title, double minimumDb, LossReference reference, double uncertaintyDb)
        : base(id, title, uncertaintyDb)
    {
        MinimumDb = Checks.Positive(minimumDb, "the minimum notch depth");
        Reference = Checks.Defined(reference, "the loss reference");
    }

    /// <summary>Smallest allowed depth, dB (positive).</summary>
    public double MinimumDb { get; }

    /// <summary>Relative to the minimum loss, or absolute.</summary>
    public LossReference Reference { get; }

    /// <inheritdoc/>
    public override RuleKind Kind => RuleKind.NotchDepth;

    /// <inheritdoc/>
    public override RuleUnit Unit => RuleUnit.Decibel;

    /// <inheritdoc/>
    public override bool FitsDevice(DeviceKind device) => device == DeviceKind.BandStop;
}
