using FilterQA.Reports.Pdf;
using ScottPlot;
using SkiaSharp;

namespace FilterQA.Reports.Charts;

/// <summary>Common chart styling and the one way a chart is put on a page: as vectors, at a rectangle in points.</summary>
internal static class ChartCanvas
{
    public static Plot NewPlot(ReportFonts fonts)
    {
        ChartFontResolver.Register(fonts);
        var plot = new Plot();
        plot.Font.Set(ReportFonts.ChartFamily);
        plot.ScaleFactor = 1;
        plot.Axes.Bottom.Label.FontSize = 8.5f;
        plot.Axes.Left.Label.FontSize = 8.5f;
        plot.Axes.Bottom.TickLabelStyle.FontSize = 7.5f;
        plot.Axes.Left.TickLabelStyle.FontSize = 7.5f;
        plot.Axes.Title.Label.FontSize = 9.5f;
        plot.Legend.FontSize = 7;
        plot.Grid.MajorLineColor = Color.FromHex("#dde2e7");
        return plot;
    }

    /// <summary>
    /// Renders <paramref name="plot"/> into <paramref name="rect"/> of <paramref name="canvas"/>. A first render in memory
    /// settles the layout (axis sizes, tick labels); rendering straight onto the PDF canvas would draw the labels twice.
    /// </summary>
    public static void Draw(Plot plot, SKCanvas canvas, SKRect rect)
    {
        int width = Math.Max(1, (int)rect.Width);
        int height = Math.Max(1, (int)rect.Height);
        plot.RenderInMemory(width, height);
        canvas.Save();
        canvas.Translate(rect.Left, rect.Top);
        canvas.ClipRect(SKRect.Create(0, 0, width, height));
        plot.Render(canvas, width, height);
        canvas.Restore();
    }
}
