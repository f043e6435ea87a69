using FilterQA.Web.Ui.Charts;
using Microsoft.AspNetCore.Components;
using Plotly.Blazor;

namespace FilterQA.Web.Ui.Components;

/// <summary>Draws a <see cref="ChartModel"/>; a new model redraws the chart in place (zoom with the mouse or touch; double-click resets).</summary>
public partial class SweepChart
{
    private readonly string _id = "chart-" + Guid.NewGuid().ToString("N")[..12];
    private PlotlyChart? _chart;
    private ChartModel? _drawn;
    private bool _rendered;

    /// <summary>What to draw (required).</summary>
    [Parameter, EditorRequired]
    public ChartModel Model { get; set; } = null!;

    /// <summary>A sentence under the chart saying what it shows (also read by screen readers); none by default.</summary>
    [Parameter]
    public string? Caption { get; set; }

    protected override async Task OnParametersSetAsync()
    {
        ArgumentNullException.ThrowIfNull(Model);
        if (_rendered && _chart is not null && !ReferenceEquals(_drawn, Model))
        {
            _drawn = Model;
            await _chart.React().ConfigureAwait(true);
        }
    }

    protected override void OnAfterRender(bool firstRender)
    {
        if (firstRender)
        {
            _rendered = true;
            _drawn = Model;
        }
    }
}
