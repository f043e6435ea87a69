namespace FilterQA.Core.Sampling;

/// <summary>The average outgoing quality limit: the worst AOQ over all incoming fractions defective.</summary>
/// <param name="AoqlFraction">Maximum of p·Pa(p)·(N − n)/N, fraction 0..1.</param>
/// <param name="AtFractionDefective">Incoming fraction defective p at which the maximum occurs, 0..1.</param>
public readonly record struct AoqlResult(double AoqlFraction, double AtFractionDefective);
