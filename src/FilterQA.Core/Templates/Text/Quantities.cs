using System.Globalization;
using System.Text.RegularExpressions;

namespace FilterQA.Core.Templates.Text;

/// <summary>
/// The quantity syntax of the text format: a number in invariant culture (point as decimal separator,
/// optional sign and exponent), optional blanks, then a case-sensitive unit symbol, e.g. "455 kHz",
/// "-100 kHz", "21.4 MHz", "20 ppm", "60 ns", "5 pF", "8 h". Numbers are scaled in decimal arithmetic and
/// converted to double once, so "21.4 MHz" is exactly the double nearest 21 400 000. Writing picks the
/// unit that gives a number of 1 to 999 (for durations: h or min when the value is a whole multiple) and
/// the shortest digits that read back to the same double.
/// </summary>
internal static partial class Quantities
{
    private static readonly Dictionary<QuantityKind, (string Symbol, decimal Scale)[]> Units = new()
    {
        [QuantityKind.Frequency] = [("GHz", 1e9m), ("MHz", 1e6m), ("kHz", 1e3m), ("Hz", 1m)],
        [QuantityKind.Level] = [("dB", 1m)],
        [QuantityKind.Time] = [("s", 1m), ("ms", 1e-3m), ("us", 1e-6m), ("ns", 1e-9m), ("ps", 1e-12m)],
        [QuantityKind.Duration] = [("h", 3600m), ("min", 60m), ("s", 1m)],
        [QuantityKind.Resistance] = [("Mohm", 1e6m), ("kohm", 1e3m), ("ohm", 1m), ("mohm", 1e-3m)],
        [QuantityKind.Capacitance] = [("F", 1m), ("uF", 1e-6m), ("nF", 1e-9m), ("pF", 1e-12m), ("fF", 1e-15m)],
        [QuantityKind.Number] = [],
    };

    /// <summary>Other spellings accepted on reading (never written).</summary>
    private static readonly Dictionary<string, string> Aliases = new(StringComparer.Ordinal)
    {
        ["µs"] = "us", ["μs"] = "us", ["µF"] = "uF", ["μF"] = "uF",
        ["Ω"] = "ohm", ["kΩ"] = "kohm", ["MΩ"] = "Mohm", ["mΩ"] = "mohm",
    };

    /// <summary>The unit symbols a kind accepts, for messages and the published schema.</summary>
    internal static IReadOnlyList<string> SymbolsOf(QuantityKind kind) => Units[kind].Select(unit => unit.Symbol).ToArray();

    /// <summary>Reads a quantity; on failure <paramref name="error"/> says what was wrong and what was expected.</summary>
    /// <param name="text">The text, e.g. "455 kHz".</param>
    /// <param name="kind">What it measures.</param>
    /// <param name="value">The value in SI units (Hz, dB, s, Ω, F, or the plain number).</param>
    /// <param name="isPpm">True when the text was a valid number in ppm (then the method returns false: ppm is not a unit of <paramref name="kind"/>).</param>
    /// <param name="error">The problem, or null.</param>
    internal static bool TryRead(string text, QuantityKind kind, out double value, out bool isPpm, out string? error)
    {
        value = double.NaN;
        isPpm = false;
        if (!TrySplit(text, kind, out string numberText, out decimal number, out string unit, out error))
        {
            return false;
        }
        if (unit == "ppm")
        {
            isPpm = true;
            error = $"'{text}' is in ppm, a relative unit; ppm is accepted only for a frequency tolerance and its uncertainty";
            return false;
        }
        if (kind == QuantityKind.Number)
        {
            if (unit.Length > 0)
            {
                error = $"'{text}' must be a plain number without unit";
                return false;
            }
            return ToDouble(numberText, number, 1m, text, out value, out error);
        }
        if (Aliases.TryGetValue(unit, out string? canonical))
        {
            unit = canonical;
        }
        (string Symbol, decimal Scale)[] units = Units[kind];
        string allowed = string.Join(", ", units.Select(u => u.Symbol));
        if (unit.Length == 0)
        {
            error = $"'{text}' has no unit; write it with one of: {allowed} (e.g. '{Example(kind)}')";
            return false;
        }
        foreach ((string symbol, decimal scale) in units)
        {
            if (symbol == unit)
            {
                return ToDouble(numberText, number, scale, text, out value, out error);
            }
        }
        string? sameLetters = units.Select(u => u.Symbol).FirstOrDefault(s => string.Equals(s, unit, StringComparison.OrdinalIgnoreCase));
        error = sameLetters is null
            ? $"'{unit}' in '{text}' is not a unit for this field; expected one of: {allowed}"
            : $"'{unit}' in '{text}' is not a unit for this field (units are case-sensitive): did you mean '{sameLetters}'? Expected one of: {allowed}";
        return false;
    }

    /// <summary>Reads a frequency tolerance: a frequency (Hz, kHz, MHz, GHz) or a number in ppm.</summary>
    internal static bool TryReadTolerance(string text, out double value, out ToleranceUnit unit, out string? error)
    {
        unit = ToleranceUnit.Hertz;
        if (TrySplit(text, QuantityKind.Frequency, out string numberText, out decimal number, out string symbol, out error) && symbol == "ppm")
        {
            unit = ToleranceUnit.PartsPerMillion;
            return ToDouble(numberText, number, 1m, text, out value, out error);
        }
        if (TryRead(text, QuantityKind.Frequency, out value, out _, out error))
        {
            return true;
        }
        error += "; a tolerance may also be written in ppm (e.g. '20 ppm')";
        return false;
    }

    /// <summary>Writes an SI value with the unit that reads best (see the class summary).</summary>
    internal static string Write(double value, QuantityKind kind)
    {
        string baseSymbol = kind == QuantityKind.Number ? "" : Units[kind].First(unit => unit.Scale == 1m).Symbol;
        if (!TryExact(value, out decimal exact))
        {
            // Beyond what a decimal holds exactly (far outside any real limit): the shortest round-trip
            // digits in the base unit, which the reader parses without scaling.
            return Join(value.ToString("R", CultureInfo.InvariantCulture), baseSymbol);
        }
        if (kind == QuantityKind.Number)
        {
            return Plain(exact);
        }
        decimal magnitude = Math.Abs(exact);
        foreach ((string symbol, decimal scale) in Units[kind])
        {
            if (magnitude >= scale && ScalesExactly(exact, scale, value, out decimal scaled))
            {
                return Join(Plain(scaled), symbol);
            }
        }
        return Join(Plain(exact), baseSymbol);
    }

    private static bool IsDecimalPowerOfTen(decimal scale)
    {
        string digits = scale.ToString(CultureInfo.InvariantCulture).Replace(".", "", StringComparison.Ordinal).Trim('0');
        return digits == "1";
    }

    private static string Join(string number, string symbol) => symbol.Length == 0 ? number : number + " " + symbol;

    /// <summary>True when exact / scale, read back with the scale, gives the same double.</summary>
    private static bool ScalesExactly(decimal exact, decimal scale, double value, out decimal scaled)
    {
        scaled = exact / scale;
        // Division by a power of ten is exact in decimal; by 60 or 3600 it is exact only for a short quotient
        // (a long one, like 16.666... min, is rounded and must not be written).
        bool powerOfTen = IsDecimalPowerOfTen(scale);
        return (powerOfTen || decimal.Round(scaled, 9) == scaled)
            && scaled * scale == exact
            && ToDouble(Plain(scaled), decimal.Parse(Plain(scaled), NumberStyles.Float, CultureInfo.InvariantCulture), scale, "", out double back, out _)
            && back.Equals(value);
    }

    /// <summary>Writes a tolerance: ppm as "20 ppm", hertz like any frequency.</summary>
    internal static string WriteTolerance(double value, ToleranceUnit unit) =>
        unit == ToleranceUnit.PartsPerMillion ? Write(value, QuantityKind.Number) + " ppm" : Write(value, QuantityKind.Frequency);

    private static bool TrySplit(string text, QuantityKind kind, out string numberText, out decimal number, out string unit, out string? error)
    {
        number = 0;
        numberText = "";
        unit = "";
        Match match = QuantityPattern().Match(text);
        if (!match.Success)
        {
            error = DecimalComma().IsMatch(text)
                ? $"'{text}' uses a comma; write the decimal separator as a point and no thousands separators (e.g. '{Example(kind)}')"
                : $"'{text}' is not a quantity; expected a number and a unit, e.g. '{Example(kind)}'";
            return false;
        }
        numberText = match.Groups["number"].Value;
        try
        {
            number = decimal.Parse(numberText, NumberStyles.Float, CultureInfo.InvariantCulture);
        }
        catch (OverflowException)
        {
            error = $"'{text}' is too large a number";
            return false;
        }
        unit = match.Groups["unit"].Value;
        error = null;
        return true;
    }

    private static bool ToDouble(string numberText, decimal number, decimal scale, string text, out double value, out string? error)
    {
        try
        {
            // Unscaled text is parsed as written; scaled text is scaled exactly in decimal and parsed once,
            // so either way the double is the one nearest the written value.
            string exactText = scale == 1m ? numberText : (number * scale).ToString(CultureInfo.InvariantCulture);
            value = double.Parse(exactText, NumberStyles.Float, CultureInfo.InvariantCulture);
            if (!double.IsFinite(value))
            {
                error = $"'{text}' is too large a number";
                return false;
            }
            error = null;
            return true;
        }
        catch (OverflowException)
        {
            value = double.NaN;
            error = $"'{text}' is too large a number";
            return false;
        }
    }

    private static bool TryExact(double value, out decimal exact)
    {
        if (!double.IsFinite(value))
        {
            throw new ArgumentException(Checks.Say($"cannot write {value} as a quantity; values must be finite"));
        }
        // The shortest round-trip text, read as a decimal, is exact when it fits; scaling by powers of ten stays exact.
        string shortest = value.ToString("R", CultureInfo.InvariantCulture);
        try
        {
            exact = decimal.Parse(shortest, NumberStyles.Float, CultureInfo.InvariantCulture);
        }
        catch (OverflowException)
        {
            exact = 0;
            return false;
        }
        return double.Parse(Plain(exact), NumberStyles.Float, CultureInfo.InvariantCulture).Equals(value);
    }

    private static string Plain(decimal value)
    {
        string text = value.ToString(CultureInfo.InvariantCulture);
        if (text.Contains('.', StringComparison.Ordinal))
        {
            text = text.TrimEnd('0').TrimEnd('.');
        }
        return text == "-0" ? "0" : text;
    }

    private static string Example(QuantityKind kind) => kind switch
    {
        QuantityKind.Frequency => "455 kHz",
        QuantityKind.Level => "6 dB",
        QuantityKind.Time => "60 ns",
        QuantityKind.Duration => "8 h",
        QuantityKind.Resistance => "40 ohm",
        QuantityKind.Capacitance => "5 pF",
        _ => "30000",
    };

    [GeneratedRegex(@"^\s*(?<number>[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*(?<unit>[^\s\d.,+-][^\s]*)?\s*$", RegexOptions.CultureInvariant)]
    private static partial Regex QuantityPattern();

    [GeneratedRegex(@"\d,\d", RegexOptions.CultureInvariant)]
    private static partial Regex DecimalComma();
}
