namespace FilterQA.Core.Formats.Touchstone;

/// <summary>The frequency unit of a Touchstone option line (the standard's HZ, KHZ, MHZ, GHZ).</summary>
public enum TouchstoneFrequencyUnit
{
    /// <summary>Hertz (multiplier 1).</summary>
    Hz,

    /// <summary>Kilohertz (multiplier 1e3).</summary>
    KHz,

    /// <summary>Megahertz (multiplier 1e6).</summary>
    MHz,

    /// <summary>Gigahertz (multiplier 1e9); the standard's default when the option line names no unit.</summary>
    GHz,
}
