using FilterQA.Core.Formats;
using FilterQA.Core.Formats.Delimited;
using static FilterQA.Core.Tests.Formats.Delimited.DelimitedTestFiles;

namespace FilterQA.Core.Tests.Formats.Delimited;

/// <summary>
/// One row per class of bad input. Each asserts the exception type (only SweepReadException may
/// escape), the 1-based line and cell column (0 = whole file or line) and a key phrase of the problem.
/// </summary>
public sealed class DelimitedTextMalformedTests
{
    public static TheoryData<string, byte[], int, int, string> Cases()
    {
        const string H = "Freq (Hz),S21 dB\n";
        return new TheoryData<string, byte[], int, int, string>
        {
            { "zero bytes", [], 0, 0, "the file is empty" },
            { "only a byte-order mark", [0xEF, 0xBB, 0xBF], 0, 0, "the file is empty" },
            { "only comments", Bytes("# bench 3\n! lot 2406\n\n"), 0, 0, "no data rows (only comments" },
            { "only a header", Bytes("# bench 3\n" + H), 0, 0, "no data rows after the header" },
            { "row with too few cells", Bytes(H + "1,-1\n2\n"), 3, 2, "has 1 cells; expected 2 as in line 1" },
            { "row with too many cells", Bytes(H + "1,-1\n2,-2,7\n"), 3, 3, "has 3 cells; expected 2" },
            { "unparsable number", Bytes(H + "1,-1\n2,abc\n"), 3, 2, "the level \"abc\" is not a number" },
            { "thousands separator", Bytes("Freq (Hz);S21 dB\n1.000,5;-1\n"), 2, 1, "\"1.000,5\" is not a number" },
            { "text in a first data row", Bytes("1000,-1x\n"), 1, 2, "\"-1x\" is not a number" },
            { "empty level cell", Bytes("1000,,45\n"), 1, 2, "the level cell is empty" },
            { "NaN level", Bytes("1000,NaN\n"), 1, 2, "\"NaN\" is not a finite number" },
            { "infinite phase", Bytes("Freq (Hz),dB,Phase\n1,-1,-Infinity\n"), 2, 3, "\"-Infinity\" is not a finite number" },
            { "infinite frequency", Bytes("inf,-1\n"), 1, 1, "is not a finite number" },
            { "numeric overflow", Bytes(H + "1,1e400\n"), 2, 2, "\"1e400\" is too large" },
            { "overflow after unit scaling", Bytes("Freq (GHz),dB\n1e300,-1\n"), 2, 1, "is too large" },
            { "repeated frequency", Bytes(H + "1000,-1\n1000,-2\n"), 3, 1, "repeats that of line 2" },
            { "decreasing frequency", Bytes(H + "2000,-1\n1000,-2\n"), 3, 1, "must strictly increase" },
            { "negative frequency", Bytes("-1000,-1\n"), 1, 1, "is negative" },
            { "unknown unit in brackets", Bytes("Frequency (THz),S21 dB\n1,-1\n"), 1, 1, "unknown frequency unit \"THz\"" },
            { "unknown unit word", Bytes("Frequency uHz,S21 dB\n1,-1\n"), 1, 1, "unknown frequency unit \"uHz\"" },
            { "header without frequency column", Bytes("Gain dB,Phase deg\n1,2\n"), 1, 0, "no frequency column" },
            { "header without level column", Bytes("Freq (Hz),a,b,c\n1,2,3,4\n"), 1, 0, "no level column" },
            { "unsupported level unit", Bytes("Freq (Hz),Level (dBuV)\n1,2\n"), 1, 2, "\"Level (dBuV)\" is not supported" },
            { "linear magnitude column", Bytes("Freq (Hz),S21 Mag\n1,0.5\n"), 1, 2, "looks like a linear magnitude" },
            { "phase in radians", Bytes("Freq (Hz),S21 dB,Phase (rad)\n1,-1,0.5\n"), 1, 3, "phase in radians" },
            { "both dB and dBm columns", Bytes("Freq (Hz),Gain dB,Power dBm\n1,-1,-11\n"), 1, 0, "both a dB column" },
            { "control character", Bytes(H + "1,-1\n2\u0001,-2\n"), 3, 1, "control character U+0001" },
            { "NUL between two numbers", Bytes("1000\u0000-1\n"), 1, 1, "control character U+0000" },
            { "NUL in a comment", Bytes("# ok\n#\u0000\n" + H + "1,-1\n"), 2, 1, "control character U+0000" },
            { "invalid UTF-8 bytes", [.. Bytes(H + "1,-1\n2,"), 0xC3, 0x28, .. Bytes("\n")], 3, 2, "not UTF-8 text" },
            { "binary junk", [0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A, 0x00, 0x00], 1, 1, "not UTF-8 text" },
            { "UTF-16 text", [0xFF, 0xFE, (byte)'1', 0, (byte)',', 0, (byte)'2', 0], 0, 0, "UTF-16" },
            { "decimal comma in quoted cell of a comma file", Bytes(H + "1,\"-3,5\"\n"), 2, 2, "decimal comma is accepted only in semicolon-delimited files" },
            { "decimal comma in a tab file", Bytes("1000\t-3,5\n"), 1, 2, "has a decimal comma" },
            { "decimal comma splitting a comma file", Bytes(H + "1000,-3,5\n"), 2, 3, "a decimal comma?" },
            { "unclosed quote", Bytes("\"1000,-1\n"), 1, 1, "not closed on the same line" },
            { "text after a closing quote", Bytes("\"1000\"x,-1\n"), 1, 1, "text follows the closing quote" },
            { "one column only", Bytes("1000\n2000\n"), 1, 0, "this row has one cell" },
            { "four columns without header", Bytes("1,2,3,4\n"), 1, 0, "no header to name them" },
            { "second header mid-file", Bytes(H + "1,-1\n" + H), 3, 1, "\"Freq (Hz)\" is not a number" },
        };
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void Bad_input_throws_a_read_error_naming_line_column_and_problem(string name, byte[] content, int line, int column, string phrase)
    {
        Exception caught = Record.Exception(() => DelimitedTextReader.Read(content, FileName));

        var error = Assert.IsType<SweepReadException>(caught);
        Assert.True((line, column) == (error.Line, error.Column), $"{name}: expected line {line} column {column}; got {error.Message}");
        Assert.Contains(phrase, error.Problem, StringComparison.Ordinal);
        Assert.Equal(FileName, error.FileName);
        Assert.StartsWith(FileName, error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Columns_picked_beyond_the_row_are_refused()
    {
        var error = Assert.Throws<SweepReadException>(() =>
            Read("1,2\n", new DelimitedTextOptions { Columns = new DelimitedColumns(1, 5) }));

        Assert.Equal((1, 0), (error.Line, error.Column));
        Assert.Contains("pick column 5 but the rows have 2 cells", error.Problem, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(' ')]
    [InlineData('.')]
    [InlineData('|')]
    public void Options_with_an_unsupported_delimiter_cannot_be_made(char delimiter)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => new DelimitedTextOptions { Delimiter = delimiter });
    }

    [Theory]
    [InlineData(0, 2, null)]
    [InlineData(1, 1, null)]
    [InlineData(1, 2, 2)]
    public void Columns_below_one_or_repeated_cannot_be_made(int frequency, int level, int? phase)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => new DelimitedColumns(frequency, level, phase));
    }
}
