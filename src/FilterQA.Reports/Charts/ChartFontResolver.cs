using FilterQA.Reports.Pdf;
using ScottPlot;
using SkiaSharp;

namespace FilterQA.Reports.Charts;

/// <summary>
/// Hands ScottPlot the documents' own typefaces under <see cref="ReportFonts.ChartFamily"/>, so a chart's
/// labels use the same embedded font objects as the text around it instead of embedding another copy.
/// </summary>
internal sealed class ChartFontResolver(ReportFonts fonts) : IFontResolver
{
    private static readonly Lock Gate = new();
    private static ReportFonts? _registered;

    public ReportFonts Fonts { get; } = fonts;

    /// <summary>Makes <paramref name="fonts"/> the faces behind <see cref="ReportFonts.ChartFamily"/> (the last fonts given win).</summary>
    public static void Register(ReportFonts fonts)
    {
        lock (Gate)
        {
            if (ReferenceEquals(_registered, fonts))
            {
                return;
            }
            ScottPlot.Fonts.FontResolvers.RemoveAll(r => r is ChartFontResolver);
            ScottPlot.Fonts.FontResolvers.Insert(0, new ChartFontResolver(fonts));
            _registered = fonts;
        }
    }

    public SKTypeface? CreateTypeface(string fontName, FontWeight weight, FontSlant slant, FontSpacing spacing) =>
        CreateTypeface(fontName, weight >= FontWeight.SemiBold, slant != FontSlant.Upright);

    public SKTypeface? CreateTypeface(string fontName, bool bold, bool italic) =>
        string.Equals(fontName, ReportFonts.ChartFamily, StringComparison.Ordinal) ? (bold ? Fonts.Bold : Fonts.Regular) : null;
}
