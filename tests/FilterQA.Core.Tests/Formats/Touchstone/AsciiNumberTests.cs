using System.Globalization;
using System.Text;
using FilterQA.Core.Formats.Touchstone;

namespace FilterQA.Core.Tests.Formats.Touchstone;

/// <summary>
/// The reader's own number parser against the reference: the runtime's double.Parse in the invariant culture.
/// Every check is bit for bit (tolerance 0), since the fast path is exact by construction (Clinger 1990,
/// "How to read floating point numbers accurately": m·10^e with m ≤ 2^53, |e| ≤ 22 is one correctly rounded operation).
/// </summary>
public sealed class AsciiNumberTests
{
    public static TheoryData<string> EdgeCases() => new()
    {
        "0", "-0", "+0", "0.0", "-0.0", ".5", "5.", "-.5", "+5.", "1", "-1", "9007199254740992", "9007199254740993",
        "9007199254740991", "1e22", "1e23", "1e-22", "1e-23", "123456789012345678", "1234567890123456789", "12345678901234567890",
        "0.1", "0.2", "0.3", "2.2250738585072014e-308", "2.2250738585072011e-308", "4.9406564584124654e-324", "1e-400",
        "1.7976931348623157e308", "1.7976931348623158e308", "0.000000000000000000000000000001", "1000000000000000000000000",
        "-12.345678", "1.000000000E+09", "1.000000e+09", "-0.0012345", "179.99999", "-179.99999", "3.14159265358979323846264338327950288",
        "00000000000000000000001.5", "1.50000000000000000000000000", "0.000000000000000000000000000000000000000001e40",
        "7.038531e-26", "8.9255e-15", "1E+0", "1e-0", "1e+00022", "123.456e-3", "9999999999999999999", "99999999999999999999e-20",
        "1.00000000000000011102230246251565404236316680908203125", "1.00000000000000011102230246251565404236316680908203124",
    };

    [Theory]
    [MemberData(nameof(EdgeCases))]
    public void Edge_inputs_parse_bit_for_bit_like_double_Parse(string text)
    {
        // Reference: double.Parse, invariant culture (the runtime's correctly rounded parser).
        double expected = double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);

        Assert.True(AsciiNumber.TryParse(Encoding.ASCII.GetBytes(text), out double actual));
        Assert.Equal(BitConverter.DoubleToInt64Bits(expected), BitConverter.DoubleToInt64Bits(actual));
    }

    [Fact]
    public void Random_inputs_parse_bit_for_bit_like_double_Parse()
    {
        var random = new Random(20240611);
        for (int i = 0; i < 200_000; i++)
        {
            string text = RandomNumberText(random);
            // Reference: double.Parse, invariant culture.
            double expected = double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);
            Assert.True(AsciiNumber.TryParse(Encoding.ASCII.GetBytes(text), out double actual), text);
            if (BitConverter.DoubleToInt64Bits(expected) != BitConverter.DoubleToInt64Bits(actual))
            {
                Assert.Fail($"'{text}': double.Parse gives {expected:R}, the fast parser {actual:R}");
            }
        }
    }

    [Fact]
    public void Random_doubles_written_round_trip_parse_bit_for_bit()
    {
        var random = new Random(7);
        for (int i = 0; i < 100_000; i++)
        {
            double value = BitConverter.Int64BitsToDouble(random.NextInt64());
            if (!double.IsFinite(value))
            {
                continue;
            }
            foreach (string format in new[] { "R", "E6", "G7", "F4" })
            {
                string text = value.ToString(format, CultureInfo.InvariantCulture);
                if (text.Length > 400)
                {
                    continue;
                }
                double expected = double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);
                Assert.True(AsciiNumber.TryParse(Encoding.ASCII.GetBytes(text), out double actual), text);
                Assert.Equal(BitConverter.DoubleToInt64Bits(expected), BitConverter.DoubleToInt64Bits(actual));
            }
        }
    }

    [Fact]
    public void Scaling_by_a_power_of_ten_equals_parsing_the_shifted_text()
    {
        // "1.5" scaled by 9 must be the double nearest 1.5e9, i.e. double.Parse("1.5e9"): reference double.Parse.
        var random = new Random(99);
        for (int i = 0; i < 50_000; i++)
        {
            string mantissa = RandomMantissa(random);
            int scale = random.Next(4) * 3;
            int exponent = random.Next(-30, 30);
            string text = mantissa + "e" + exponent.ToString(CultureInfo.InvariantCulture);
            string shifted = mantissa + "e" + (exponent + scale).ToString(CultureInfo.InvariantCulture);
            double expected = double.Parse(shifted, NumberStyles.Float, CultureInfo.InvariantCulture);
            Assert.True(AsciiNumber.TryParsePrefix(Encoding.ASCII.GetBytes(text), scale, out double actual, out _));
            Assert.Equal(BitConverter.DoubleToInt64Bits(expected), BitConverter.DoubleToInt64Bits(actual));
        }
    }

    [Theory]
    [InlineData("")]
    [InlineData("-")]
    [InlineData("+")]
    [InlineData(".")]
    [InlineData("e5")]
    [InlineData("1e")]
    [InlineData("1e+")]
    [InlineData("1,5")]
    [InlineData("1.0D+03")]
    [InlineData("NaN")]
    [InlineData("Infinity")]
    [InlineData("--1")]
    [InlineData("1.2.3")]
    [InlineData("0x10")]
    public void Non_numbers_are_refused(string text)
    {
        Assert.False(AsciiNumber.TryParse(Encoding.ASCII.GetBytes(text), out _));
    }

    private static string RandomNumberText(Random random)
    {
        var text = new StringBuilder();
        int sign = random.Next(3);
        if (sign == 1)
        {
            text.Append('-');
        }
        else if (sign == 2)
        {
            text.Append('+');
        }
        text.Append(RandomMantissa(random));
        if (random.Next(2) == 0)
        {
            text.Append(random.Next(2) == 0 ? 'e' : 'E');
            int exponentKind = random.Next(4);
            int exponent = exponentKind switch
            {
                0 => random.Next(-22, 23),
                1 => random.Next(-30, 31),
                2 => random.Next(-330, 320),
                _ => random.Next(-5, 6),
            };
            if (exponent >= 0 && random.Next(3) == 0)
            {
                text.Append('+');
            }
            text.Append(exponent.ToString(CultureInfo.InvariantCulture));
        }
        return text.ToString();
    }

    private static string RandomMantissa(Random random)
    {
        var text = new StringBuilder();
        int integerDigits = random.Next(4) == 0 ? random.Next(0, 25) : random.Next(0, 8);
        int fractionDigits = random.Next(4) == 0 ? random.Next(0, 25) : random.Next(0, 9);
        if (integerDigits == 0 && fractionDigits == 0)
        {
            integerDigits = 1;
        }
        for (int i = 0; i < integerDigits; i++)
        {
            text.Append((char)('0' + random.Next(10)));
        }
        if (fractionDigits > 0 || random.Next(5) == 0)
        {
            text.Append('.');
            for (int i = 0; i < fractionDigits; i++)
            {
                text.Append((char)('0' + random.Next(10)));
            }
        }
        if (integerDigits == 0 && fractionDigits == 0)
        {
            text.Append('0');
        }
        return text.ToString();
    }
}
