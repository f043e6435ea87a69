namespace FilterQA.Core.Templates.Rules;

/// <summary>
/// Return loss RL = −20·log10|Sii| at <see cref="Port"/> (1 → S11, 2 → S22) at least <see cref="MinimumDb"/>
/// over <see cref="Band"/>. Needs the reflection of that port. Any device kind.
/// </summary>
public sealed record ReturnLossRule : LimitRule
{
    /// <summary>Makes the rule.</summary>
    /// <param name="id">Short name.</param>
    /// <param name="title">Plain-words title.</param>
    /// <param name="band">Where the return loss is checked.</param>
    /// <param name="minimumDb">Smallest allowed return loss, dB; above zero.</param>
    /// <param name="port">1 (input, S11) or 2 (output, S22).</param>
    /// <param name="uncertaintyDb">U (k = 2) of the return loss, dB.</param>
    /// <exception cref="ArgumentException">A value out of range, or a port other than 1 or 2.</exception>
    public ReturnLossRule(string id, string title, FrequencyBand band, double minimumDb, int port, double uncertaintyDb)
        : base(id, title, uncertaintyDb)
    {
        Band = band ?? throw new ArgumentNullException(nameof(band));
        MinimumDb = Checks.Positive(minimumDb, "the minimum return loss");
        if (port is not (1 or 2))
        {
            throw new ArgumentException(Checks.Say($"return loss is read at port 1 (S11) or port 2 (S22); got port {port}"));
        }
        Port = port;
    }

    /// <summary>Where the return loss is checked.</summary>
    public FrequencyBand Band { get; }

    /// <summary>Smallest allowed return loss, dB (positive).</summary>
    public double MinimumDb { get; }

    /// <summary>1 (input, S11) or 2 (output, S22).</summary>
    public int Port { get; }

    /// <inheritdoc/>
    public override RuleKind Kind => RuleKind.ReturnLoss;

    /// <inheritdoc/>
    public override RuleUnit Unit => RuleUnit.Decibel;

    /// <inheritdoc/>
    public override int? ReflectionPort => Port;

    /// <inheritdoc/>
    public override bool FitsDevice(DeviceKind device) => Enum.IsDefined(device);

    internal override (FrequencyAnchor Anchor, double StartHz, double StopHz)? Extent => (Band.Anchor, Band.StartHz, Band.StopHz);
}
