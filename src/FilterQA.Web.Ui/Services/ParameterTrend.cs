using FilterQA.Core.Statistics;
using FilterQA.Core.Statistics.ControlCharts;

namespace FilterQA.Web.Ui.Services;

/// <summary>
/// One rule's measured value across the lots, oldest first: per lot its summary, the X-bar and S chart of the lots
/// with two or more values (null with the reason in <see cref="ChartNote"/> when it cannot be drawn), and the trend
/// of means and Cpk.
/// </summary>
public sealed record ParameterTrend(string RuleId, string Unit, IReadOnlyList<ParameterLot> Lots, LotTrend Trend, XBarSChart? Chart, string? ChartNote);
