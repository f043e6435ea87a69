using FilterQA.Core.Statistics;
using FilterQA.Reports.Pdf;
using ScottPlot;
using SkiaSharp;

namespace FilterQA.Reports.Charts;

/// <summary>Failing rules as horizontal bars, most frequent at the top, so long rule names stay readable.</summary>
public static class ParetoBarChart
{
    /// <summary>The most bars drawn; the rest are listed in the table beside the chart.</summary>
    public const int MaxBars = 12;

    public static void Draw(ReportFonts fonts, SKCanvas canvas, SKRect rect, IReadOnlyList<ParetoEntry> entries)
    {
        ArgumentNullException.ThrowIfNull(entries);
        var plot = ChartCanvas.NewPlot(fonts);
        ParetoEntry[] shown = entries.Take(MaxBars).ToArray();
        var bars = new List<Bar>(shown.Length);
        var ticks = new ScottPlot.TickGenerators.NumericManual();
        for (int i = 0; i < shown.Length; i++)
        {
            double position = shown.Length - i; // the largest at the top
            bars.Add(new Bar { Position = position, Value = shown[i].Count, FillColor = Color.FromHex("#b5475a"), LineWidth = 0, Size = 0.7 });
            ticks.AddMajor(position, shown[i].Rule);
        }
        var plotted = plot.Add.Bars(bars);
        plotted.Horizontal = true;
        plot.Axes.Left.TickGenerator = ticks;
        plot.Axes.SetLimitsY(0.4, Math.Max(1, shown.Length) + 0.6);
        plot.Axes.SetLimitsX(0, Math.Max(1, shown.Select(e => e.Count).DefaultIfEmpty(0).Max()) * 1.1);
        plot.Axes.Bottom.TickGenerator = new ScottPlot.TickGenerators.NumericAutomatic { IntegerTicksOnly = true };
        plot.XLabel("failures (counted measurements)");
        ChartCanvas.Draw(plot, canvas, rect);
    }
}
