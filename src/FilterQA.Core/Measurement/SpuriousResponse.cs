namespace FilterQA.Core.Measurement;

/// <summary>One spurious response: a local maximum of transmission (local minimum of loss) outside the passband.</summary>
/// <param name="Hz">Frequency of the sampled point, Hz (not interpolated).</param>
/// <param name="LossDb">Its loss, dB, positive = attenuation.</param>
/// <param name="RelativeLevelDb">How far it lies below the minimum-loss (passband) level, dB: LossDb − minimum loss; positive = below the passband.</param>
/// <param name="ProminenceDb">How far it stands out from the trace around it, dB (see <see cref="SpuriousResponses"/>); &gt; 0.</param>
public sealed record SpuriousResponse(double Hz, double LossDb, double RelativeLevelDb, double ProminenceDb);
