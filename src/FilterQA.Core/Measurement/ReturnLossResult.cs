namespace FilterQA.Core.Measurement;

/// <summary>The worst match over a band of a reflection trace.</summary>
/// <param name="MinReturnLossDb">Least return loss in the band, dB (positive for a passive port; larger is a better match).</param>
/// <param name="AtHz">Where it occurs, Hz (a sweep point, not interpolated).</param>
/// <param name="MaxReflectionMagnitude">|Γ| there, 10^(−RL/20), dimensionless (below 1 for a passive port).</param>
/// <param name="MaxVswr">VSWR there, (1 + |Γ|)/(1 − |Γ|), ≥ 1; null when |Γ| ≥ 1 (return loss ≤ 0 dB), where it is not finite.</param>
public sealed record ReturnLossResult(double MinReturnLossDb, double AtHz, double MaxReflectionMagnitude, double? MaxVswr);
