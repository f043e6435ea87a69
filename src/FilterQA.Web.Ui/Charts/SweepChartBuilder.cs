using FilterQA.Core.Decisions;
using FilterQA.Core.Sweeps;
using Plotly.Blazor;
using Plotly.Blazor.Traces;
using Plotly.Blazor.Traces.ScatterLib;

namespace FilterQA.Web.Ui.Charts;

/// <summary>One unit's measured loss against its template's limit lines.</summary>
public static class SweepChartBuilder
{
    /// <summary>
    /// The measured trace as a solid line and each limit line dashed; loss in dB (positive =
    /// attenuation) on a reversed axis, so a passband sits at the top as on a gain plot; frequency in
    /// kHz, MHz or GHz by the highest frequency shown.
    /// </summary>
    public static ChartModel Build(ResponseTrace trace, IReadOnlyList<MaskLine> maskLines)
    {
        ArgumentNullException.ThrowIfNull(trace);
        ArgumentNullException.ThrowIfNull(maskLines);
        FrequencyScale scale = FrequencyScale.For(Math.Max(trace.Grid.StopHz, MaskTraces.HighestHz(maskLines)));
        var data = new List<ITrace>
        {
            new Scatter
            {
                Name = trace.Path == ResponsePath.Transmission ? "Measured insertion loss" : "Measured return loss",
                Mode = ModeFlag.Lines,
                X = ToList(trace.Grid.Hz, scale.HzPerUnit),
                Y = ToList(trace.LossDb, 1),
                Line = new Line { Color = ChartStyle.MeasuredColour, Width = 2 },
            },
        };
        data.AddRange(MaskTraces.From(maskLines, scale));
        return new ChartModel(data, ChartStyle.Layout($"Frequency ({scale.Symbol})", ChartStyle.LossAxisTitle, reverseY: true), ChartStyle.Config());
    }

    internal static List<object> ToList(ReadOnlySpan<double> values, double divisor)
    {
        var list = new List<object>(values.Length);
        foreach (double v in values)
        {
            list.Add(v / divisor);
        }
        return list;
    }
}
