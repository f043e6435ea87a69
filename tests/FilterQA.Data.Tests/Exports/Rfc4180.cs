using System.Text;

namespace FilterQA.Data.Tests.Exports;

/// <summary>
/// A small CSV parser written from RFC 4180 section 2 (records end in CRLF; fields separated by commas; a
/// field in double quotes may hold commas, CR, LF and doubled quotes), to read the export back.
/// </summary>
public static class Rfc4180
{
    public static List<string[]> Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var records = new List<string[]>();
        var record = new List<string>();
        var field = new StringBuilder();
        int i = 0;
        while (i < text.Length)
        {
            if (text[i] == '"' && field.Length == 0)
            {
                i++;
                while (true)
                {
                    if (i >= text.Length)
                    {
                        throw new FormatException("unterminated quoted field");
                    }
                    if (text[i] == '"')
                    {
                        if (i + 1 < text.Length && text[i + 1] == '"')
                        {
                            field.Append('"');
                            i += 2;
                            continue;
                        }
                        i++;
                        break;
                    }
                    field.Append(text[i++]);
                }
            }
            else if (text[i] == ',')
            {
                record.Add(field.ToString());
                field.Clear();
                i++;
            }
            else if (text[i] == '\r' && i + 1 < text.Length && text[i + 1] == '\n')
            {
                record.Add(field.ToString());
                field.Clear();
                records.Add(record.ToArray());
                record.Clear();
                i += 2;
            }
            else if (text[i] is '\r' or '\n' or '"')
            {
                throw new FormatException($"a bare {(text[i] == '"' ? "quote" : "line break")} at offset {i} is not allowed outside quotes");
            }
            else
            {
                field.Append(text[i++]);
            }
        }
        if (field.Length > 0 || record.Count > 0)
        {
            throw new FormatException("the last record does not end in CRLF");
        }
        return records;
    }
}
