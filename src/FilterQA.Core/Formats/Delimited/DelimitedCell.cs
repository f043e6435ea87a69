namespace FilterQA.Core.Formats.Delimited;

/// <summary>One cell of a row: where its text sits in the line (inside the quotes when quoted).</summary>
/// <param name="Start">Offset of the text in the line.</param>
/// <param name="Length">Length of the text, white space around an unquoted cell removed.</param>
/// <param name="Quoted">True when the cell was written in double quotes.</param>
/// <param name="HasEscapedQuote">True when the quoted text holds a doubled quote ("") standing for one.</param>
internal readonly record struct DelimitedCell(int Start, int Length, bool Quoted, bool HasEscapedQuote)
{
    /// <summary>The cell's raw text (escaped quotes still doubled).</summary>
    public ReadOnlySpan<char> Raw(ReadOnlySpan<char> line) => line.Slice(Start, Length);

    /// <summary>The cell's text with doubled quotes made single; for header cells.</summary>
    public string Text(ReadOnlySpan<char> line)
    {
        string raw = Raw(line).ToString();
        return HasEscapedQuote ? raw.Replace("\"\"", "\"", StringComparison.Ordinal) : raw;
    }

    /// <summary>True when the cell holds nothing (an unquoted empty or blank cell, or "").</summary>
    public bool IsEmpty(ReadOnlySpan<char> line) => Raw(line).Trim().IsEmpty;
}
