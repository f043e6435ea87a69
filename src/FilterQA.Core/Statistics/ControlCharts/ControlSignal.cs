namespace FilterQA.Core.Statistics.ControlCharts;

/// <summary>An out-of-control signal: a rule a point completes on one of the two charts, with the side it is on.</summary>
/// <param name="Chart">The X-bar or the S chart.</param>
/// <param name="Rule">The Western Electric rule.</param>
/// <param name="Above">True above the centre line, false below.</param>
public sealed record ControlSignal(ControlChart Chart, ControlRule Rule, bool Above)
{
    /// <summary>The signal in plain words, e.g. "mean above the upper control limit (rule 1)".</summary>
    public string Describe()
    {
        string side = Above ? "above" : "below";
        string what = Chart == ControlChart.Mean ? "mean" : "standard deviation";
        return Rule switch
        {
            ControlRule.BeyondThreeSigma => $"{what} {side} the {(Above ? "upper" : "lower")} control limit (rule 1)",
            ControlRule.TwoOfThreeBeyondTwoSigma => $"{what}: 2 of the last 3 lots more than 2 sigma {side} the centre line (rule 2)",
            ControlRule.FourOfFiveBeyondOneSigma => $"{what}: 4 of the last 5 lots more than 1 sigma {side} the centre line (rule 3)",
            _ => $"{what}: 8 lots in a row {side} the centre line (rule 4)",
        };
    }
}
