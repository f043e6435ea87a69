namespace FilterQA.Core.Templates.Rules;

/// <summary>
/// Unwanted modes of a resonator: every response in <see cref="Window"/> other than the main resonance must
/// lie at least <see cref="MinimumSuppressionDb"/> below the main response (in the fixture's transmission).
/// The window is usually anchored to the measured series resonance. Resonators only.
/// </summary>
public sealed record UnwantedModesRule : LimitRule
{
    /// <summary>Makes the rule.</summary>
    /// <param name="id">Short name.</param>
    /// <param name="title">Plain-words title.</param>
    /// <param name="window">Where unwanted modes are looked for (the main response itself does not count).</param>
    /// <param name="minimumSuppressionDb">Smallest allowed distance below the main response, dB; above zero.</param>
    /// <param name="uncertaintyDb">U (k = 2), dB.</param>
    /// <exception cref="ArgumentException">A value out of range.</exception>
    public UnwantedModesRule(string id, string title, FrequencyBand window, double minimumSuppressionDb, double uncertaintyDb)
        : base(id, title, uncertaintyDb)
    {
        Window = window ?? throw new ArgumentNullException(nameof(window));
        MinimumSuppressionDb = Checks.Positive(minimumSuppressionDb, "the minimum suppression");
    }

    /// <summary>Where unwanted modes are looked for.</summary>
    public FrequencyBand Window { get; }

    /// <summary>Smallest allowed distance below the main response, dB (positive).</summary>
    public double MinimumSuppressionDb { get; }

    /// <inheritdoc/>
    public override RuleKind Kind => RuleKind.UnwantedModes;

    /// <inheritdoc/>
    public override RuleUnit Unit => RuleUnit.Decibel;

    /// <inheritdoc/>
    public override bool FitsDevice(DeviceKind device) => device == DeviceKind.Resonator;

    internal override (FrequencyAnchor Anchor, double StartHz, double StopHz)? Extent => (Window.Anchor, Window.StartHz, Window.StopHz);
}
