using System.Globalization;
using System.Text;
using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Spreadsheet;
using FilterQA.Data.Services;
using FilterQA.Data.Services.Exports;

namespace FilterQA.Reports.Exports;

/// <summary>
/// A lot's results as an xlsx workbook: sheet "Results" with the same columns as <see cref="LotResultsCsv"/>
/// (numbers stored as numbers, in the SI unit the header names), and sheet "Lot" with the lot's header
/// fields. The results sheet is written element by element, not built as a document tree.
/// </summary>
public static class LotResultsWorkbook
{
    /// <summary>The media type of the export.</summary>
    public const string ContentType = "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet";

    /// <summary>Writes the workbook to <paramref name="output"/>, which must be seekable (a package is a zip with a directory written last).</summary>
    /// <exception cref="FilterQA.Data.RecordNotFoundException">The lot does not exist.</exception>
    public static async Task WriteAsync(LotService lots, LotExportReader reader, string lotNumber, Stream output, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(lots);
        ArgumentNullException.ThrowIfNull(reader);
        ArgumentNullException.ThrowIfNull(output);
        if (!output.CanSeek)
        {
            throw new ArgumentException("the workbook is written to a seekable stream (a memory or temporary file stream)", nameof(output));
        }
        LotSummary lot = await lots.GetSummaryAsync(lotNumber, cancellationToken).ConfigureAwait(false);
        IReadOnlyList<ExportRuleColumn> rules = await reader.RuleColumnsAsync(lotNumber, cancellationToken).ConfigureAwait(false);
        using SpreadsheetDocument document = SpreadsheetDocument.Create(output, SpreadsheetDocumentType.Workbook);
        WorkbookPart workbook = document.AddWorkbookPart();

        WorksheetPart results = workbook.AddNewPart<WorksheetPart>();
        using (OpenXmlWriter writer = OpenXmlWriter.Create(results))
        {
            writer.WriteStartElement(new Worksheet());
            writer.WriteStartElement(new SheetData());
            uint row = 1;
            WriteRow(writer, row++, ResultColumns.Header(rules).Select(Cells.Text));
            await foreach (ExportMeasurement m in reader.MeasurementsAsync(lotNumber, cancellationToken).ConfigureAwait(false))
            {
                var cells = new List<Cell>
                {
                    Cells.Text(m.Serial), Cells.Number(m.Attempt), Cells.Text(ResultColumns.Counted(m.CountsForLot)), Cells.Text(m.Verdict.ToString()),
                    Cells.Text(ResultColumns.Time(m.MeasuredAt)), Cells.Text(m.Station),
                };
                foreach (ExportRuleColumn rule in rules)
                {
                    ExportRuleValue? r = m.Rules.GetValueOrDefault(rule.RuleId);
                    cells.Add(Cells.Number(r?.Value));
                    cells.Add(Cells.Number(r?.Limit));
                    cells.Add(Cells.Number(r?.Margin));
                    cells.Add(Cells.Text(r?.Outcome.ToString()));
                }
                WriteRow(writer, row++, cells);
            }
            writer.WriteEndElement();
            writer.WriteEndElement();
        }

        WorksheetPart header = workbook.AddNewPart<WorksheetPart>();
        using (OpenXmlWriter writer = OpenXmlWriter.Create(header))
        {
            writer.WriteStartElement(new Worksheet());
            writer.WriteStartElement(new SheetData());
            uint row = 1;
            foreach ((string field, Cell value) in LotFields(lot))
            {
                WriteRow(writer, row++, [Cells.Text(field), value]);
            }
            writer.WriteEndElement();
            writer.WriteEndElement();
        }

        workbook.Workbook = new Workbook(new Sheets(
            new Sheet { Id = workbook.GetIdOfPart(results), SheetId = 1, Name = "Results" },
            new Sheet { Id = workbook.GetIdOfPart(header), SheetId = 2, Name = "Lot" }));
        workbook.Workbook.Save();
    }

    private static IEnumerable<(string Field, Cell Value)> LotFields(LotSummary lot)
    {
        yield return ("Lot", Cells.Text(lot.LotNumber));
        yield return ("Part", Cells.Text(lot.PartNumber));
        yield return ("Template revision", Cells.Number(lot.TemplateRevision));
        yield return ("Template hash", Cells.Text(lot.TemplateHash));
        yield return ("Supplier", Cells.Text(lot.Supplier));
        yield return ("Supplier lot", Cells.Text(lot.SupplierLot));
        yield return ("Date code", Cells.Text(lot.DateCode));
        yield return ("Quantity received", Cells.Number(lot.QuantityReceived));
        yield return ("Purchase order", Cells.Text(lot.PurchaseOrder));
        yield return ("Customer", Cells.Text(lot.Customer));
        yield return ("Status", Cells.Text(lot.Status.ToString()));
        yield return ("Sampling standard", Cells.Text(lot.Plan.StandardName));
        yield return ("Sample size", Cells.Number(lot.Plan.SampleSize));
        yield return ("Acceptance number", Cells.Number(lot.Plan.AcceptanceNumber));
        yield return ("Rejection number", Cells.Number(lot.Plan.RejectionNumber));
        yield return ("Units tested", Cells.Number(lot.UnitsTested));
        yield return ("Go", Cells.Number(lot.Go));
        yield return ("No-go", Cells.Number(lot.NoGo));
        yield return ("Not verifiable", Cells.Number(lot.NotVerifiable));
        yield return ("Defectives", Cells.Number(lot.Defectives));
        yield return ("Measurements", Cells.Number(lot.Measurements));
        yield return ("Plan decision", Cells.Text(lot.Decision.ToString()));
        yield return ("Created at (UTC)", Cells.Text(ResultColumns.Time(lot.CreatedAt)));
        yield return ("Created by", Cells.Text(lot.CreatedBy));
        yield return ("Disposition at (UTC)", Cells.Text(lot.DispositionAt is { } at ? ResultColumns.Time(at) : null));
        yield return ("Disposition by", Cells.Text(lot.DispositionBy));
        yield return ("Disposition reason", Cells.Text(lot.DispositionReason));
        yield return ("Disposition overrides the plan", Cells.Text(lot.DispositionIsOverride ? "yes" : "no"));
    }

    private static void WriteRow(OpenXmlWriter writer, uint row, IEnumerable<Cell> cells)
    {
        writer.WriteStartElement(new Row { RowIndex = row });
        int column = 0;
        foreach (Cell cell in cells)
        {
            column++;
            if (cell.CellValue is null && cell.InlineString is null)
            {
                continue; // an empty field: no cell, the reference of the next one keeps the columns aligned
            }
            cell.CellReference = ColumnName(column) + row.ToString(CultureInfo.InvariantCulture);
            writer.WriteElement(cell);
        }
        writer.WriteEndElement();
    }

    /// <summary>Spreadsheet column letters: 1 → A, 26 → Z, 27 → AA.</summary>
    internal static string ColumnName(int column)
    {
        var name = new StringBuilder();
        for (int c = column; c > 0; c = (c - 1) / 26)
        {
            name.Insert(0, (char)('A' + (c - 1) % 26));
        }
        return name.ToString();
    }
}
