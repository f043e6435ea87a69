namespace FilterQA.Reports.Pdf;

/// <summary>Page dimensions in PDF points (1/72 in) and the names a request may use.</summary>
public static class PaperSizes
{
    /// <summary>Width of the page in points.</summary>
    public static float WidthPt(PaperSize paper) => paper switch
    {
        PaperSize.A4 => 595,
        PaperSize.Letter => 612,
        _ => throw new ArgumentOutOfRangeException(nameof(paper), paper, "the paper size must be A4 or Letter"),
    };

    /// <summary>Height of the page in points.</summary>
    public static float HeightPt(PaperSize paper) => paper switch
    {
        PaperSize.A4 => 842,
        PaperSize.Letter => 792,
        _ => throw new ArgumentOutOfRangeException(nameof(paper), paper, "the paper size must be A4 or Letter"),
    };

    /// <summary>"a4" or "letter" (any case); null or empty is A4. False for anything else.</summary>
    public static bool TryParse(string? text, out PaperSize paper)
    {
        paper = PaperSize.A4;
        if (string.IsNullOrWhiteSpace(text) || string.Equals(text.Trim(), "a4", StringComparison.OrdinalIgnoreCase))
        {
            return true;
        }
        if (string.Equals(text.Trim(), "letter", StringComparison.OrdinalIgnoreCase))
        {
            paper = PaperSize.Letter;
            return true;
        }
        return false;
    }
}
