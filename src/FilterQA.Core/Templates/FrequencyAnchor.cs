namespace FilterQA.Core.Templates;

/// <summary>What a rule's frequencies are measured from.</summary>
public enum FrequencyAnchor
{
    /// <summary>The numbers are absolute frequencies, Hz (never negative).</summary>
    Absolute,

    /// <summary>The numbers are offsets, Hz, from the template's nominal frequency (negative = below it).</summary>
    NominalOffset,

    /// <summary>
    /// The numbers are offsets, Hz, from the centre measured on the unit (a mask that follows the part;
    /// negative = below it). For a resonator the measured centre is the measured series resonance.
    /// </summary>
    MeasuredOffset,
}
