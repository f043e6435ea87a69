using System.Globalization;

namespace FilterQA.Core.Formats.Delimited;

/// <summary>
/// Reads one decimal number of a delimited file: optional sign, digits with at most one decimal mark,
/// optional exponent. Nothing else (no thousands separators, no hex, no inner spaces) so that a
/// misread column is an error, not a quietly wrong value.
/// </summary>
internal static class DelimitedNumber
{
    // Exponents beyond this already overflow or underflow a double; saturating keeps the text short.
    private const int ExponentLimit = 100_000;

    /// <summary>
    /// Parses <paramref name="cell"/> (white space around it ignored) and multiplies it by
    /// 10^<paramref name="decimalShift"/> by shifting the decimal exponent, so the result is the double
    /// nearest the decimal value with one rounding (10.7 MHz is exactly 10 700 000 Hz).
    /// </summary>
    public static DelimitedNumberStatus TryParse(ReadOnlySpan<char> cell, bool allowDecimalComma, int decimalShift, out double value)
    {
        value = 0;
        ReadOnlySpan<char> t = cell.Trim();
        if (t.IsEmpty)
        {
            return DelimitedNumberStatus.Empty;
        }
        if (IsNotFiniteSpelling(t))
        {
            return DelimitedNumberStatus.NotFinite;
        }

        Span<char> buffer = t.Length <= 200 ? stackalloc char[t.Length + 16] : new char[t.Length + 16];
        int written = 0;
        int i = 0;
        if (t[i] is '+' or '-')
        {
            buffer[written++] = t[i++];
        }
        int digits = 0;
        while (i < t.Length && char.IsAsciiDigit(t[i]))
        {
            buffer[written++] = t[i++];
            digits++;
        }
        if (i < t.Length && t[i] is '.' or ',')
        {
            if (t[i] == ',' && !allowDecimalComma)
            {
                return DelimitedNumberStatus.DecimalCommaNotAllowed;
            }
            buffer[written++] = '.';
            i++;
            while (i < t.Length && char.IsAsciiDigit(t[i]))
            {
                buffer[written++] = t[i++];
                digits++;
            }
        }
        if (digits == 0)
        {
            return DelimitedNumberStatus.NotNumber;
        }
        long exponent = 0;
        if (i < t.Length && t[i] is 'e' or 'E')
        {
            i++;
            bool negative = false;
            if (i < t.Length && t[i] is '+' or '-')
            {
                negative = t[i] == '-';
                i++;
            }
            int exponentDigits = 0;
            while (i < t.Length && char.IsAsciiDigit(t[i]))
            {
                exponent = Math.Min(exponent * 10 + (t[i] - '0'), ExponentLimit);
                i++;
                exponentDigits++;
            }
            if (exponentDigits == 0)
            {
                return DelimitedNumberStatus.NotNumber;
            }
            exponent = negative ? -exponent : exponent;
        }
        if (i != t.Length)
        {
            return i < t.Length && t[i] == ',' && !allowDecimalComma
                ? DelimitedNumberStatus.DecimalCommaNotAllowed
                : DelimitedNumberStatus.NotNumber;
        }
        exponent += decimalShift;
        if (exponent != 0)
        {
            buffer[written++] = 'e';
            exponent.TryFormat(buffer[written..], out int exponentChars, default, CultureInfo.InvariantCulture);
            written += exponentChars;
        }
        if (!double.TryParse(buffer[..written], NumberStyles.Float, CultureInfo.InvariantCulture, out value))
        {
            return DelimitedNumberStatus.NotNumber;
        }
        return double.IsFinite(value) ? DelimitedNumberStatus.Ok : DelimitedNumberStatus.Overflow;
    }

    /// <summary>
    /// True when the cell reads as a number or as a NaN/infinity spelling: such a row is data, not a
    /// header (so a NaN in the first row is reported as a NaN rather than taken for a header).
    /// </summary>
    public static bool LooksNumeric(ReadOnlySpan<char> cell)
    {
        ReadOnlySpan<char> t = cell.Trim();
        if (t.IsEmpty)
        {
            return false;
        }
        if (IsNotFiniteSpelling(t))
        {
            return true;
        }
        bool digit = false;
        foreach (char c in t)
        {
            if (char.IsAsciiDigit(c))
            {
                digit = true;
            }
            else if (c is not ('+' or '-' or '.' or ',' or 'e' or 'E'))
            {
                return false;
            }
        }
        return digit;
    }

    private static bool IsNotFiniteSpelling(ReadOnlySpan<char> t)
    {
        ReadOnlySpan<char> u = t[0] is '+' or '-' ? t[1..] : t;
        return u.Equals("nan", StringComparison.OrdinalIgnoreCase)
            || u.Equals("inf", StringComparison.OrdinalIgnoreCase)
            || u.Equals("infinity", StringComparison.OrdinalIgnoreCase)
            || u.Equals("\u221E", StringComparison.Ordinal)
            || u.StartsWith("1.#", StringComparison.Ordinal);
    }
}
