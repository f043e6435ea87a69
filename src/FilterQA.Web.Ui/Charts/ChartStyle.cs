using Plotly.Blazor;
using PlotLayout = Plotly.Blazor.Layout;
using Plotly.Blazor.LayoutLib;

namespace FilterQA.Web.Ui.Charts;

/// <summary>Colours, fonts and axes shared by every chart, so the screens read alike from a step back.</summary>
internal static class ChartStyle
{
    public const string MeasuredColour = "#1f4e9c";
    public const string EnvelopeFill = "rgba(31, 78, 156, 0.25)";
    public const string UpperLimitColour = "#b3261e";
    public const string LowerLimitColour = "#8a5a00";
    public const string BarColour = "#4a6f8a";

    // A second set of limits (the recorded revision beside a draft) is grey and dash-dot, so it reads as the older one.
    public const string RecordedLimitColour = "#6b6b6b";
    public const string RecordedLimitDash = "dashdot";

    // Control charts: centre and control limits apart from the specification limits (which use the limit colours).
    public const string CentreLineColour = "#2e7d32";
    public const string ControlLimitColour = "#6a1b9a";
    public const string SignalColour = "#b3261e";

    // Upper and lower boundaries differ in dash pattern as well as colour, so they read without colour.
    public const string UpperLimitDash = "dash";
    public const string LowerLimitDash = "dot";

    public const string LossAxisTitle = "Loss (dB) — larger loss plotted lower";

    public static Config Config() => new()
    {
        Responsive = true,
        DisplayLogo = false,
        ScrollZoom = Plotly.Blazor.ConfigLib.ScrollZoomFlag.False,
    };

    public static PlotLayout Layout(string xTitle, string yTitle, bool reverseY) => new()
    {
        Font = new Font { Size = 16 },
        Height = 440,
        Margin = new Margin { L = 80, R = 24, T = 24, B = 64 },
        ShowLegend = true,
        Legend = [new Legend { Orientation = Plotly.Blazor.LayoutLib.LegendLib.OrientationEnum.H, Y = -0.2m }],
        XAxis = [new XAxis { Title = new Plotly.Blazor.LayoutLib.XAxisLib.Title { Text = xTitle } }],
        YAxis =
        [
            new YAxis
            {
                Title = new Plotly.Blazor.LayoutLib.YAxisLib.Title { Text = yTitle },
                AutoRange = reverseY ? Plotly.Blazor.LayoutLib.YAxisLib.AutoRangeEnum.Reversed : Plotly.Blazor.LayoutLib.YAxisLib.AutoRangeEnum.True,
            },
        ],
    };
}
