namespace FilterQA.Core.Templates;

/// <summary>One frequency of a rule: absolute, or an offset from a centre, as <see cref="Anchor"/> says. Immutable.</summary>
public sealed record AnchoredFrequency
{
    /// <summary>Makes the frequency.</summary>
    /// <param name="anchor">What the value is measured from.</param>
    /// <param name="valueHz">Hz: an absolute frequency (not negative) or an offset (any sign).</param>
    /// <exception cref="ArgumentException">The value is NaN or infinite, an absolute value is negative, or the anchor is undefined.</exception>
    public AnchoredFrequency(FrequencyAnchor anchor, double valueHz)
    {
        Anchor = Checks.Defined(anchor, "the frequency anchor");
        ValueHz = Checks.Finite(valueHz, "the frequency");
        if (anchor == FrequencyAnchor.Absolute && valueHz < 0)
        {
            throw new ArgumentException(Checks.Say($"an absolute frequency cannot be negative ({valueHz:R} Hz)"));
        }
    }

    /// <summary>What <see cref="ValueHz"/> is measured from.</summary>
    public FrequencyAnchor Anchor { get; }

    /// <summary>Hz: absolute or an offset per <see cref="Anchor"/>.</summary>
    public double ValueHz { get; }

    /// <summary>The frequency in absolute hertz for one unit (see <see cref="FrequencyBand.Resolve"/>).</summary>
    /// <param name="nominalHz">The template's nominal frequency, Hz.</param>
    /// <param name="measuredCentreHz">The centre measured on the unit, Hz; NaN when unknown.</param>
    public double Resolve(double nominalHz, double measuredCentreHz) =>
        FrequencyBand.Reference(Anchor, nominalHz, measuredCentreHz) + ValueHz;
}
