using FilterQA.Core.Decisions;
using FilterQA.Core.Sweeps;
using FilterQA.Reports.Pdf;
using SkiaSharp;

namespace FilterQA.Reports.Charts;

/// <summary>One unit's loss against frequency with the template's limit lines, drawn as vectors.</summary>
public static class SweepChart
{
    public static void Draw(ReportFonts fonts, SKCanvas canvas, SKRect rect, ResponseTrace trace, IReadOnlyList<MaskLine> mask, string legend)
    {
        ArgumentNullException.ThrowIfNull(trace);
        ArgumentNullException.ThrowIfNull(mask);
        var plot = ChartCanvas.NewPlot(fonts);
        double[] hz = trace.Grid.Hz.ToArray();
        FrequencyScale scale = FrequencyScale.For(Math.Max(trace.Grid.StopHz, mask.SelectMany(m => m.FrequenciesHz).DefaultIfEmpty(0).Max()));
        double[] loss = trace.LossDb.ToArray();
        var line = plot.Add.ScatterLine(hz.Select(scale.From).ToArray(), loss);
        line.Color = ScottPlot.Color.FromHex("#202a33");
        line.LineWidth = 1.1f;
        line.MarkerSize = 0;
        line.LegendText = legend;
        MaskLineStyle.Add(plot, mask, scale);
        (double low, double high) = LossRange(loss, mask);
        LossAxis.Apply(plot, low, high, scale, trace.Grid.StartHz, trace.Grid.StopHz);
        plot.ShowLegend(ScottPlot.Alignment.UpperRight);
        ChartCanvas.Draw(plot, canvas, rect);
    }

    /// <summary>The loss range to show: the data and the limits, but no deeper than 120 dB below the least loss (a noise floor says little).</summary>
    internal static (double Low, double High) LossRange(IEnumerable<double> loss, IReadOnlyList<MaskLine> mask)
    {
        double low = double.PositiveInfinity, high = double.NegativeInfinity;
        foreach (double v in loss.Concat(mask.SelectMany(m => m.LossDb)))
        {
            if (double.IsFinite(v))
            {
                low = Math.Min(low, v);
                high = Math.Max(high, v);
            }
        }
        if (!double.IsFinite(low))
        {
            return (0, 10);
        }
        return (Math.Min(low, 0), Math.Min(high, low + 120));
    }
}
