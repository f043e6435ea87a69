namespace FilterQA.Core.Formats.Touchstone;

/// <summary>How a Touchstone file writes each complex value as a pair of numbers (the option line's DB, MA or RI).</summary>
public enum TouchstoneDataFormat
{
    /// <summary>DB: 20·log10|x| in dB, then the angle in degrees; x = 10^(a/20)·e^(jπb/180).</summary>
    DecibelAngle,

    /// <summary>MA: magnitude |x| (not negative), then the angle in degrees; x = a·e^(jπb/180). The standard's default.</summary>
    MagnitudeAngle,

    /// <summary>RI: real part, then imaginary part; x = a + jb. The only format that round-trips exactly.</summary>
    RealImaginary,
}
