using FilterQA.Core.Decisions;
using Plotly.Blazor;
using Plotly.Blazor.Traces;
using Plotly.Blazor.Traces.ScatterLib;

namespace FilterQA.Web.Ui.Charts;

/// <summary>A lot's min/max loss envelope (see <see cref="EnvelopeDecimator"/>) against limit lines.</summary>
public static class EnvelopeChartBuilder
{
    /// <summary>
    /// The least and the largest loss per bin as two lines with the band between them shaded, and the
    /// limit lines dashed. Empty bins are left out (no value is drawn where no unit was measured).
    /// </summary>
    public static ChartModel Build(LossEnvelope envelope, IReadOnlyList<MaskLine> maskLines)
    {
        ArgumentNullException.ThrowIfNull(envelope);
        ArgumentNullException.ThrowIfNull(maskLines);
        FrequencyScale scale = FrequencyScale.For(Math.Max(envelope.StopHz, MaskTraces.HighestHz(maskLines)));
        var x = new List<object>(envelope.BinCount);
        var low = new List<object>(envelope.BinCount);
        var high = new List<object>(envelope.BinCount);
        for (int b = 0; b < envelope.BinCount; b++)
        {
            if (envelope.PointCounts[b] == 0)
            {
                continue;
            }
            x.Add(scale.From(envelope.BinCentreHz[b]));
            low.Add(envelope.MinLossDb[b]);
            high.Add(envelope.MaxLossDb[b]);
        }
        var data = new List<ITrace>
        {
            new Scatter
            {
                Name = $"Least loss of {envelope.TraceCount} units",
                Mode = ModeFlag.Lines,
                X = x,
                Y = low,
                Line = new Line { Color = ChartStyle.MeasuredColour, Width = 1 },
            },
            new Scatter
            {
                Name = $"Largest loss of {envelope.TraceCount} units",
                Mode = ModeFlag.Lines,
                X = x,
                Y = high,
                Fill = FillEnum.ToNextY,
                FillColor = ChartStyle.EnvelopeFill,
                Line = new Line { Color = ChartStyle.MeasuredColour, Width = 1 },
            },
        };
        data.AddRange(MaskTraces.From(maskLines, scale));
        return new ChartModel(data, ChartStyle.Layout($"Frequency ({scale.Symbol})", ChartStyle.LossAxisTitle, reverseY: true), ChartStyle.Config());
    }
}
