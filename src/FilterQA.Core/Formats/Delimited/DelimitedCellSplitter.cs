using System.Globalization;

namespace FilterQA.Core.Formats.Delimited;

/// <summary>
/// Splits one line into cells. A cell may be quoted ("...", with "" for a quote inside); a quote must
/// close on the same line. Control characters (other than tab) and the Unicode replacement character
/// (what undecodable bytes become) are refused with the cell they sit in, because they mean the file
/// is binary or in another encoding.
/// </summary>
internal static class DelimitedCellSplitter
{
    /// <summary>Splits <paramref name="line"/>; on failure returns the 1-based cell number and the problem.</summary>
    public static bool TrySplit(ReadOnlySpan<char> line, char delimiter, List<DelimitedCell> cells, out int badCell, out string? problem)
    {
        cells.Clear();
        int pos = 0;
        while (true)
        {
            int cellNumber = cells.Count + 1;
            int p = pos;
            while (p < line.Length && IsBlank(line[p], delimiter))
            {
                p++;
            }
            if (p < line.Length && line[p] == '"')
            {
                int q = p + 1;
                bool escaped = false;
                while (true)
                {
                    if (q >= line.Length)
                    {
                        return Fail(cellNumber, "the quote that opens this cell is not closed on the same line", out badCell, out problem);
                    }
                    char c = line[q];
                    if (IsForbidden(c))
                    {
                        return Fail(cellNumber, Forbidden(c), out badCell, out problem);
                    }
                    if (c == '"')
                    {
                        if (q + 1 < line.Length && line[q + 1] == '"')
                        {
                            escaped = true;
                            q += 2;
                            continue;
                        }
                        break;
                    }
                    q++;
                }
                var cell = new DelimitedCell(p + 1, q - p - 1, Quoted: true, escaped);
                q++;
                while (q < line.Length && IsBlank(line[q], delimiter))
                {
                    q++;
                }
                if (q < line.Length && line[q] != delimiter)
                {
                    return Fail(cellNumber, "text follows the closing quote of this cell; expected the delimiter", out badCell, out problem);
                }
                cells.Add(cell);
                if (q >= line.Length)
                {
                    break;
                }
                pos = q + 1;
            }
            else
            {
                int q = p;
                while (q < line.Length && line[q] != delimiter)
                {
                    if (IsForbidden(line[q]))
                    {
                        return Fail(cellNumber, Forbidden(line[q]), out badCell, out problem);
                    }
                    q++;
                }
                int end = q;
                while (end > p && IsBlank(line[end - 1], delimiter))
                {
                    end--;
                }
                cells.Add(new DelimitedCell(p, end - p, Quoted: false, HasEscapedQuote: false));
                if (q >= line.Length)
                {
                    break;
                }
                pos = q + 1;
            }
        }
        badCell = 0;
        problem = null;
        return true;
    }

    /// <summary>Finds a forbidden character in a comment line; -1 when there is none.</summary>
    public static int IndexOfForbidden(ReadOnlySpan<char> line)
    {
        for (int i = 0; i < line.Length; i++)
        {
            if (IsForbidden(line[i]))
            {
                return i;
            }
        }
        return -1;
    }

    /// <summary>The problem text for a forbidden character.</summary>
    public static string Forbidden(char c) => c == '\uFFFD'
        ? "holds bytes that are not UTF-8 text (a binary file, or text in another encoding?)"
        : string.Create(CultureInfo.InvariantCulture, $"holds the control character U+{(int)c:X4} (a binary file?); expected text");

    /// <summary>Counts each candidate delimiter outside quotes, to detect the delimiter of a row.</summary>
    public static char? Detect(ReadOnlySpan<char> line)
    {
        int tabs = 0, semicolons = 0, commas = 0;
        bool inQuotes = false;
        foreach (char c in line)
        {
            if (c == '"')
            {
                inQuotes = !inQuotes;
            }
            else if (!inQuotes)
            {
                switch (c)
                {
                    case '\t': tabs++; break;
                    case ';': semicolons++; break;
                    case ',': commas++; break;
                }
            }
        }
        // A tab never occurs inside a number and a semicolon file may use decimal commas, hence the order.
        return tabs > 0 ? '\t' : semicolons > 0 ? ';' : commas > 0 ? ',' : null;
    }

    private static bool IsBlank(char c, char delimiter) => c == ' ' || (c == '\t' && delimiter != '\t');

    private static bool IsForbidden(char c) => (c < ' ' && c != '\t') || c == '\u007F' || c == '\uFFFD';

    private static bool Fail(int cell, string text, out int badCell, out string? problem)
    {
        badCell = cell;
        problem = text;
        return false;
    }
}
