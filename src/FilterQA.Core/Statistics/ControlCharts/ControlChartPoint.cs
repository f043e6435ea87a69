namespace FilterQA.Core.Statistics.ControlCharts;

/// <summary>
/// One subgroup on an X-bar and S chart with its own three-sigma limits (limits depend on the subgroup's size), in
/// the parameter's SI unit.
/// </summary>
/// <param name="Subgroup">The subgroup plotted.</param>
/// <param name="MeanLower">Lower control limit of x̄: x̿ − A3(n)·s̄.</param>
/// <param name="MeanUpper">Upper control limit of x̄: x̿ + A3(n)·s̄.</param>
/// <param name="SigmaOfMean">σ of x̄ for this n, A3(n)·s̄/3 (the width of one Western Electric zone).</param>
/// <param name="SLower">Lower control limit of s: B3(n)·s̄ (0 for n ≤ 5).</param>
/// <param name="SUpper">Upper control limit of s: B4(n)·s̄.</param>
/// <param name="Signals">The out-of-control rules this point completes, none when in control.</param>
public sealed record ControlChartPoint(Subgroup Subgroup, double MeanLower, double MeanUpper, double SigmaOfMean, double SLower, double SUpper,
    IReadOnlyList<ControlSignal> Signals);
