using System.Globalization;
using System.Text;
using FilterQA.Data.Services.Exports;

namespace FilterQA.Reports.Exports;

/// <summary>
/// A lot's results as CSV (RFC 4180: comma separated, CRLF line ends, fields with a comma, quote or line
/// break in double quotes with quotes doubled), UTF-8 without a byte-order mark, a header row, one row per
/// stored measurement in sample order. Numbers in invariant culture, round-trip format; SI units as the
/// header says; an empty field where a rule has no value, limit or margin.
/// </summary>
public static class LotResultsCsv
{
    /// <summary>The media type of the export.</summary>
    public const string ContentType = "text/csv; charset=utf-8; header=present";

    /// <summary>Writes the export to <paramref name="output"/> row by row (the stream is left open).</summary>
    /// <exception cref="FilterQA.Data.RecordNotFoundException">The lot does not exist.</exception>
    public static async Task WriteAsync(LotExportReader reader, string lotNumber, Stream output, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(reader);
        ArgumentNullException.ThrowIfNull(output);
        IReadOnlyList<ExportRuleColumn> rules = await reader.RuleColumnsAsync(lotNumber, cancellationToken).ConfigureAwait(false);
        await using var writer = new StreamWriter(output, new UTF8Encoding(encoderShouldEmitUTF8Identifier: false), 64 * 1024, leaveOpen: true);
        await writer.WriteAsync(Line(ResultColumns.Header(rules))).ConfigureAwait(false);
        var fields = new List<string>();
        await foreach (ExportMeasurement m in reader.MeasurementsAsync(lotNumber, cancellationToken).ConfigureAwait(false))
        {
            fields.Clear();
            fields.Add(SpreadsheetSafe(m.Serial));
            fields.Add(m.Attempt.ToString(CultureInfo.InvariantCulture));
            fields.Add(ResultColumns.Counted(m.CountsForLot));
            fields.Add(m.Verdict.ToString());
            fields.Add(ResultColumns.Time(m.MeasuredAt));
            fields.Add(SpreadsheetSafe(m.Station));
            foreach (ExportRuleColumn rule in rules)
            {
                if (m.Rules.TryGetValue(rule.RuleId, out ExportRuleValue? r))
                {
                    fields.Add(ResultColumns.Number(r.Value));
                    fields.Add(ResultColumns.Number(r.Limit));
                    fields.Add(ResultColumns.Number(r.Margin));
                    fields.Add(r.Outcome.ToString());
                }
                else
                {
                    fields.AddRange(["", "", "", ""]);
                }
            }
            await writer.WriteAsync(Line(fields)).ConfigureAwait(false);
        }
        await writer.FlushAsync(cancellationToken).ConfigureAwait(false);
    }

    /// <summary>
    /// A text field as a spreadsheet may open it safely: text typed by people (serials, station names) that begins
    /// with =, +, -, @, a tab or a carriage return would be taken for a formula, so it gets a leading apostrophe
    /// (the OWASP "CSV Injection" advice). Numbers are written by the exporter itself and never pass through here.
    /// </summary>
    public static string SpreadsheetSafe(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        return text.Length > 0 && text[0] is '=' or '+' or '-' or '@' or '\t' or '\r' ? "'" + text : text;
    }

    /// <summary>One CSV record with its CRLF, each field quoted only when it must be (RFC 4180 section 2, rules 5 to 7).</summary>
    public static string Line(IEnumerable<string> fields)
    {
        ArgumentNullException.ThrowIfNull(fields);
        var line = new StringBuilder();
        bool first = true;
        foreach (string field in fields)
        {
            if (!first)
            {
                line.Append(',');
            }
            first = false;
            if (field.AsSpan().IndexOfAny(",\"\r\n") >= 0)
            {
                line.Append('"').Append(field.Replace("\"", "\"\"", StringComparison.Ordinal)).Append('"');
            }
            else
            {
                line.Append(field);
            }
        }
        return line.Append("\r\n").ToString();
    }
}
