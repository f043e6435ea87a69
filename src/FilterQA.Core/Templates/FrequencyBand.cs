namespace FilterQA.Core.Templates;

/// <summary>
/// A frequency band of a rule: start below stop, both absolute frequencies or both offsets from a centre,
/// as <see cref="Anchor"/> says. Immutable; a band whose start is not below its stop cannot be made.
/// </summary>
public sealed record FrequencyBand
{
    /// <summary>Makes a band.</summary>
    /// <param name="anchor">What the numbers are measured from.</param>
    /// <param name="startHz">Lower end, Hz (absolute, or offset from the anchor's centre; an absolute start must not be negative).</param>
    /// <param name="stopHz">Upper end, Hz, above <paramref name="startHz"/>.</param>
    /// <exception cref="ArgumentException">A value is NaN or infinite, start is not below stop, an absolute start is negative, or the anchor is undefined.</exception>
    public FrequencyBand(FrequencyAnchor anchor, double startHz, double stopHz)
    {
        Anchor = Checks.Defined(anchor, "the frequency anchor");
        StartHz = Checks.Finite(startHz, "the band start");
        StopHz = Checks.Finite(stopHz, "the band stop");
        if (startHz >= stopHz)
        {
            throw new ArgumentException(Checks.Say($"the band start ({startHz:R} Hz) must be below its stop ({stopHz:R} Hz)"));
        }
        if (anchor == FrequencyAnchor.Absolute && startHz < 0)
        {
            throw new ArgumentException(Checks.Say($"an absolute band cannot start at a negative frequency ({startHz:R} Hz)"));
        }
    }

    /// <summary>What <see cref="StartHz"/> and <see cref="StopHz"/> are measured from.</summary>
    public FrequencyAnchor Anchor { get; }

    /// <summary>Lower end, Hz: absolute or an offset per <see cref="Anchor"/>.</summary>
    public double StartHz { get; }

    /// <summary>Upper end, Hz: absolute or an offset per <see cref="Anchor"/>; above <see cref="StartHz"/>.</summary>
    public double StopHz { get; }

    /// <summary>Width of the band, Hz (positive).</summary>
    public double WidthHz => StopHz - StartHz;

    /// <summary>
    /// The band in absolute hertz for one unit: adds the nominal frequency or the unit's measured centre,
    /// as <see cref="Anchor"/> says (an absolute band ignores both).
    /// </summary>
    /// <param name="nominalHz">The template's nominal frequency, Hz.</param>
    /// <param name="measuredCentreHz">The centre measured on the unit, Hz; NaN when unknown (then a measured-offset band resolves to NaN).</param>
    public (double StartHz, double StopHz) Resolve(double nominalHz, double measuredCentreHz)
    {
        double reference = Reference(Anchor, nominalHz, measuredCentreHz);
        return (reference + StartHz, reference + StopHz);
    }

    internal static double Reference(FrequencyAnchor anchor, double nominalHz, double measuredCentreHz) => anchor switch
    {
        FrequencyAnchor.Absolute => 0,
        FrequencyAnchor.NominalOffset => nominalHz,
        _ => measuredCentreHz,
    };
}
