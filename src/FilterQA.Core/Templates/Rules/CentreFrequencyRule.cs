namespace FilterQA.Core.Templates.Rules;

/// <summary>
/// Centre frequency within ± <see cref="Tolerance"/> of the template's nominal frequency. The centre is
/// computed from the two band edges where the relative attenuation (from the minimum loss) reaches
/// <see cref="LevelDb"/>, by <see cref="Method"/>. Bandpass filters only.
/// </summary>
public sealed record CentreFrequencyRule : LimitRule
{
    /// <summary>Makes the rule.</summary>
    /// <param name="id">Short name.</param>
    /// <param name="title">Plain-words title.</param>
    /// <param name="levelDb">Relative attenuation of the edges, dB below the minimum loss; above zero (e.g. 6).</param>
    /// <param name="tolerance">Allowed deviation from nominal, Hz or ppm.</param>
    /// <param name="method">How the centre follows from the edges.</param>
    /// <param name="uncertainty">U (k = 2) of the centre, in the tolerance's unit (Hz or ppm).</param>
    /// <exception cref="ArgumentException">A value is out of range (the message says which).</exception>
    public CentreFrequencyRule(string id, string title, double levelDb, FrequencyTolerance tolerance, CentreMethod method, double uncertainty)
        : base(id, title, uncertainty)
    {
        LevelDb = Checks.Positive(levelDb, "the level");
        Tolerance = tolerance ?? throw new ArgumentNullException(nameof(tolerance));
        Method = Checks.Defined(method, "the centre method");
    }

    /// <summary>Relative attenuation of the edges, dB below the minimum loss (positive).</summary>
    public double LevelDb { get; }

    /// <summary>Allowed deviation of the centre from the nominal frequency.</summary>
    public FrequencyTolerance Tolerance { get; }

    /// <summary>Arithmetic or geometric mean of the edges.</summary>
    public CentreMethod Method { get; }

    /// <inheritdoc/>
    public override RuleKind Kind => RuleKind.CentreFrequency;

    /// <inheritdoc/>
    public override RuleUnit Unit => Tolerance.RuleUnit;

    /// <inheritdoc/>
    public override bool FitsDevice(DeviceKind device) => device == DeviceKind.BandpassFilter;
}
