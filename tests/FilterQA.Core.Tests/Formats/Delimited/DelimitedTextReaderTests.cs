using System.Security.Cryptography;
using FilterQA.Core.Formats;
using FilterQA.Core.Formats.Delimited;
using FilterQA.Core.Sweeps;
using static FilterQA.Core.Tests.Formats.Delimited.DelimitedTestFiles;

namespace FilterQA.Core.Tests.Formats.Delimited;

// Expected numbers here are the decimal values written in the test text itself, converted with the
// SI prefixes (BIPM SI Brochure, 9th ed., Table 7: k = 1e3, M = 1e6, G = 1e9). Values are compared
// exactly: the reader promises the double nearest the decimal value, and each expected literal is that double.
public sealed class DelimitedTextReaderTests
{
    [Fact]
    public void Comma_file_with_header_gives_a_gain_trace_in_hertz()
    {
        Sweep sweep = Read("Frequency (MHz),S21 (dB)\n10.6,-30.5\n10.7,-2.25\n10.8,-31\n");

        Assert.Equal(SweepFormat.DelimitedText, sweep.Source.Format);
        Assert.Equal(FileName, sweep.Source.FileName);
        Assert.Equal(ScalarQuantity.GainDb, sweep.Scalar!.Quantity);
        Assert.Equal([10_600_000.0, 10_700_000.0, 10_800_000.0], Hz(sweep));
        Assert.Equal([-30.5, -2.25, -31.0], Level(sweep));
        Assert.False(sweep.Scalar.HasPhase);
        Assert.Null(sweep.Network);
    }

    [Fact]
    public void Tab_file_with_phase_reads_three_columns()
    {
        Sweep sweep = Read("Freq [kHz]\tGain dB\tPhase deg\n455\t-6\t12.5\n456\t-6.5\t-170\n");

        Assert.Equal([455_000.0, 456_000.0], Hz(sweep));
        Assert.Equal([-6.0, -6.5], Level(sweep));
        Assert.Equal([12.5, -170.0], Phase(sweep));
    }

    [Fact]
    public void Semicolon_file_accepts_decimal_commas_and_points()
    {
        // Spreadsheets in locales with a decimal comma export ';' as the delimiter (common practice, no published source).
        Sweep sweep = Read("Frequenz (MHz);S21 (dB);Phase (deg)\n10,695;-3,5;45,25\n10.705;-3.75;-45\n");

        Assert.Equal([10_695_000.0, 10_705_000.0], Hz(sweep));
        Assert.Equal([-3.5, -3.75], Level(sweep));
        Assert.Equal([45.25, -45.0], Phase(sweep));
    }

    [Fact]
    public void Quoted_cells_are_read_including_a_delimiter_inside_the_header_quotes()
    {
        Sweep sweep = Read("\"Frequency, Hz\",\"S21 \"\"thru\"\" dB\"\n\"1000\", \"-1.5\" \n2000,-2\n");

        Assert.Equal([1000.0, 2000.0], Hz(sweep));
        Assert.Equal([-1.5, -2.0], Level(sweep));
    }

    [Fact]
    public void Quoted_decimal_comma_is_accepted_in_a_semicolon_file()
    {
        Sweep sweep = Read("\"f/MHz\";\"Level dBm\"\n\"70,5\";\"-10,25\"\n");

        Assert.Equal([70_500_000.0], Hz(sweep));
        Assert.Equal([-10.25], Level(sweep));
        Assert.Equal(ScalarQuantity.PowerDbm, sweep.Scalar!.Quantity);
    }

    [Fact]
    public void Power_trace_in_dBm_from_header_is_a_power_quantity()
    {
        // A stepped generator with a spectrum analyser in max-hold gives one power reading per step (DOMAIN section 4).
        Sweep sweep = Read("Frequency (MHz),Max hold (dBm)\n69,-62.5\n70,-12.25\n71,-61\n");

        Assert.Equal(ScalarQuantity.PowerDbm, sweep.Scalar!.Quantity);
        Assert.Equal([-62.5, -12.25, -61.0], Level(sweep));
    }

    [Fact]
    public void Power_quantity_can_come_from_the_options_when_the_file_has_no_header()
    {
        Sweep sweep = Read("69e6,-62.5\n70e6,-12.25\n", new DelimitedTextOptions { Quantity = ScalarQuantity.PowerDbm });

        Assert.Equal(ScalarQuantity.PowerDbm, sweep.Scalar!.Quantity);
        Assert.Equal([69e6, 70e6], Hz(sweep));
    }

    [Fact]
    public void File_without_header_defaults_to_hertz_and_gain()
    {
        Sweep sweep = Read("1000000,-1\n2000000,-2\n");

        Assert.Equal([1e6, 2e6], Hz(sweep));
        Assert.Equal(ScalarQuantity.GainDb, sweep.Scalar!.Quantity);
    }

    [Fact]
    public void File_without_header_takes_the_unit_from_the_options()
    {
        Sweep sweep = Read("10.7,-3,90\n10.8,-4,80\n", new DelimitedTextOptions { Unit = FrequencyUnit.MHz });

        Assert.Equal([10_700_000.0, 10_800_000.0], Hz(sweep));
        Assert.Equal([90.0, 80.0], Phase(sweep));
    }

    [Theory]
    [InlineData("\n")]
    [InlineData("\r")]
    [InlineData("\r\n")]
    public void Line_ends_CR_LF_and_CRLF_read_the_same_values(string end)
    {
        Sweep sweep = Read(string.Join(end, "# bench 3", "Freq (Hz),dB", "1000,-1", "2000,-2") + end);

        Assert.Equal([1000.0, 2000.0], Hz(sweep));
        Assert.Equal([-1.0, -2.0], Level(sweep));
        Assert.Equal(["bench 3"], sweep.Source.Notes);
    }

    [Theory]
    [InlineData("\n")]
    [InlineData("\r")]
    [InlineData("\r\n")]
    public void Line_ends_CR_LF_and_CRLF_count_lines_alike(string end)
    {
        // Line 4 repeats the frequency of line 3; a CRLF must count as one line end, not two.
        var error = Assert.Throws<SweepReadException>(() => Read(string.Join(end, "# bench 3", "Freq (Hz),dB", "1000,-1", "1000,-2")));

        Assert.Equal((4, 1), (error.Line, error.Column));
        Assert.Contains("repeats that of line 3", error.Problem, StringComparison.Ordinal);
    }

    [Fact]
    public void Utf8_byte_order_mark_is_skipped_and_noted_as_a_warning()
    {
        byte[] bytes = [0xEF, 0xBB, 0xBF, .. Bytes("Freq (Hz),dB\n1,2\n")];

        Sweep sweep = DelimitedTextReader.Read(bytes, FileName);

        Assert.Equal([1.0], Hz(sweep));
        Assert.Single(sweep.Source.Warnings);
        Assert.Contains("byte-order mark", sweep.Source.Warnings[0], StringComparison.Ordinal);
    }

    [Fact]
    public void Comment_lines_anywhere_become_notes_in_order_without_the_mark()
    {
        Sweep sweep = Read("# Bench 3, thru lot 2406\n! RBW 1 kHz\nFreq (Hz),S21 dB\n1,-1\n  # mid-file note\n2,-2\n");

        Assert.Equal(["Bench 3, thru lot 2406", "RBW 1 kHz", "mid-file note"], sweep.Source.Notes);
    }

    [Fact]
    public void Sha256_is_of_the_original_bytes_in_lower_case_hex()
    {
        byte[] bytes = [0xEF, 0xBB, 0xBF, .. Bytes("Freq (Hz),dB\r\n1,2\r\n")];

        Sweep sweep = DelimitedTextReader.Read(bytes, FileName);

        // Reference: the platform SHA-256 (FIPS 180-4) over the same bytes, BOM included.
        Assert.Equal(Convert.ToHexStringLower(SHA256.HashData(bytes)), sweep.Source.Sha256);
        Assert.Matches("^[0-9a-f]{64}$", sweep.Source.Sha256);
    }

    [Fact]
    public void More_than_three_columns_are_chosen_by_header_words_preferring_S21()
    {
        // A typical two-port export lists S11 before S21 (common practice, no published source).
        Sweep sweep = Read("Index,Freq (GHz),S11 dB,S11 deg,S21 dB,S21 deg,Comment\n1,2.4,-15,10,-1.5,-20,ok\n2,2.5,-16,11,-1.75,-30,ok\n");

        Assert.Equal([2.4e9, 2.5e9], Hz(sweep));
        Assert.Equal([-1.5, -1.75], Level(sweep));
        Assert.Equal([-20.0, -30.0], Phase(sweep));
    }

    [Fact]
    public void Header_of_two_cells_without_dB_word_takes_the_second_as_level()
    {
        Sweep sweep = Read("Frequency,S21\n1,-3\n");

        Assert.Equal([-3.0], Level(sweep));
        Assert.Equal(ScalarQuantity.GainDb, sweep.Scalar!.Quantity);
    }

    [Fact]
    public void Caller_can_pick_columns_by_number()
    {
        Sweep sweep = Read("a,b,c,d\n9,1000,-3,45\n8,2000,-4,46\n", new DelimitedTextOptions { Columns = new DelimitedColumns(2, 3, 4) });

        Assert.Equal([1000.0, 2000.0], Hz(sweep));
        Assert.Equal([-3.0, -4.0], Level(sweep));
        Assert.Equal([45.0, 46.0], Phase(sweep));
    }

    [Fact]
    public void Explicit_delimiter_option_is_used()
    {
        Sweep sweep = Read("1000;-3,5\n", new DelimitedTextOptions { Delimiter = ';' });

        Assert.Equal([-3.5], Level(sweep));
    }

    [Fact]
    public void Trailing_delimiter_on_every_row_is_not_a_column()
    {
        Sweep sweep = Read("Freq (Hz),S21 dB,\n1,-1,\n2,-2,\n");

        Assert.Equal([-1.0, -2.0], Level(sweep));
        Assert.False(sweep.Scalar!.HasPhase);
    }

    [Fact]
    public void Kilohertz_value_is_the_double_nearest_the_decimal_value_not_a_rounded_product()
    {
        // 10.000001 kHz = 10 000.001 Hz. Multiplying the parsed 10.000001 by 1e3 rounds twice and gives
        // 10000.000999999998 (IEEE 754 binary64); the nearest double to 10000.001 is what parsing "10000.001" gives.
        Sweep sweep = Read("Freq (kHz),dB\n10.000001,-1\n");

        Assert.Equal(double.Parse("10000.001", System.Globalization.CultureInfo.InvariantCulture), Hz(sweep)[0]);
    }

    [Fact]
    public void Header_unit_that_contradicts_the_option_is_refused()
    {
        var error = Assert.Throws<SweepReadException>(() => Read("Frequency (MHz),dB\n1,2\n", new DelimitedTextOptions { Unit = FrequencyUnit.Hz }));

        Assert.Equal((1, 1), (error.Line, error.Column));
        Assert.Contains("MHz but the options say Hz", error.Problem, StringComparison.Ordinal);
    }

    [Fact]
    public void Header_quantity_that_contradicts_the_option_is_refused()
    {
        var error = Assert.Throws<SweepReadException>(() => Read("Frequency (MHz),Power (dBm)\n1,2\n", new DelimitedTextOptions { Quantity = ScalarQuantity.GainDb }));

        Assert.Equal((1, 2), (error.Line, error.Column));
        Assert.Contains("dBm but the options say a gain", error.Problem, StringComparison.Ordinal);
    }

    [Fact]
    public void Both_dB_and_dBm_columns_are_resolved_by_the_quantity_option()
    {
        Sweep sweep = Read("Freq (Hz),Gain dB,Power dBm\n1,-3,-13\n", new DelimitedTextOptions { Quantity = ScalarQuantity.PowerDbm });

        Assert.Equal([-13.0], Level(sweep));
    }

    [Theory]
    [InlineData(".5", 0.5)]
    [InlineData("5.", 5.0)]
    [InlineData("+5.e-1", 0.5)]
    [InlineData("-2.5E+2", -250.0)]
    [InlineData("  7  ", 7.0)]
    public void Decimal_number_forms_are_read(string cell, double expected)
    {
        // Plain decimal notation; each expected value is the number written in the cell (exact in binary64).
        Assert.Equal(expected, Level(Read($"1000,{cell}\n"))[0]);
    }

    [Fact]
    public void Read_file_keeps_the_name_without_folder_and_reports_a_missing_file_as_a_read_error()
    {
        string folder = Directory.CreateTempSubdirectory("filterqa-delimited-").FullName;
        try
        {
            string path = Path.Combine(folder, "unit-0042.csv");
            File.WriteAllText(path, "Freq (Hz),dB\n1,2\n");

            Sweep sweep = DelimitedTextReader.ReadFile(path);
            var missing = Assert.Throws<SweepReadException>(() => DelimitedTextReader.ReadFile(Path.Combine(folder, "absent.csv")));

            Assert.Equal("unit-0042.csv", sweep.Source.FileName);
            Assert.Equal("absent.csv", missing.FileName);
            Assert.Contains("does not exist", missing.Problem, StringComparison.Ordinal);
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }
}
