using System.Globalization;
using System.Text;
using DocumentFormat.OpenXml.Spreadsheet;


namespace FilterQA.Reports.Exports;

/// <summary>Spreadsheet cells of the workbook export: numbers as numbers, text inline (no shared-string table).</summary>
internal static class Cells
{
    internal static Cell Number(double? value)
    {
        if (value is not { } v)
        {
            return new Cell();
        }
        // A spreadsheet number cannot hold NaN or infinity; such a value is written as text rather than lost.
        return double.IsFinite(v)
            ? new Cell { DataType = CellValues.Number, CellValue = new CellValue(v.ToString("R", CultureInfo.InvariantCulture)) }
            : Text(v.ToString(CultureInfo.InvariantCulture));
    }

    internal static Cell Text(string? value) => value is null
        ? new Cell()
        : new Cell { DataType = CellValues.InlineString, InlineString = new InlineString(new DocumentFormat.OpenXml.Spreadsheet.Text(XmlSafe(value)) { Space = DocumentFormat.OpenXml.SpaceProcessingModeValues.Preserve }) };

    // XML 1.0 cannot carry most control characters; they are dropped rather than failing the whole export.
    private static string XmlSafe(string value)
    {
        if (!value.Any(c => c < ' ' && c is not ('\t' or '\n' or '\r')))
        {
            return value;
        }
        var safe = new StringBuilder(value.Length);
        foreach (char c in value)
        {
            if (c >= ' ' || c is '\t' or '\n' or '\r')
            {
                safe.Append(c);
            }
        }
        return safe.ToString();
    }
}
