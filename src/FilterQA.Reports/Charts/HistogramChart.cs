using FilterQA.Core.Statistics;
using FilterQA.Reports.Pdf;
using FilterQA.Reports.Text;
using ScottPlot;
using SkiaSharp;

namespace FilterQA.Reports.Charts;

/// <summary>A parameter's histogram (counts per bin) with its lower and upper limits as vertical lines, in display units.</summary>
public static class HistogramChart
{
    public static void Draw(ReportFonts fonts, SKCanvas canvas, SKRect rect, ParameterSummary parameter, string title)
    {
        ArgumentNullException.ThrowIfNull(parameter);
        DisplayUnit unit = DisplayUnit.For(parameter.Unit, Math.Max(Math.Abs(parameter.Moments.Minimum), Math.Abs(parameter.Moments.Maximum)));
        var plot = ChartCanvas.NewPlot(fonts);
        ReadOnlySpan<double> edges = parameter.Histogram.Edges;
        ReadOnlySpan<int> counts = parameter.Histogram.Counts;
        var bars = new List<Bar>(counts.Length);
        for (int i = 0; i < counts.Length; i++)
        {
            double lo = unit.From(edges[i]), hi = unit.From(edges[i + 1]);
            bars.Add(new Bar
            {
                Position = (lo + hi) / 2,
                Value = counts[i],
                Size = Math.Max(hi - lo, 1e-12),
                FillColor = Color.FromHex("#6f93b8"),
                LineColor = Color.FromHex("#3b5875"),
                LineWidth = 0.5f,
            });
        }
        plot.Add.Bars(bars);
        double left = edges.Length > 0 ? unit.From(edges[0]) : 0, right = edges.Length > 0 ? unit.From(edges[^1]) : 1;
        foreach (double? limit in new[] { parameter.Limits?.Lower, parameter.Limits?.Upper })
        {
            if (limit is { } l && double.IsFinite(l))
            {
                var v = plot.Add.VerticalLine(unit.From(l));
                v.Color = MaskLineStyle.MaximumLoss;
                v.LinePattern = LinePattern.Dashed;
                v.LineWidth = 1.4f;
                left = Math.Min(left, unit.From(l));
                right = Math.Max(right, unit.From(l));
            }
        }
        double pad = (right - left) * 0.06;
        if (!(pad > 0))
        {
            pad = Math.Max(Math.Abs(left) * 0.01, 1e-9);
        }
        plot.Axes.SetLimitsX(left - pad, right + pad);
        plot.Axes.SetLimitsY(0, Math.Max(1, MaxOf(counts)) * 1.12);
        plot.Title(title);
        plot.HideLegend();
        plot.XLabel(unit.Symbol.Length == 0 ? "value (ratio)" : "value (" + unit.Symbol + ")");
        plot.Axes.Left.TickGenerator = new ScottPlot.TickGenerators.NumericAutomatic { IntegerTicksOnly = true };
        plot.YLabel("units");
        ChartCanvas.Draw(plot, canvas, rect);
    }

    private static int MaxOf(ReadOnlySpan<int> counts)
    {
        int max = 0;
        foreach (int c in counts)
        {
            max = Math.Max(max, c);
        }
        return max;
    }
}
