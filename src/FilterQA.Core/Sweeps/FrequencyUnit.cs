namespace FilterQA.Core.Sweeps;

/// <summary>
/// A frequency unit as files write it (Touchstone option lines, delimited-text headers).
/// Inside FilterQA every frequency is in hertz; a unit is used only to convert at the file's edge.
/// See <see cref="FrequencyUnitExtensions"/> for the multiplier and the parser.
/// </summary>
public enum FrequencyUnit
{
    /// <summary>Hertz (multiplier 1).</summary>
    Hz,

    /// <summary>Kilohertz (multiplier 1e3).</summary>
    KHz,

    /// <summary>Megahertz (multiplier 1e6).</summary>
    MHz,

    /// <summary>Gigahertz (multiplier 1e9).</summary>
    GHz,
}
