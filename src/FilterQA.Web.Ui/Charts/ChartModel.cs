using Plotly.Blazor;
using PlotLayout = Plotly.Blazor.Layout;

namespace FilterQA.Web.Ui.Charts;

/// <summary>What a Plotly chart draws: its traces, layout and configuration, built on the server.</summary>
public sealed record ChartModel(IList<ITrace> Data, PlotLayout Layout, Config Config);
