namespace FilterQA.Reports.Pdf;

/// <summary>A table column: its header, its share of the table width (relative to the other columns) and alignment.</summary>
public sealed record TableColumn
{
    public TableColumn(string header, float weight, CellAlign align = CellAlign.Left)
    {
        ArgumentNullException.ThrowIfNull(header);
        if (!(weight > 0) || !float.IsFinite(weight))
        {
            throw new ArgumentOutOfRangeException(nameof(weight), weight, $"the width share of column '{header}' must be a positive finite number");
        }
        Header = header;
        Weight = weight;
        Align = align;
    }

    public string Header { get; }

    public float Weight { get; }

    public CellAlign Align { get; }
}
