using Plotly.Blazor;

namespace FilterQA.Web.Ui.Charts;

/// <summary>What a Plotly chart draws: its traces, layout and configuration, built on the server.</summary>
public sealed record ChartModel(IList<ITrace> Data, Layout Layout, Config Config);
