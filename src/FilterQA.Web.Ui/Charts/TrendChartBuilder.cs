using FilterQA.Core.Statistics.ControlCharts;
using FilterQA.Web.Ui.Services;
using Plotly.Blazor;
using PlotLayout = Plotly.Blazor.Layout;
using Plotly.Blazor.Traces;
using Plotly.Blazor.Traces.ScatterLib;

namespace FilterQA.Web.Ui.Charts;

/// <summary>The trends page's charts: yields per lot, the X-bar and S control charts of one rule, and its Cpk per lot.</summary>
public static class TrendChartBuilder
{
    /// <summary>
    /// Capability commonly asked of an established process (common practice, no published source); drawn as a
    /// reference line on the Cpk chart, not used for any decision.
    /// </summary>
    public const double CpkReference = 1.33;

    /// <summary>First-pass and final yield per lot, in percent, lots oldest first.</summary>
    public static ChartModel Yields(IReadOnlyList<TrendLot> lots)
    {
        ArgumentNullException.ThrowIfNull(lots);
        List<object> x = lots.Select(l => (object)l.LotNumber).ToList();
        var data = new List<ITrace>
        {
            Series("First-pass yield (%)", x, lots.Select(l => (object)(l.FirstPassYield * 100)).ToList(), ChartStyle.BarColour, "dot"),
            Series("Final yield (%)", x, lots.Select(l => (object)(l.FinalYield * 100)).ToList(), ChartStyle.MeasuredColour, "solid"),
        };
        PlotLayout layout = ChartStyle.Layout("Lot (oldest first)", "Yield (%)", reverseY: false);
        layout.Height = 340;
        return new ChartModel(data, layout, ChartStyle.Config());
    }

    /// <summary>
    /// The X-bar chart of one rule: lot means with the centre line x̿, the control limits of each lot (they differ with
    /// its sample size) and the specification limits each lot was judged against; out-of-control lots as red diamonds.
    /// </summary>
    public static ChartModel Means(ParameterTrend trend, XBarSChart chart, DisplayUnit unit)
    {
        ArgumentNullException.ThrowIfNull(trend);
        ArgumentNullException.ThrowIfNull(chart);
        ArgumentNullException.ThrowIfNull(unit);
        IReadOnlyList<ControlChartPoint> points = chart.Points;
        List<object> x = points.Select(p => (object)p.Subgroup.Label).ToList();
        Dictionary<string, ParameterLot> lots = trend.Lots.ToDictionary(l => l.LotNumber, StringComparer.Ordinal);
        var data = new List<ITrace>
        {
            Series($"Lot mean ({unit.Symbol})", x, points.Select(p => (object)unit.From(p.Subgroup.Mean)).ToList(), ChartStyle.MeasuredColour, "solid"),
            Flat("Centre line x̿", x, unit.From(chart.GrandMean), ChartStyle.CentreLineColour, "solid"),
            Step("Upper control limit", x, points.Select(p => (object?)unit.From(p.MeanUpper)).ToList(), ChartStyle.ControlLimitColour, "dash"),
            Step("Lower control limit", x, points.Select(p => (object?)unit.From(p.MeanLower)).ToList(), ChartStyle.ControlLimitColour, "dash"),
        };
        List<object?> upperSpec = points.Select(p => lots[p.Subgroup.Label].Limits?.Upper is { } u ? (object?)unit.From(u) : null).ToList();
        List<object?> lowerSpec = points.Select(p => lots[p.Subgroup.Label].Limits?.Lower is { } l ? (object?)unit.From(l) : null).ToList();
        if (upperSpec.Any(v => v is not null))
        {
            data.Add(Step("Upper specification limit", x, upperSpec, ChartStyle.UpperLimitColour, ChartStyle.UpperLimitDash));
        }
        if (lowerSpec.Any(v => v is not null))
        {
            data.Add(Step("Lower specification limit", x, lowerSpec, ChartStyle.LowerLimitColour, ChartStyle.LowerLimitDash));
        }
        AddSignals(data, points.Where(p => p.Signals.Any(s => s.Chart == ControlChart.Mean)), p => unit.From(p.Subgroup.Mean), "Out of control (mean)");
        PlotLayout layout = ChartStyle.Layout("Lot (oldest first)", $"{trend.RuleId} mean ({unit.Symbol})", reverseY: false);
        layout.Height = 380;
        return new ChartModel(data, layout, ChartStyle.Config());
    }

    /// <summary>The S chart of one rule: each lot's standard deviation with s̄ and the limits B3·s̄ and B4·s̄ of its sample size.</summary>
    public static ChartModel Spreads(ParameterTrend trend, XBarSChart chart, DisplayUnit unit)
    {
        ArgumentNullException.ThrowIfNull(trend);
        ArgumentNullException.ThrowIfNull(chart);
        ArgumentNullException.ThrowIfNull(unit);
        IReadOnlyList<ControlChartPoint> points = chart.Points;
        List<object> x = points.Select(p => (object)p.Subgroup.Label).ToList();
        var data = new List<ITrace>
        {
            Series($"Lot standard deviation ({unit.Symbol})", x, points.Select(p => (object)unit.From(p.Subgroup.StandardDeviation)).ToList(), ChartStyle.MeasuredColour, "solid"),
            Flat("Centre line s̄", x, unit.From(chart.AverageS), ChartStyle.CentreLineColour, "solid"),
            Step("Upper control limit", x, points.Select(p => (object?)unit.From(p.SUpper)).ToList(), ChartStyle.ControlLimitColour, "dash"),
            Step("Lower control limit", x, points.Select(p => (object?)unit.From(p.SLower)).ToList(), ChartStyle.ControlLimitColour, "dash"),
        };
        AddSignals(data, points.Where(p => p.Signals.Any(s => s.Chart == ControlChart.StandardDeviation)), p => unit.From(p.Subgroup.StandardDeviation), "Out of control (spread)");
        PlotLayout layout = ChartStyle.Layout("Lot (oldest first)", $"{trend.RuleId} standard deviation ({unit.Symbol})", reverseY: false);
        layout.Height = 320;
        return new ChartModel(data, layout, ChartStyle.Config());
    }

    /// <summary>Ppk (Cpk from the overall s of each lot) per lot, with the 1.33 reference line; lots without a value are gaps.</summary>
    public static ChartModel Capability(ParameterTrend trend)
    {
        ArgumentNullException.ThrowIfNull(trend);
        List<object> x = trend.Lots.Select(l => (object)l.LotNumber).ToList();
        var data = new List<ITrace>
        {
            Series("Ppk of the lot", x, trend.Lots.Select(l => l.Capability is { } c && double.IsFinite(c.Cpk) ? (object)c.Cpk : null!).ToList(), ChartStyle.MeasuredColour, "solid"),
            Flat("1.33 (reference)", x, CpkReference, ChartStyle.CentreLineColour, "dot"),
        };
        PlotLayout layout = ChartStyle.Layout("Lot (oldest first)", $"{trend.RuleId} Ppk", reverseY: false);
        layout.Height = 300;
        return new ChartModel(data, layout, ChartStyle.Config());
    }

    private static void AddSignals(List<ITrace> data, IEnumerable<ControlChartPoint> flagged, Func<ControlChartPoint, double> y, string name)
    {
        ControlChartPoint[] points = flagged.ToArray();
        if (points.Length == 0)
        {
            return;
        }
        data.Add(new Scatter
        {
            Name = name,
            Mode = ModeFlag.Markers,
            X = points.Select(p => (object)p.Subgroup.Label).ToList(),
            Y = points.Select(p => (object)y(p)).ToList(),
            Marker = new Marker { Color = ChartStyle.SignalColour, Size = 14, Symbol = Plotly.Blazor.Traces.ScatterLib.MarkerLib.SymbolEnum.Diamond },
        });
    }

    private static Scatter Series(string name, List<object> x, List<object> y, string colour, string dash) => new()
    {
        Name = name,
        Mode = ModeFlag.Lines | ModeFlag.Markers,
        X = x,
        Y = y,
        Line = new Line { Color = colour, Dash = dash, Width = 2 },
        Marker = new Marker { Color = colour, Size = 8 },
    };

    private static Scatter Flat(string name, List<object> x, double y, string colour, string dash) => new()
    {
        Name = name,
        Mode = ModeFlag.Lines,
        X = x,
        Y = x.Select(_ => (object)y).ToList(),
        Line = new Line { Color = colour, Dash = dash, Width = 2 },
    };

    // Limits that change from lot to lot (sample size, template revision) are drawn as steps centred on each lot.
    private static Scatter Step(string name, List<object> x, List<object?> y, string colour, string dash) => new()
    {
        Name = name,
        Mode = ModeFlag.Lines,
        X = x,
        Y = y.Cast<object>().ToList(),
        Line = new Line { Color = colour, Dash = dash, Width = 2, Shape = Plotly.Blazor.Traces.ScatterLib.LineLib.ShapeEnum.Hvh },
    };
}
