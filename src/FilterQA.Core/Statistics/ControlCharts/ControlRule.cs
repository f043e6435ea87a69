namespace FilterQA.Core.Statistics.ControlCharts;

/// <summary>
/// The Western Electric run rules (Western Electric, "Statistical Quality Control Handbook", 1956; as listed in
/// Montgomery, "Introduction to Statistical Quality Control", section 5.3.6), applied to the X-bar chart with zones
/// of one σ of x̄; rule 1 is also applied to the S chart.
/// </summary>
public enum ControlRule
{
    /// <summary>Rule 1: one point beyond a three-sigma control limit.</summary>
    BeyondThreeSigma = 1,

    /// <summary>Rule 2: two of three consecutive points beyond two sigma, on the same side of the centre line.</summary>
    TwoOfThreeBeyondTwoSigma = 2,

    /// <summary>Rule 3: four of five consecutive points beyond one sigma, on the same side of the centre line.</summary>
    FourOfFiveBeyondOneSigma = 3,

    /// <summary>Rule 4: eight consecutive points on the same side of the centre line.</summary>
    EightOnOneSide = 4,
}
