using FilterQA.Core.Decisions;
using FilterQA.Data.Services;
using Plotly.Blazor;
using Plotly.Blazor.Traces;
using Plotly.Blazor.Traces.ScatterLib;

namespace FilterQA.Web.Ui.Charts;

/// <summary>A unit of a what-if: its stored trace against the draft's limit lines and the recorded revision's.</summary>
public static class WhatIfChartBuilder
{
    /// <summary>
    /// The stored loss as a solid line; the draft's limit lines as the usual coloured dashes, the recorded revision's
    /// as thinner grey dashes (legend names say which is which); loss on a reversed axis as on the lot page.
    /// </summary>
    public static ChartModel Build(WhatIfUnitView unit, int draftRevision)
    {
        ArgumentNullException.ThrowIfNull(unit);
        FrequencyScale scale = FrequencyScale.For(Math.Max(unit.Trace.Grid.StopHz,
            Math.Max(MaskTraces.HighestHz(unit.DraftMaskLines), MaskTraces.HighestHz(unit.RecordedMaskLines))));
        var data = new List<ITrace>
        {
            new Scatter
            {
                Name = $"Unit {unit.Serial}: stored loss",
                Mode = ModeFlag.Lines,
                X = SweepChartBuilder.ToList(unit.Trace.Grid.Hz, scale.HzPerUnit),
                Y = SweepChartBuilder.ToList(unit.Trace.LossDb, 1),
                Line = new Line { Color = ChartStyle.MeasuredColour, Width = 2 },
            },
        };
        data.AddRange(MaskTraces.From(unit.DraftMaskLines, scale, $"draft rev {draftRevision}"));
        foreach (ITrace trace in MaskTraces.From(unit.RecordedMaskLines, scale, $"recorded rev {unit.RecordedRevision}"))
        {
            var line = (Scatter)trace;
            line.Line = new Line { Color = ChartStyle.RecordedLimitColour, Dash = ChartStyle.RecordedLimitDash, Width = 2 };
            data.Add(line);
        }
        return new ChartModel(data, ChartStyle.Layout($"Frequency ({scale.Symbol})", ChartStyle.LossAxisTitle, reverseY: true), ChartStyle.Config());
    }
}
