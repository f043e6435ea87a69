namespace FilterQA.Reports.Pdf;

/// <summary>A table to lay out: a header row repeated on every page it spans, rows that are never split across pages.</summary>
public sealed class ReportTable
{
    public ReportTable(string? title, IReadOnlyList<TableColumn> columns, IReadOnlyList<TableRow> rows, TextStyle? style = null)
    {
        ArgumentNullException.ThrowIfNull(columns);
        ArgumentNullException.ThrowIfNull(rows);
        if (columns.Count == 0)
        {
            throw new ArgumentException("a table needs at least one column", nameof(columns));
        }
        for (int r = 0; r < rows.Count; r++)
        {
            if (rows[r] is null || rows[r].Cells.Count != columns.Count)
            {
                throw new ArgumentException(FormattableString.Invariant(
                    $"row {r + 1} of table '{title}' has {rows[r]?.Cells.Count ?? 0} cells; the table has {columns.Count} columns"), nameof(rows));
            }
        }
        Title = title;
        Columns = columns;
        Rows = rows;
        Style = style ?? TextStyle.Body with { SizePt = 8 };
    }

    public string? Title { get; }

    public IReadOnlyList<TableColumn> Columns { get; }

    public IReadOnlyList<TableRow> Rows { get; }

    public TextStyle Style { get; }
}
