using System.Globalization;
using System.Text;

namespace FilterQA.Core.Formats.Touchstone;

/// <summary>
/// Writes a double divided by a power of ten by moving the decimal point in its shortest round-trip text, so that
/// reading the text back scaled by the same power of ten (as <see cref="AsciiNumber"/> does) gives the same double.
/// Dividing in floating point instead could lose the last bit.
/// </summary>
internal static class ScaledDecimal
{
    /// <summary>Text of <paramref name="value"/> / 10^<paramref name="pow10"/>, e.g. 1.5e9 with 9 gives "1.5".</summary>
    public static string Format(double value, int pow10)
    {
        string shortest = value.ToString("R", CultureInfo.InvariantCulture);
        if (pow10 == 0)
        {
            return shortest;
        }
        bool negative = shortest.StartsWith('-');
        string body = negative ? shortest[1..] : shortest;
        int e = body.IndexOfAny(['E', 'e']);
        int exponent = e < 0 ? 0 : int.Parse(body.AsSpan(e + 1), NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture);
        string mantissa = e < 0 ? body : body[..e];
        int point = mantissa.IndexOf('.', StringComparison.Ordinal);
        string digits = point < 0 ? mantissa : mantissa.Remove(point, 1);
        int pointAt = point < 0 ? mantissa.Length : point;

        // value = 0.d1d2d3... × 10^decimalExponent
        int leading = 0;
        while (leading < digits.Length && digits[leading] == '0')
        {
            leading++;
        }
        digits = digits[leading..].TrimEnd('0');
        if (digits.Length == 0)
        {
            return negative ? "-0" : "0";
        }
        int decimalExponent = pointAt - leading + exponent - pow10;

        var text = new StringBuilder(digits.Length + 8);
        if (negative)
        {
            text.Append('-');
        }
        if (decimalExponent > 0 && decimalExponent <= 21)
        {
            if (digits.Length <= decimalExponent)
            {
                text.Append(digits).Append('0', decimalExponent - digits.Length);
            }
            else
            {
                text.Append(digits, 0, decimalExponent).Append('.').Append(digits, decimalExponent, digits.Length - decimalExponent);
            }
        }
        else if (decimalExponent <= 0 && decimalExponent > -6)
        {
            text.Append("0.").Append('0', -decimalExponent).Append(digits);
        }
        else
        {
            text.Append(digits[0]);
            if (digits.Length > 1)
            {
                text.Append('.').Append(digits, 1, digits.Length - 1);
            }
            text.Append('E').Append((decimalExponent - 1).ToString(CultureInfo.InvariantCulture));
        }
        return text.ToString();
    }
}
