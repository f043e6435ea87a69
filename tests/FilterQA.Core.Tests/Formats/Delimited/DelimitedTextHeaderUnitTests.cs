using FilterQA.Core.Sweeps;
using static FilterQA.Core.Tests.Formats.Delimited.DelimitedTestFiles;

namespace FilterQA.Core.Tests.Formats.Delimited;

// The expected hertz values apply the SI prefixes (BIPM SI Brochure, 9th ed., Table 7: kilo 1e3,
// mega 1e6, giga 1e9) to the decimal value in the row, written out by hand. Exact comparison: each
// expected value is an integer number of hertz, exactly representable, and the reader rounds once.
public sealed class DelimitedTextHeaderUnitTests
{
    [Theory]
    [InlineData("Frequency (MHz)", "10.7", 10_700_000.0)]
    [InlineData("Freq [kHz]", "455", 455_000.0)]
    [InlineData("f/GHz", "2.45", 2_450_000_000.0)]
    [InlineData("Frequency Hz", "10700000", 10_700_000.0)]
    [InlineData("Frequency (Hz)", "1.07e7", 10_700_000.0)]
    [InlineData("frequency_mhz", "70", 70_000_000.0)]
    [InlineData("FREQ (GHZ)", "1.5", 1_500_000_000.0)]
    [InlineData("Freq/kHz", "10.7E3", 10_700_000.0)]
    [InlineData("FreqMHz", "0.455", 455_000.0)]
    [InlineData("Frequency in GHz", "0.07", 70_000_000.0)]
    [InlineData("MHz", "21.4", 21_400_000.0)]
    [InlineData("Frequency", "1000", 1000.0)]
    [InlineData("f", "1000", 1000.0)]
    public void Frequency_unit_is_read_from_the_header(string header, string value, double expectedHz)
    {
        Sweep sweep = Read($"{header},S21 dB\n{value},-1\n");

        Assert.Equal(expectedHz, sweep.Grid[0]);
    }

    [Theory]
    [InlineData("S21 dB", ScalarQuantity.GainDb)]
    [InlineData("S21(dB)", ScalarQuantity.GainDb)]
    [InlineData("gain_db", ScalarQuantity.GainDb)]
    [InlineData("dB(S21)", ScalarQuantity.GainDb)]
    [InlineData("Level [dBm]", ScalarQuantity.PowerDbm)]
    [InlineData("power_dbm", ScalarQuantity.PowerDbm)]
    [InlineData("MaxHold dBm", ScalarQuantity.PowerDbm)]
    public void Level_quantity_is_read_from_the_header(string header, ScalarQuantity expected)
    {
        Sweep sweep = Read($"Freq (Hz),{header}\n1,-1\n");

        Assert.Equal(expected, sweep.Scalar!.Quantity);
    }

    [Theory]
    [InlineData("Phase")]
    [InlineData("S21 deg")]
    [InlineData("Angle")]
    [InlineData("S21 (\u00B0)")]
    public void Phase_column_is_found_by_its_words(string header)
    {
        Sweep sweep = Read($"Freq (Hz),S21 dB,{header}\n1,-1,30\n");

        Assert.Equal([30.0], Phase(sweep));
    }

    [Fact]
    public void Phase_column_of_another_S_parameter_is_not_taken_for_the_level_path()
    {
        Sweep sweep = Read("Freq (Hz),S21 dB,S11 deg\n1,-1,30\n");

        Assert.False(sweep.Scalar!.HasPhase);
    }
}
