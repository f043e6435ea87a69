namespace FilterQA.Core.Templates.Text;

/// <summary>What a quantity in the text format measures; decides which units it accepts.</summary>
internal enum QuantityKind
{
    /// <summary>Hz, kHz, MHz, GHz.</summary>
    Frequency,

    /// <summary>dB.</summary>
    Level,

    /// <summary>s, ms, us (µs), ns, ps.</summary>
    Time,

    /// <summary>h, min, s (a thru age).</summary>
    Duration,

    /// <summary>ohm (Ω), kohm (kΩ), Mohm (MΩ), mohm (mΩ).</summary>
    Resistance,

    /// <summary>F, uF (µF), nF, pF, fF.</summary>
    Capacitance,

    /// <summary>A plain number without unit.</summary>
    Number,
}
