namespace FilterQA.Core.Templates.Rules;

/// <summary>
/// Bandwidth at a level: the spacing of the two edges where the relative attenuation (from the minimum
/// loss) reaches <see cref="LevelDb"/>, at least <see cref="MinimumHz"/> and/or at most <see cref="MaximumHz"/>.
/// By common practice (IEC 60368-1 terms) a minimum is checked on the innermost crossings and a maximum on
/// the outermost. Bandpass filters only.
/// </summary>
public sealed record BandwidthRule : LimitRule
{
    /// <summary>Makes the rule; at least one of minimum and maximum must be given.</summary>
    /// <param name="id">Short name.</param>
    /// <param name="title">Plain-words title.</param>
    /// <param name="levelDb">Relative attenuation of the edges, dB; above zero.</param>
    /// <param name="minimumHz">Smallest allowed bandwidth, Hz, above zero; null for none.</param>
    /// <param name="maximumHz">Largest allowed bandwidth, Hz, above zero and not below the minimum; null for none.</param>
    /// <param name="uncertaintyHz">U (k = 2) of the bandwidth, Hz.</param>
    /// <exception cref="ArgumentException">Neither limit given, a limit not above zero, or minimum above maximum.</exception>
    public BandwidthRule(string id, string title, double levelDb, double? minimumHz, double? maximumHz, double uncertaintyHz)
        : base(id, title, uncertaintyHz)
    {
        LevelDb = Checks.Positive(levelDb, "the level");
        if (minimumHz is null && maximumHz is null)
        {
            throw new ArgumentException("a bandwidth rule needs a minimum, a maximum or both");
        }
        MinimumHz = minimumHz is { } min ? Checks.Positive(min, "the minimum bandwidth") : null;
        MaximumHz = maximumHz is { } max ? Checks.Positive(max, "the maximum bandwidth") : null;
        if (MinimumHz > MaximumHz)
        {
            throw new ArgumentException(Checks.Say($"the minimum bandwidth ({MinimumHz:R} Hz) is above the maximum ({MaximumHz:R} Hz)"));
        }
    }

    /// <summary>Relative attenuation of the edges, dB (positive).</summary>
    public double LevelDb { get; }

    /// <summary>Smallest allowed bandwidth, Hz; null when there is no lower limit.</summary>
    public double? MinimumHz { get; }

    /// <summary>Largest allowed bandwidth, Hz; null when there is no upper limit.</summary>
    public double? MaximumHz { get; }

    /// <inheritdoc/>
    public override RuleKind Kind => RuleKind.Bandwidth;

    /// <inheritdoc/>
    public override RuleUnit Unit => RuleUnit.Hertz;

    /// <inheritdoc/>
    public override bool FitsDevice(DeviceKind device) => device == DeviceKind.BandpassFilter;
}
