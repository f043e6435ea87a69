using FilterQA.Reports.Exports;

namespace FilterQA.Reports.Tests.Exports;

public sealed class LotResultsCsvTests
{
    // OWASP, "CSV Injection": a cell beginning with =, +, -, @, tab or carriage return is read as a formula by
    // spreadsheet programs; prefixing a single quote makes it text.
    [Theory]
    [InlineData("=HYPERLINK(\"http://example.invalid\")", "'=HYPERLINK(\"http://example.invalid\")")]
    [InlineData("+1", "'+1")]
    [InlineData("-2+3", "'-2+3")]
    [InlineData("@SUM(A1)", "'@SUM(A1)")]
    [InlineData("\tS1", "'\tS1")]
    [InlineData("S0001", "S0001")]
    [InlineData("IQC-1", "IQC-1")]
    [InlineData("", "")]
    public void Text_that_a_spreadsheet_would_take_for_a_formula_is_made_text(string typed, string written) =>
        Assert.Equal(written, LotResultsCsv.SpreadsheetSafe(typed));

    // RFC 4180 section 2: fields holding a comma, a quote or a line break are quoted, quotes doubled; records end in CRLF.
    [Fact]
    public void A_record_quotes_only_the_fields_that_need_it()
    {
        Assert.Equal("a,\"b,c\",\"say \"\"go\"\"\",\"x\ny\"\r\n", LotResultsCsv.Line(["a", "b,c", "say \"go\"", "x\ny"]));
    }
}
