namespace FilterQA.Core.Statistics;

/// <summary>
/// Capability of one parameter against its limits. Indices are dimensionless; null where a limit
/// is missing (Cp needs both, Cpu the upper, Cpl the lower).
/// </summary>
/// <param name="Mean">Mean used, parameter unit.</param>
/// <param name="Sigma">Standard deviation used, parameter unit, &gt; 0.</param>
/// <param name="Count">Values the estimate rests on (n).</param>
/// <param name="Basis">Where <paramref name="Sigma"/> came from.</param>
/// <param name="Cp">(USL − LSL)/(6σ), or null for one-sided limits.</param>
/// <param name="Cpu">(USL − μ)/(3σ), or null without an upper limit.</param>
/// <param name="Cpl">(μ − LSL)/(3σ), or null without a lower limit.</param>
/// <param name="Cpk">min(Cpu, Cpl) over the limits given (one-sided: the one index).</param>
/// <param name="Confidence">Confidence of <paramref name="CpkLowerBound"/>, 0..1.</param>
/// <param name="CpkLowerBound">Bissell (1990) lower confidence bound Ĉpk − z_{1−α}·√(1/(9n) + Ĉpk²/(2(n − 1))).</param>
/// <param name="EstimatedPpmOutside">Parts per million outside the limits if the values were normal: 10⁶·(Φ(−3·Cpu) + Φ(−3·Cpl)).</param>
public sealed record CapabilityIndices(
    double Mean,
    double Sigma,
    int Count,
    SigmaBasis Basis,
    double? Cp,
    double? Cpu,
    double? Cpl,
    double Cpk,
    double Confidence,
    double CpkLowerBound,
    double EstimatedPpmOutside)
{
    /// <summary>True when σ is the overall s: the indices are then strictly Pp/Ppk.</summary>
    public bool IsPerformanceIndex => Basis == SigmaBasis.OverallSample;
}
