namespace FilterQA.Core.Statistics;

/// <summary>One bar of a Pareto of failing rules.</summary>
/// <param name="Rule">Rule (limit) name.</param>
/// <param name="Count">Failures of the rule.</param>
/// <param name="Share">Count / total failures, 0..1.</param>
/// <param name="CumulativeShare">Sum of shares of this bar and all bars before it, 0..1 (exactly 1 at the last bar).</param>
public sealed record ParetoEntry(string Rule, int Count, double Share, double CumulativeShare);
