using System.Globalization;
using FilterQA.Core.Templates;

namespace FilterQA.Core.Decisions;

/// <summary>Numbers with their units for people, invariant culture: frequencies in Hz, kHz, MHz or GHz as fits.</summary>
internal static class Say
{
    private static readonly CultureInfo C = CultureInfo.InvariantCulture;

    /// <summary>A frequency in the unit that fits it: "455.00 kHz", "161.500 MHz", "950.0 Hz".</summary>
    public static string Hz(double hz)
    {
        double a = Math.Abs(hz);
        return a >= 1e9 ? (hz / 1e9).ToString("0.0000", C) + " GHz"
            : a >= 1e6 ? (hz / 1e6).ToString("0.000", C) + " MHz"
            : a >= 1e3 ? (hz / 1e3).ToString("0.00", C) + " kHz"
            : hz.ToString("0.0", C) + " Hz";
    }

    /// <summary>A frequency to the hertz in MHz or kHz ("24.000480 MHz") for resonances, where a kHz step is too coarse.</summary>
    public static string PreciseHz(double hz)
    {
        double a = Math.Abs(hz);
        return a >= 1e6 ? (hz / 1e6).ToString("0.000000", C) + " MHz"
            : a >= 1e3 ? (hz / 1e3).ToString("0.000", C) + " kHz"
            : hz.ToString("0.0", C) + " Hz";
    }

    /// <summary>A measured level: "31.2 dB", "3.85 dB".</summary>
    public static string Db(double db) => db.ToString("0.0#", C) + " dB";

    /// <summary>A limit as written in a template: "35 dB", "3.75 dB".</summary>
    public static string LimitDb(double db) => db.ToString("0.###", C) + " dB";

    /// <summary>A time: "23.4 ns", "1.31 µs".</summary>
    public static string Seconds(double s)
    {
        double a = Math.Abs(s);
        return a >= 1 ? s.ToString("0.###", C) + " s"
            : a >= 1e-3 ? (s * 1e3).ToString("0.###", C) + " ms"
            : a >= 1e-6 ? (s * 1e6).ToString("0.###", C) + " µs"
            : (s * 1e9).ToString("0.#", C) + " ns";
    }

    /// <summary>A value in a rule's unit, for messages.</summary>
    public static string Value(double value, RuleUnit unit) => unit switch
    {
        RuleUnit.Hertz => Hz(value),
        RuleUnit.PartsPerMillion => value.ToString("+0.0#;-0.0#;0.0", C) + " ppm",
        RuleUnit.Decibel => Db(value),
        RuleUnit.Second => Seconds(value),
        RuleUnit.Ohm => value.ToString("0.0#", C) + " ohm",
        RuleUnit.Farad => (value * 1e12).ToString("0.00#", C) + " pF",
        _ => Math.Abs(value) >= 1000 ? value.ToString("0", C) : value.ToString("0.0##", C),
    };

    /// <summary>A duration in hours: "9.0 h".</summary>
    public static string Hours(TimeSpan age) => age.TotalHours.ToString("0.0#", C) + " h";

    /// <summary>Any plain number.</summary>
    public static string N(double value) => value.ToString("0.###", C);

    /// <summary>Formats interpolated text with invariant culture.</summary>
    public static string Text(FormattableString text) => text.ToString(C);
}
