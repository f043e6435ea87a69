namespace FilterQA.Core.Statistics;

/// <summary>Choices for <see cref="ParameterSummary.Compute"/>; the defaults suit a yield report.</summary>
public sealed record SummaryOptions
{
    /// <summary>σ for the capability indices; default the overall s (strictly Pp/Ppk).</summary>
    public SigmaBasis Sigma { get; init; } = SigmaBasis.OverallSample;

    /// <summary>σ_within in the parameter's unit when <see cref="Sigma"/> is <see cref="SigmaBasis.Given"/>; otherwise null.</summary>
    public double? GivenSigma { get; init; }

    /// <summary>Confidence of the Cpk lower bound, 0..1 exclusive; default 0.95.</summary>
    public double Confidence { get; init; } = 0.95;

    /// <summary>Bin rule when <see cref="BinEdges"/> is null; default Freedman–Diaconis.</summary>
    public HistogramBinRule BinRule { get; init; } = HistogramBinRule.FreedmanDiaconis;

    /// <summary>Histogram edges in the parameter's unit, strictly increasing; null to use <see cref="BinRule"/>.</summary>
    public IReadOnlyList<double>? BinEdges { get; init; }
}
