using System.Globalization;

namespace FilterQA.Core.Formats.Touchstone;

/// <summary>
/// Parses a decimal number written in ASCII bytes, giving exactly what <see cref="double.Parse(string, IFormatProvider)"/>
/// gives for the same text in the invariant culture, but without making a string.
/// </summary>
/// <remarks>
/// Grammar: <c>[+|-] digits [. digits] [(e|E) [+|-] digits]</c> with at least one mantissa digit
/// (".5" and "5." are numbers). Clinger's fast path: when at most 19 significant digits hold a
/// mantissa m ≤ 2^53 and the decimal exponent e satisfies |e| ≤ 22, both m and 10^|e| are exact
/// doubles, so the one IEEE multiply or divide m·10^e is correctly rounded and equals the parse of
/// the text. Every other case falls back to the runtime's own parser on the same bytes.
/// </remarks>
internal static class AsciiNumber
{
    /// <summary>Largest mantissa that is exactly representable: 2^53.</summary>
    private const ulong MaxExactMantissa = 1UL << 53;

    /// <summary>Beyond this the exponent is only counted, never used exactly (the value is 0 or infinite anyway).</summary>
    private const int ExponentCap = 1_000_000;

    private static readonly double[] PowersOfTen =
    [
        1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11,
        1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22,
    ];

    /// <summary>
    /// Parses the number that starts at <paramref name="text"/>[0], multiplied by 10^<paramref name="scalePow10"/>
    /// exactly (the scaling is applied to the decimal exponent, so "1.5" scaled by 9 is the double nearest 1.5e9).
    /// </summary>
    /// <param name="text">Bytes starting at the first character of the number; parsing stops at the first byte that cannot continue it.</param>
    /// <param name="scalePow10">Power of ten to scale by, 0 for none.</param>
    /// <param name="value">The parsed value; may be infinite when the text overflows a double.</param>
    /// <param name="consumed">Number of bytes that form the number.</param>
    /// <returns>False when the bytes do not start with a number of the grammar above.</returns>
    public static bool TryParsePrefix(ReadOnlySpan<byte> text, int scalePow10, out double value, out int consumed)
    {
        int i = 0;
        int length = text.Length;
        bool negative = false;
        if (i < length && (text[i] == (byte)'-' || text[i] == (byte)'+'))
        {
            negative = text[i] == (byte)'-';
            i++;
        }

        ulong mantissa = 0;
        int significantDigits = 0;
        int exponent = 0;
        bool anyDigit = false;
        bool droppedNonZero = false;

        while (i < length)
        {
            uint digit = (uint)(text[i] - '0');
            if (digit > 9)
            {
                break;
            }
            anyDigit = true;
            if (significantDigits < 19)
            {
                if (mantissa != 0 || digit != 0)
                {
                    mantissa = mantissa * 10 + digit;
                    significantDigits++;
                }
            }
            else
            {
                exponent++;
                droppedNonZero |= digit != 0;
            }
            i++;
        }

        if (i < length && text[i] == (byte)'.')
        {
            i++;
            while (i < length)
            {
                uint digit = (uint)(text[i] - '0');
                if (digit > 9)
                {
                    break;
                }
                anyDigit = true;
                if (significantDigits < 19)
                {
                    if (mantissa != 0 || digit != 0)
                    {
                        mantissa = mantissa * 10 + digit;
                        significantDigits++;
                    }
                    exponent--;
                }
                else
                {
                    droppedNonZero |= digit != 0;
                }
                i++;
            }
        }

        if (!anyDigit)
        {
            value = 0;
            consumed = 0;
            return false;
        }

        int mantissaEnd = i;
        int writtenExponent = 0;
        if (i < length && (text[i] | 0x20) == (byte)'e')
        {
            int j = i + 1;
            bool exponentNegative = false;
            if (j < length && (text[j] == (byte)'-' || text[j] == (byte)'+'))
            {
                exponentNegative = text[j] == (byte)'-';
                j++;
            }
            int start = j;
            while (j < length)
            {
                uint digit = (uint)(text[j] - '0');
                if (digit > 9)
                {
                    break;
                }
                if (writtenExponent < ExponentCap)
                {
                    writtenExponent = writtenExponent * 10 + (int)digit;
                }
                j++;
            }
            if (j == start)
            {
                // "1e" or "1e+" is not a number: report it rather than stop before the 'e'.
                value = 0;
                consumed = 0;
                return false;
            }
            if (exponentNegative)
            {
                writtenExponent = -writtenExponent;
            }
            i = j;
        }

        consumed = i;
        if (mantissa == 0)
        {
            // Every digit was zero: the value is a signed zero whatever the exponent says.
            value = negative ? -0.0 : 0.0;
            return true;
        }

        int totalExponent = exponent + writtenExponent + scalePow10;
        if (!droppedNonZero && mantissa <= MaxExactMantissa && totalExponent >= -22 && totalExponent <= 22)
        {
            double m = mantissa;
            double result = totalExponent >= 0 ? m * PowersOfTen[totalExponent] : m / PowersOfTen[-totalExponent];
            value = negative ? -result : result;
            return true;
        }

        value = Fallback(text[..i], text[..mantissaEnd], writtenExponent, scalePow10);
        return true;
    }

    /// <summary>Parses a whole token; false unless every byte belongs to the number.</summary>
    public static bool TryParse(ReadOnlySpan<byte> token, out double value)
    {
        return TryParsePrefix(token, 0, out value, out int consumed) && consumed == token.Length;
    }

    private static double Fallback(ReadOnlySpan<byte> whole, ReadOnlySpan<byte> mantissaText, int writtenExponent, int scalePow10)
    {
        if (scalePow10 == 0)
        {
            return double.Parse(whole, NumberStyles.Float, CultureInfo.InvariantCulture);
        }
        // Rewrite the number with its exponent shifted, so the runtime rounds the scaled value once.
        long shifted = (long)writtenExponent + scalePow10;
        Span<byte> buffer = mantissaText.Length <= 256 ? stackalloc byte[mantissaText.Length + 24] : new byte[mantissaText.Length + 24];
        mantissaText.CopyTo(buffer);
        int at = mantissaText.Length;
        buffer[at++] = (byte)'E';
        shifted.TryFormat(buffer[at..], out int written, default, CultureInfo.InvariantCulture);
        at += written;
        return double.Parse(buffer[..at], NumberStyles.Float, CultureInfo.InvariantCulture);
    }
}
