using FilterQA.Core.Decisions;
using FilterQA.Core.Templates;
using Plotly.Blazor;
using Plotly.Blazor.Traces;
using Plotly.Blazor.Traces.ScatterLib;

namespace FilterQA.Web.Ui.Charts;

/// <summary>A template's limit lines as dashed chart traces (loss in dB, positive = attenuation).</summary>
internal static class MaskTraces
{
    public static IEnumerable<ITrace> From(IReadOnlyList<MaskLine> lines, FrequencyScale scale) => From(lines, scale, null);

    /// <summary>As <see cref="From(IReadOnlyList{MaskLine}, FrequencyScale)"/>, each name led by <paramref name="label"/> (e.g. "draft rev 3"), for two sets on one chart.</summary>
    public static IEnumerable<ITrace> From(IReadOnlyList<MaskLine> lines, FrequencyScale scale, string? label)
    {
        string lead = label is null ? "" : label + " · ";
        foreach (MaskLine line in lines)
        {
            bool upper = line.Boundary == LimitBoundary.Upper;
            yield return new Scatter
            {
                Name = lead + (upper ? $"{line.RuleId}: maximum loss" : $"{line.RuleId}: minimum loss"),
                Mode = ModeFlag.Lines,
                X = line.FrequenciesHz.Select(hz => (object)scale.From(hz)).ToList(),
                Y = line.LossDb.Select(db => (object)db).ToList(),
                Line = new Line
                {
                    Color = upper ? ChartStyle.UpperLimitColour : ChartStyle.LowerLimitColour,
                    Dash = upper ? ChartStyle.UpperLimitDash : ChartStyle.LowerLimitDash,
                    Width = 3,
                },
            };
        }
    }

    public static double HighestHz(IReadOnlyList<MaskLine> lines) =>
        lines.SelectMany(l => l.FrequenciesHz).DefaultIfEmpty(0).Max();
}
