using UglyToad.PdfPig;

namespace FilterQA.Web.Tests.Infrastructure;

/// <summary>Reads a downloaded PDF back with PdfPig, a reader independent of the code that wrote it.</summary>
public static class PdfReading
{
    /// <summary>Every page's words, joined by single spaces, pages one after another.</summary>
    public static string Words(byte[] pdf)
    {
        using PdfDocument document = PdfDocument.Open(pdf);
        return string.Join(' ', document.GetPages().SelectMany(p => p.GetWords()).Select(w => w.Text));
    }

    /// <summary>The number of pages.</summary>
    public static int Pages(byte[] pdf)
    {
        using PdfDocument document = PdfDocument.Open(pdf);
        return document.NumberOfPages;
    }
}
