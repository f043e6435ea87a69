using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Text;

namespace FilterQA.Core.Tests.Templates;

/// <summary>
/// The quantity syntax. Scale factors are the SI prefixes (BIPM, The International System of Units, 9th edition,
/// 2019, table 7: k = 1e3, M = 1e6, G = 1e9, m = 1e-3, µ = 1e-6, n = 1e-9, p = 1e-12, f = 1e-15) and 1 h = 3600 s,
/// 1 min = 60 s (same brochure, table 8).
/// </summary>
public sealed class QuantityTests
{
    // Expected values are compared exactly: the reader scales in decimal and converts once, so the result is the
    // double nearest the decimal value, and the C# literal on the right is that same double.
    [Theory]
    [InlineData("455 kHz", QuantityKind.Frequency, 455e3)]
    [InlineData("455kHz", QuantityKind.Frequency, 455e3)]
    [InlineData("21.4 MHz", QuantityKind.Frequency, 21.4e6)]
    [InlineData("-100 kHz", QuantityKind.Frequency, -100e3)]
    [InlineData("+2.5e3 Hz", QuantityKind.Frequency, 2.5e3)]
    [InlineData("0.455 MHz", QuantityKind.Frequency, 455e3)]
    [InlineData("1.5 GHz", QuantityKind.Frequency, 1.5e9)]
    [InlineData(".5 Hz", QuantityKind.Frequency, 0.5)]
    [InlineData("6 dB", QuantityKind.Level, 6)]
    [InlineData("0.15 dB", QuantityKind.Level, 0.15)]
    [InlineData("60 ns", QuantityKind.Time, 60e-9)]
    [InlineData("1.2 us", QuantityKind.Time, 1.2e-6)]
    [InlineData("1.2 µs", QuantityKind.Time, 1.2e-6)]
    [InlineData("8 h", QuantityKind.Duration, 28800)]
    [InlineData("90 min", QuantityKind.Duration, 5400)]
    [InlineData("40 ohm", QuantityKind.Resistance, 40)]
    [InlineData("1.5 kΩ", QuantityKind.Resistance, 1500)]
    [InlineData("5 pF", QuantityKind.Capacitance, 5e-12)]
    [InlineData("20 fF", QuantityKind.Capacitance, 20e-15)]
    [InlineData("30000", QuantityKind.Number, 30000)]
    public void Reads_a_quantity_to_SI(string text, object kindValue, double expected)
    {
        var kind = (QuantityKind)kindValue;
        Assert.True(Quantities.TryRead(text, kind, out double value, out _, out string? error), error);
        Assert.Equal(expected, value);
    }

    [Theory]
    [InlineData("455", QuantityKind.Frequency, "has no unit")]
    [InlineData("455 khz", QuantityKind.Frequency, "did you mean 'kHz'")]
    [InlineData("455 kg", QuantityKind.Frequency, "is not a unit for this field")]
    [InlineData("1,5 kHz", QuantityKind.Frequency, "uses a comma")]
    [InlineData("fast", QuantityKind.Frequency, "is not a quantity")]
    [InlineData("20 ppm", QuantityKind.Frequency, "ppm is accepted only for a frequency tolerance")]
    [InlineData("6", QuantityKind.Level, "has no unit")]
    [InlineData("30000 dB", QuantityKind.Number, "plain number")]
    [InlineData("1e99999 Hz", QuantityKind.Frequency, "too large")]
    public void Rejects_a_bad_quantity_with_a_reason(string text, object kindValue, string phrase)
    {
        var kind = (QuantityKind)kindValue;
        Assert.False(Quantities.TryRead(text, kind, out _, out _, out string? error));
        Assert.Contains(phrase, error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(455e3, QuantityKind.Frequency, "455 kHz")]
    [InlineData(-100e3, QuantityKind.Frequency, "-100 kHz")]
    [InlineData(21.4e6, QuantityKind.Frequency, "21.4 MHz")]
    [InlineData(0, QuantityKind.Frequency, "0 Hz")]
    [InlineData(125, QuantityKind.Frequency, "125 Hz")]
    [InlineData(60e-9, QuantityKind.Time, "60 ns")]
    [InlineData(28800, QuantityKind.Duration, "8 h")]
    [InlineData(5400, QuantityKind.Duration, "1.5 h")]
    [InlineData(1000, QuantityKind.Duration, "1000 s")]
    [InlineData(5e-12, QuantityKind.Capacitance, "5 pF")]
    [InlineData(0.8, QuantityKind.Level, "0.8 dB")]
    public void Writes_with_a_readable_unit(double value, object kindValue, string expected)
    {
        var kind = (QuantityKind)kindValue;
        Assert.Equal(expected, Quantities.Write(value, kind));
    }

    [Fact]
    public void Every_written_value_reads_back_to_the_same_double()
    {
        // 10 000 values spread over 30 decades of both signs; a fixed seed keeps the test repeatable.
        var random = new Random(20251020);
        for (int i = 0; i < 10_000; i++)
        {
            double value = (random.NextDouble() - 0.5) * Math.Pow(10, random.Next(-12, 12));
            foreach (QuantityKind kind in new[] { QuantityKind.Frequency, QuantityKind.Time, QuantityKind.Capacitance, QuantityKind.Level })
            {
                string text = Quantities.Write(value, kind);
                Assert.True(Quantities.TryRead(text, kind, out double back, out _, out string? error), error);
                Assert.Equal(value, back);
            }
        }
    }

    [Fact]
    public void Tolerance_reads_ppm_or_hertz()
    {
        Assert.True(Quantities.TryReadTolerance("20 ppm", out double ppm, out ToleranceUnit ppmUnit, out _));
        Assert.True(Quantities.TryReadTolerance("1.5 kHz", out double hz, out ToleranceUnit hzUnit, out _));
        Assert.False(Quantities.TryReadTolerance("20 pmm", out _, out _, out string? error));

        Assert.Equal((20.0, ToleranceUnit.PartsPerMillion), (ppm, ppmUnit));
        Assert.Equal((1500.0, ToleranceUnit.Hertz), (hz, hzUnit));
        Assert.Contains("ppm", error, StringComparison.Ordinal);
    }
}
