using FilterQA.Core.Statistics;
using Plotly.Blazor;
using PlotLayout = Plotly.Blazor.Layout;
using Plotly.Blazor.Traces;
using Plotly.Blazor.Traces.ScatterLib;

namespace FilterQA.Web.Ui.Charts;

/// <summary>The histogram of one parameter over a lot, with its lower and upper limits as dashed vertical lines.</summary>
public static class HistogramChartBuilder
{
    /// <summary>Bars at the bin centres (width = bin width); limits drawn from zero to the tallest bar.</summary>
    public static ChartModel Build(ParameterSummary summary)
    {
        ArgumentNullException.ThrowIfNull(summary);
        ReadOnlySpan<double> edges = summary.Histogram.Edges;
        ReadOnlySpan<int> counts = summary.Histogram.Counts;
        double largest = 0;
        foreach (double e in edges)
        {
            largest = Math.Max(largest, Math.Abs(e));
        }
        DisplayUnit unit = DisplayUnit.For(summary.Unit, largest);
        var x = new List<object>(counts.Length);
        var y = new List<object>(counts.Length);
        var width = new List<decimal?>(counts.Length);
        int tallest = 1;
        for (int b = 0; b < counts.Length; b++)
        {
            x.Add(unit.From((edges[b] + edges[b + 1]) / 2));
            width.Add((decimal)unit.From(edges[b + 1] - edges[b]));
            y.Add(counts[b]);
            tallest = Math.Max(tallest, counts[b]);
        }
        var data = new List<ITrace>
        {
            new Bar { Name = "Units", X = x, Y = y, WidthArray = width, Marker = new Plotly.Blazor.Traces.BarLib.Marker { Color = ChartStyle.BarColour } },
        };
        if (summary.Limits?.Lower is { } lower)
        {
            data.Add(LimitLine("Lower limit", unit.From(lower), tallest, ChartStyle.LowerLimitColour, ChartStyle.LowerLimitDash));
        }
        if (summary.Limits?.Upper is { } upper)
        {
            data.Add(LimitLine("Upper limit", unit.From(upper), tallest, ChartStyle.UpperLimitColour, ChartStyle.UpperLimitDash));
        }
        PlotLayout layout = ChartStyle.Layout($"{summary.Parameter} ({unit.Symbol})", "Units", reverseY: false);
        layout.Height = 320;
        return new ChartModel(data, layout, ChartStyle.Config());
    }

    private static Scatter LimitLine(string name, double x, int tallest, string colour, string dash) => new()
    {
        Name = name,
        Mode = ModeFlag.Lines,
        X = [x, x],
        Y = [0, tallest],
        Line = new Line { Color = colour, Dash = dash, Width = 3 },
    };
}
