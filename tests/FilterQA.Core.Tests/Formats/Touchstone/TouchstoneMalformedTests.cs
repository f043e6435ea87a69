using System.Text;
using FilterQA.Core.Formats;
using FilterQA.Core.Formats.Touchstone;

namespace FilterQA.Core.Tests.Formats.Touchstone;

/// <summary>
/// One row per class of malformed file in the Touchstone standard's rules (option line, data layout, version 2.0
/// keywords; summarised in DOMAIN.md section 1, "Malformed files to reject"). Each must be refused with a
/// <see cref="SweepReadException"/> that names the line (and the column where the problem is at one place) and says
/// what was wrong. Column −1 in a row means "not checked" (the problem concerns a whole line or the file).
/// Text is turned into bytes one character per byte (Latin-1), so rows can hold bytes that are not ASCII.
/// </summary>
public sealed class TouchstoneMalformedTests
{
    private const string S1 = "# GHz S RI R 50\n";
    private const string V2Head = "[Version] 2.0\n# GHz S RI R 50\n[Number of Ports] 1\n[Number of Frequencies] 1\n";
    private const string V2Two = "[Version] 2.0\n# GHz S RI R 50\n[Number of Ports] 2\n[Two-Port Data Order] 12_21\n[Number of Frequencies] 1\n";
    private const string TwoPortLine = "1 0.1 0 0.2 0 0.3 0 0.4 0\n";

    public static TheoryData<string, string, string, int, int, string> Rows() => new()
    {
        // name, content, file name, line, column, key phrase
        { "data with no option line", "1 0.5 0\n", "a.s1p", 1, 1, "expected the option line" },
        { "data before the option line", "! c\n1 0 0\n# GHz S RI\n", "a.s1p", 2, 1, "expected the option line" },
        { "unknown option token", "# GHz S XX R 50\n1 0 0\n", "a.s1p", 1, 9, "unknown option 'XX'" },
        { "R without a number", "# GHz S RI R\n1 0 0\n", "a.s1p", 1, 13, "must be followed by the reference resistance" },
        { "R of zero", "# GHz S RI R 0\n1 0 0\n", "a.s1p", 1, 14, "must be a positive number" },
        { "R negative", "# GHz S RI R -50\n1 0 0\n", "a.s1p", 1, 14, "must be a positive number" },
        { "R not a number", "# GHz S RI R fifty\n1 0 0\n", "a.s1p", 1, 14, "reference resistance R in ohms" },
        { "conflicting units", "# GHz MHz S\n1 0 0\n", "a.s1p", 1, 7, "two different values for the frequency unit" },
        { "wrong count of per-port R", "# GHz S RI R 50 75 100\n" + TwoPortLine, "a.s2p", 1, 12, "R gives 3 reference resistances" },
        { "decimal comma", S1 + "1 0,5 0\n", "a.s1p", 2, 3, "decimal point, not a comma" },
        { "Fortran D exponent", S1 + "1 0.5D+00 0\n", "a.s1p", 2, 3, "Fortran 'D' exponent" },
        { "NaN", S1 + "1 NaN 0\n", "a.s1p", 2, 3, "NaN and infinity are not allowed" },
        { "infinity", S1 + "1 0.5 -Inf\n", "a.s1p", 2, 7, "NaN and infinity are not allowed" },
        { "overflow", S1 + "1 1e400 0\n", "a.s1p", 2, 3, "too large for a double (overflow)" },
        { "not a number", S1 + "1 abc 0\n", "a.s1p", 2, 3, "expected a number (real part of S11), found 'abc'" },
        { "named element of a 2-port", "# GHz S MA R 50\n1 0.5 10 abc 20 0.1 0 0.5 0\n", "a.s2p", 2, 10, "expected a number (magnitude of S21), found 'abc'" },
        { "short 2-port line", S1 + "1 0 0 0 0 0 0 0\n2 0 0 0 0 0 0 0 0\n", "a.s2p", 2, -1, "line 2 has 8 values" },
        { "long 2-port line", S1 + "1 0 0 0 0 0 0 0 0 9\n", "a.s2p", 2, 19, "more values than one block" },
        { "file ends mid-block (3-port)", S1 + "1 0 0 0 0 0 0\n0 0 0 0 0 0\n0 0 0", "a.s3p", 4, -1, "the file ends in the middle of the block that starts on line 2" },
        { "truncated last line", S1 + "1 0 0\n2 0", "a.s1p", 3, -1, "line 3 has 2 values" },
        { "block overruns into a line", S1 + "1 0 0 0 0 0 0\n0 0 0 0 0 0\n0 0 0 0 0 0 7\n", "a.s3p", 4, 13, "ends in the middle of line 4" },
        { "duplicate frequency", S1 + "1 0 0\n1 0 0\n", "a.s1p", 3, 1, "repeats the frequency of the previous block" },
        { "falling frequency", S1 + "2 0 0\n1 0 0\n", "a.s1p", 3, 1, "is below the previous frequency" },
        { "negative frequency", S1 + "-1 0 0\n", "a.s1p", 2, 1, "is negative" },
        { "duplicate frequency in a 2-port", S1 + TwoPortLine + TwoPortLine, "a.s2p", 3, -1, "so it would begin the noise data" },
        { "port count from the name disagrees with the keyword", V2Two.Replace("[Two-Port Data Order] 12_21\n", "", StringComparison.Ordinal) + "[Network Data]\n", "a.s3p", 3, 1, "says 2 ports, but the file name" },
        { "no .sNp name and no port count", S1 + "1 0 0\n", "export.txt", 0, 0, "cannot tell the number of ports" },
        { "H parameters", "# GHz H RI R 50\n" + TwoPortLine, "a.s2p", 1, 7, "H parameters are not supported" },
        { "G parameters on a 3-port", "# GHz G RI R 50\n1 0 0 0 0 0 0\n", "a.s3p", 1, 7, "G parameters exist only for 2-ports" },
        { "negative MA magnitude", "# GHz S MA R 50\n1 -0.5 0\n", "a.s1p", 2, 3, "in MA format a magnitude must be 0 or more" },
        { "noise line with 4 values", S1 + TwoPortLine + "0.5 1 0.5 10\n", "a.s2p", 3, -1, "noise lines hold 5 values" },
        { "noise frequencies not increasing", S1 + TwoPortLine + "0.5 1 0.5 10 0.3\n0.5 1 0.5 10 0.3\n", "a.s2p", 4, -1, "noise frequencies must strictly increase" },
        { "network data after noise", S1 + TwoPortLine + "0.5 1 0.5 10 0.3\n" + TwoPortLine.Replace("1 ", "9 ", StringComparison.Ordinal), "a.s2p", 4, -1, "network data cannot follow the noise data" },
        { "negative noise reflection magnitude", S1 + TwoPortLine + "0.5 1 -0.5 10 0.3\n", "a.s2p", 3, 7, "must not be negative" },
        { "noise in a 1-port (v2)", V2Head + "[Number of Noise Frequencies] 1\n", "a.ts", 5, 1, "noise data exists only for 2-ports" },
        { "v2 missing Number of Frequencies", "[Version] 2.0\n# GHz S RI R 50\n[Number of Ports] 1\n[Network Data]\n1 0 0\n[End]\n", "a.ts", 4, 1, "[Number of Frequencies] is missing" },
        { "v2 missing Number of Ports", "[Version] 2.0\n# GHz S RI R 50\n[Number of Frequencies] 1\n[Network Data]\n", "a.ts", 4, 1, "[Number of Ports] is missing" },
        { "v2 keyword out of order", "[Version] 2.0\n# GHz S RI R 50\n[Reference] 50\n[Number of Ports] 1\n", "a.ts", 3, 1, "must come after [Number of Ports]" },
        { "v2 keyword after the data", V2Head + "[Network Data]\n1 0 0\n[Matrix Format] Full\n[End]\n", "a.ts", 7, 1, "must come before the network data" },
        { "v2 unknown keyword", V2Head + "[Colour] blue\n", "a.ts", 5, 1, "unknown keyword [Colour]" },
        { "v2 fewer blocks than declared", V2Head.Replace("] 1\n[Network", "] 3\n[Network", StringComparison.Ordinal).Replace("Frequencies] 1", "Frequencies] 3", StringComparison.Ordinal) + "[Network Data]\n1 0 0\n2 0 0\n[End]\n", "a.ts", 8, 1, "after 2 network blocks" },
        { "v2 more blocks than declared", V2Head + "[Network Data]\n1 0 0\n2 0 0\n[End]\n", "a.ts", 7, 1, "more network data than the 1 blocks" },
        { "v2 Reference too short", V2Two + "[Reference] 50\n[Network Data]\n", "a.ts", 7, 1, "needs 2 values, one per port; found 1" },
        { "v2 Reference too long", V2Two + "[Reference] 50 50 50\n[Network Data]\n", "a.ts", 6, 19, "gives more than 2 values" },
        { "v2 bad Matrix Format", V2Head + "[Matrix Format] Diagonal\n", "a.ts", 5, 1, "must be Full, Lower or Upper" },
        { "v2 bad Two-Port Data Order", V2Two.Replace("12_21", "11_22", StringComparison.Ordinal), "a.ts", 4, 1, "must be 12_21 or 21_12" },
        { "v2 2-port without Two-Port Data Order", V2Two.Replace("[Two-Port Data Order] 12_21\n", "", StringComparison.Ordinal) + "[Network Data]\n", "a.ts", 5, 1, "[Two-Port Data Order] (12_21 or 21_12) is missing" },
        { "v2 content after End", V2Head + "[Network Data]\n1 0 0\n[End]\n2 0 0\n", "a.ts", 8, 1, "nothing may follow [End]" },
        { "v2 no End", V2Head + "[Network Data]\n1 0 0\n", "a.ts", 6, 0, "without [End]" },
        { "v2 block cut by a keyword", "[Version] 2.0\n# GHz S RI R 50\n[Number of Ports] 3\n[Number of Frequencies] 1\n[Network Data]\n1 0 0 0 0 0 0\n[End]\n", "a.ts", 7, 1, "has only 7 of its 19 values" },
        { "v2 other version", "[Version] 1.0\n# GHz S RI R 50\n", "a.ts", 1, 11, "version '1.0' is not supported" },
        { "v2 option line missing", "[Version] 2.0\n[Number of Ports] 1\n", "a.ts", 2, 1, "right after [Version] 2.0" },
        { "v2 mixed-mode", V2Two + "[Mixed-Mode Order] D2,1 C2,1\n", "a.ts", 6, 1, "not supported" },
        { "v2 information block", V2Head + "[Begin Information]\n", "a.ts", 5, 1, "not supported" },
        { "v2 keyword without Version", S1 + "[Number of Ports] 1\n1 0 0\n", "a.s1p", 2, 1, "Touchstone 2.0 syntax, but the file does not start with [Version] 2.0" },
        { "non-ASCII byte", S1 + "1 0 0 ! \u00B5\n", "a.s1p", 2, 9, "is not ASCII" },
        { "control character", S1 + "1 0\u0001 0\n", "a.s1p", 2, 4, "control character 0x01" },
        { "binary junk", "\u0000\u0001\u0002PK\u0003\u0004", "a.s1p", 1, 1, "control character 0x00" },
        { "empty file", "", "a.s1p", 0, 0, "the file is empty (0 bytes)" },
        { "only comments", "! nothing here\n\n   \n", "a.s1p", 0, 0, "no option line and no data" },
        { "option line but no data", S1 + "! no data\n", "a.s1p", 1, 0, "no network data" },
    };

    [Theory]
    [MemberData(nameof(Rows))]
    public void Malformed_file_is_refused_with_line_column_and_reason(string name, string content, string fileName, int line, int column, string phrase)
    {
        byte[] bytes = Encoding.Latin1.GetBytes(content);

        var error = Assert.Throws<SweepReadException>(() => TouchstoneReader.Read(bytes, fileName));

        Assert.True(error.Problem.Contains(phrase, StringComparison.Ordinal), $"{name}: '{error.Problem}' lacks '{phrase}'");
        Assert.Equal(fileName, error.FileName);
        Assert.Equal(line, error.Line);
        if (column >= 0)
        {
            Assert.Equal(column, error.Column);
        }
        Assert.StartsWith(fileName, error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_port_count_from_the_caller_must_agree_with_the_name()
    {
        byte[] bytes = Encoding.ASCII.GetBytes(S1 + "1 0 0\n");

        var error = Assert.Throws<SweepReadException>(() => TouchstoneReader.Read(bytes, "a.s1p", 2));

        Assert.Contains("the caller asked for 2 ports", error.Problem, StringComparison.Ordinal);
    }
}
