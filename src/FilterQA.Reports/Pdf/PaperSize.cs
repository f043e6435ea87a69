namespace FilterQA.Reports.Pdf;

/// <summary>The sheet a document is laid out for.</summary>
public enum PaperSize
{
    /// <summary>ISO 216 A4, 210 mm x 297 mm = 595 x 842 pt.</summary>
    A4,

    /// <summary>US Letter, 8.5 in x 11 in = 612 x 792 pt.</summary>
    Letter,
}
