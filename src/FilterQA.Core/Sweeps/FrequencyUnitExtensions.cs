namespace FilterQA.Core.Sweeps;

/// <summary>Multiplier, decimal exponent and parsing of <see cref="FrequencyUnit"/>.</summary>
public static class FrequencyUnitExtensions
{
    /// <summary>Hertz per one of <paramref name="unit"/>: 1, 1e3, 1e6 or 1e9.</summary>
    /// <exception cref="ArgumentOutOfRangeException">A value that is not a defined unit.</exception>
    public static double HzPerUnit(this FrequencyUnit unit) => unit switch
    {
        FrequencyUnit.Hz => 1.0,
        FrequencyUnit.KHz => 1e3,
        FrequencyUnit.MHz => 1e6,
        FrequencyUnit.GHz => 1e9,
        _ => throw new ArgumentOutOfRangeException(nameof(unit), unit, "frequency unit must be Hz, kHz, MHz or GHz"),
    };

    /// <summary>
    /// The power of ten of <paramref name="unit"/>: 0, 3, 6 or 9. Readers shift a number's decimal
    /// exponent by it, so "10.7" MHz becomes the double nearest 10 700 000 Hz with a single rounding.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">A value that is not a defined unit.</exception>
    public static int DecimalExponent(this FrequencyUnit unit) => unit switch
    {
        FrequencyUnit.Hz => 0,
        FrequencyUnit.KHz => 3,
        FrequencyUnit.MHz => 6,
        FrequencyUnit.GHz => 9,
        _ => throw new ArgumentOutOfRangeException(nameof(unit), unit, "frequency unit must be Hz, kHz, MHz or GHz"),
    };

    /// <summary>The usual spelling: "Hz", "kHz", "MHz" or "GHz".</summary>
    /// <exception cref="ArgumentOutOfRangeException">A value that is not a defined unit.</exception>
    public static string Symbol(this FrequencyUnit unit) => unit switch
    {
        FrequencyUnit.Hz => "Hz",
        FrequencyUnit.KHz => "kHz",
        FrequencyUnit.MHz => "MHz",
        FrequencyUnit.GHz => "GHz",
        _ => throw new ArgumentOutOfRangeException(nameof(unit), unit, "frequency unit must be Hz, kHz, MHz or GHz"),
    };

    /// <summary>
    /// Reads "Hz", "kHz", "MHz" or "GHz", ignoring case and surrounding white space, as Touchstone
    /// does; so "mhz" and "mHz" are megahertz (millihertz never occurs in RF sweep files).
    /// </summary>
    /// <returns>False, with <paramref name="unit"/> = Hz, for any other text (empty included).</returns>
    public static bool TryParse(ReadOnlySpan<char> text, out FrequencyUnit unit)
    {
        ReadOnlySpan<char> t = text.Trim();
        if (t.Equals("hz", StringComparison.OrdinalIgnoreCase))
        {
            unit = FrequencyUnit.Hz;
            return true;
        }
        if (t.Equals("khz", StringComparison.OrdinalIgnoreCase))
        {
            unit = FrequencyUnit.KHz;
            return true;
        }
        if (t.Equals("mhz", StringComparison.OrdinalIgnoreCase))
        {
            unit = FrequencyUnit.MHz;
            return true;
        }
        if (t.Equals("ghz", StringComparison.OrdinalIgnoreCase))
        {
            unit = FrequencyUnit.GHz;
            return true;
        }
        unit = FrequencyUnit.Hz;
        return false;
    }
}
