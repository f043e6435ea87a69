namespace FilterQA.Core.Measurement;

/// <summary>One sampled point of a trace.</summary>
/// <param name="Index">Index of the point in the trace's grid.</param>
/// <param name="Hz">Its frequency, Hz.</param>
/// <param name="LossDb">Its loss, dB, positive for attenuation.</param>
public readonly record struct LossPoint(int Index, double Hz, double LossDb);
