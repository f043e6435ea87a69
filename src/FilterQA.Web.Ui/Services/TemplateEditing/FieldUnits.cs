namespace FilterQA.Web.Ui.Services;

/// <summary>
/// The units each kind of quantity is entered in, with their factor to the SI unit used inside (Hz, dB, s, ohm, F;
/// ppm stays ppm), the same units the template text accepts. The first unit of each list is the one a new field gets.
/// </summary>
public static class FieldUnits
{
    /// <summary>Frequencies: kHz, MHz, GHz, Hz.</summary>
    public static readonly IReadOnlyList<(string Symbol, decimal Factor)> Frequency = [("kHz", 1e3m), ("MHz", 1e6m), ("GHz", 1e9m), ("Hz", 1m)];

    /// <summary>A frequency tolerance: in hertz or in ppm of the nominal frequency.</summary>
    public static readonly IReadOnlyList<(string Symbol, decimal Factor)> Tolerance = [("ppm", 1m), ("Hz", 1m), ("kHz", 1e3m), ("MHz", 1e6m)];

    /// <summary>Levels: dB.</summary>
    public static readonly IReadOnlyList<(string Symbol, decimal Factor)> Level = [("dB", 1m)];

    /// <summary>Times (group delay): ns, us, ps, ms, s.</summary>
    public static readonly IReadOnlyList<(string Symbol, decimal Factor)> Time = [("ns", 1e-9m), ("us", 1e-6m), ("ps", 1e-12m), ("ms", 1e-3m), ("s", 1m)];

    /// <summary>Durations (a thru's age): h, min, s.</summary>
    public static readonly IReadOnlyList<(string Symbol, decimal Factor)> Duration = [("h", 3600m), ("min", 60m), ("s", 1m)];

    /// <summary>Resistances: ohm, kohm, Mohm, mohm.</summary>
    public static readonly IReadOnlyList<(string Symbol, decimal Factor)> Resistance = [("ohm", 1m), ("kohm", 1e3m), ("Mohm", 1e6m), ("mohm", 1e-3m)];

    /// <summary>Capacitances: pF, fF, nF, uF, F.</summary>
    public static readonly IReadOnlyList<(string Symbol, decimal Factor)> Capacitance = [("pF", 1e-12m), ("fF", 1e-15m), ("nF", 1e-9m), ("uF", 1e-6m), ("F", 1m)];

    /// <summary>A plain number (a ratio, a Q): no unit.</summary>
    public static readonly IReadOnlyList<(string Symbol, decimal Factor)> Number = [("", 1m)];

    /// <summary>The SI unit a value of this list is converted to (shown beside the converted value).</summary>
    public static string SiSymbol(IReadOnlyList<(string Symbol, decimal Factor)> units)
    {
        ArgumentNullException.ThrowIfNull(units);
        return ReferenceEquals(units, Frequency) ? "Hz"
            : ReferenceEquals(units, Time) || ReferenceEquals(units, Duration) ? "s"
            : ReferenceEquals(units, Resistance) ? "ohm"
            : ReferenceEquals(units, Capacitance) ? "F"
            : ReferenceEquals(units, Level) ? "dB"
            : "";
    }
}
