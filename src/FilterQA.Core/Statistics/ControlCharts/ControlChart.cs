namespace FilterQA.Core.Statistics.ControlCharts;

/// <summary>Which of the two charts of an X-bar and S pair a signal is on.</summary>
public enum ControlChart
{
    /// <summary>The chart of subgroup means x̄.</summary>
    Mean,

    /// <summary>The chart of subgroup standard deviations s.</summary>
    StandardDeviation,
}
