using FilterQA.Core.Statistics;

namespace FilterQA.Data.Services;

/// <summary>
/// Lot statistics from the stored rule results: yield under the part's retest policy, a Pareto of
/// the rules that block the counted measurements, and a summary per rule of its measured values
/// with the rule's limits.
/// </summary>
public sealed record LotStatistics(LotYield Yield, ParetoChart FailingRules, IReadOnlyList<ParameterSummary> Parameters);
