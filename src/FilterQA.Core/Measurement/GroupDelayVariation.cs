namespace FilterQA.Core.Measurement;

/// <summary>Group delay over a band: its extremes and their spread.</summary>
/// <param name="MinDelayS">Least group delay in the band, s.</param>
/// <param name="MinAtHz">Where it occurs, Hz (a sweep point).</param>
/// <param name="MaxDelayS">Greatest group delay in the band, s.</param>
/// <param name="MaxAtHz">Where it occurs, Hz (a sweep point).</param>
public sealed record GroupDelayVariation(double MinDelayS, double MinAtHz, double MaxDelayS, double MaxAtHz)
{
    /// <summary>Variation (group-delay ripple), MaxDelayS − MinDelayS, s, ≥ 0.</summary>
    public double VariationS => MaxDelayS - MinDelayS;
}
