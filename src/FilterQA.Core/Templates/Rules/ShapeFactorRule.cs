namespace FilterQA.Core.Templates.Rules;

/// <summary>
/// Shape factor BW(<see cref="StopLevelDb"/>) / BW(<see cref="PassLevelDb"/>), both levels relative to the
/// minimum loss, at most <see cref="Maximum"/> (e.g. 60/6 dB for a 455 kHz ceramic filter). Inconclusive
/// when the stop level is never reached on a side. Bandpass filters only.
/// </summary>
public sealed record ShapeFactorRule : LimitRule
{
    /// <summary>Makes the rule.</summary>
    /// <param name="id">Short name.</param>
    /// <param name="title">Plain-words title.</param>
    /// <param name="passLevelDb">Level of the narrow bandwidth, dB; above zero.</param>
    /// <param name="stopLevelDb">Level of the wide bandwidth, dB; above <paramref name="passLevelDb"/>.</param>
    /// <param name="maximum">Largest allowed ratio; at least 1.</param>
    /// <param name="uncertainty">U (k = 2) of the ratio (a plain number).</param>
    /// <exception cref="ArgumentException">A value out of range or the stop level not above the pass level.</exception>
    public ShapeFactorRule(string id, string title, double passLevelDb, double stopLevelDb, double maximum, double uncertainty)
        : base(id, title, uncertainty)
    {
        PassLevelDb = Checks.Positive(passLevelDb, "the pass level");
        StopLevelDb = Checks.Positive(stopLevelDb, "the stop level");
        if (stopLevelDb <= passLevelDb)
        {
            throw new ArgumentException(Checks.Say($"the stop level ({stopLevelDb:R} dB) must be above the pass level ({passLevelDb:R} dB)"));
        }
        Maximum = Checks.Positive(maximum, "the maximum shape factor");
        if (maximum < 1)
        {
            throw new ArgumentException(Checks.Say($"a shape factor is at least 1, so a maximum of {maximum:R} can never be met"));
        }
    }

    /// <summary>Level of the narrow (pass) bandwidth, dB below the minimum loss.</summary>
    public double PassLevelDb { get; }

    /// <summary>Level of the wide (stop) bandwidth, dB below the minimum loss; above <see cref="PassLevelDb"/>.</summary>
    public double StopLevelDb { get; }

    /// <summary>Largest allowed ratio (at least 1).</summary>
    public double Maximum { get; }

    /// <inheritdoc/>
    public override RuleKind Kind => RuleKind.ShapeFactor;

    /// <inheritdoc/>
    public override RuleUnit Unit => RuleUnit.Ratio;

    /// <inheritdoc/>
    public override bool FitsDevice(DeviceKind device) => device == DeviceKind.BandpassFilter;
}
