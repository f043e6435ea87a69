namespace FilterQA.Core.Statistics;

/// <summary>One lot's summary in a trend of one parameter.</summary>
/// <param name="LotId">Lot identifier; unique in a trend.</param>
/// <param name="TestedAt">When the lot was tested (UTC offset kept).</param>
/// <param name="Mean">Mean of the parameter, its SI unit.</param>
/// <param name="Cpk">Cpk of the parameter, or null when not computed.</param>
/// <param name="FirstPassYield">First-pass yield of the lot, 0..1.</param>
/// <param name="FinalYield">Final yield of the lot, 0..1.</param>
public sealed record LotTrendPoint(string LotId, DateTimeOffset TestedAt, double Mean, double? Cpk, double FirstPassYield, double FinalYield);
