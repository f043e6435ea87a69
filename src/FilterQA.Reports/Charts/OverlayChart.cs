using FilterQA.Core.Decisions;
using FilterQA.Core.Sweeps;
using FilterQA.Reports.Pdf;
using SkiaSharp;

namespace FilterQA.Reports.Charts;

/// <summary>
/// Every unit of a lot against the mask: the min/max envelope of all sweeps as a band, and a few
/// units drawn as lines, so ten thousand units cost a few hundred points, not millions.
/// </summary>
public static class OverlayChart
{
    public static void Draw(ReportFonts fonts, SKCanvas canvas, SKRect rect, LossEnvelope envelope, IReadOnlyList<ResponseTrace> examples, IReadOnlyList<MaskLine> mask)
    {
        ArgumentNullException.ThrowIfNull(envelope);
        ArgumentNullException.ThrowIfNull(examples);
        ArgumentNullException.ThrowIfNull(mask);
        var plot = ChartCanvas.NewPlot(fonts);
        double stopHz = envelope.CentresHz.Concat(examples.Select(e => e.Grid.StopHz)).Concat(mask.SelectMany(m => m.FrequenciesHz)).DefaultIfEmpty(1).Max();
        double startHz = envelope.CentresHz.Concat(examples.Select(e => e.Grid.StartHz)).DefaultIfEmpty(0).Min();
        FrequencyScale scale = FrequencyScale.For(stopHz);
        if (envelope.CentresHz.Length > 1)
        {
            var band = plot.Add.FillY(envelope.CentresHz.Select(scale.From).ToArray(), envelope.MinLossDb, envelope.MaxLossDb);
            band.FillColor = ScottPlot.Color.FromHex("#8fb3d9").WithAlpha(0.55);
            band.LineWidth = 0;
            band.LegendText = string.Create(System.Globalization.CultureInfo.InvariantCulture, $"range of all {envelope.TraceCount} units");
        }
        string[] colours = ["#203040", "#6a3d9a", "#33a02c", "#b15928", "#e31a1c"];
        for (int i = 0; i < examples.Count; i++)
        {
            var line = plot.Add.ScatterLine(examples[i].Grid.Hz.ToArray().Select(scale.From).ToArray(), examples[i].LossDb.ToArray());
            line.Color = ScottPlot.Color.FromHex(colours[i % colours.Length]);
            line.LineWidth = 0.8f;
            line.MarkerSize = 0;
            if (i == 0)
            {
                line.LegendText = string.Create(System.Globalization.CultureInfo.InvariantCulture, $"{examples.Count} units shown as lines");
            }
        }
        MaskLineStyle.Add(plot, mask, scale);
        (double low, double high) = SweepChart.LossRange(envelope.MinLossDb.Concat(envelope.MaxLossDb), mask);
        LossAxis.Apply(plot, low, high, scale, startHz, stopHz);
        plot.ShowLegend(ScottPlot.Alignment.UpperRight);
        ChartCanvas.Draw(plot, canvas, rect);
    }
}
