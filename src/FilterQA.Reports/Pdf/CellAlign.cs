namespace FilterQA.Reports.Pdf;

/// <summary>Horizontal placement of text in a table cell.</summary>
public enum CellAlign
{
    Left,
    Right,
    Centre,
}
