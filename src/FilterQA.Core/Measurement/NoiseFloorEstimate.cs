using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Measurement;

/// <summary>
/// A noise floor estimated from a sweep by <see cref="NoiseFloor.Estimate(ResponseTrace)"/>.
/// </summary>
/// <param name="LossDb">
/// The floor as a loss, dB (positive; a larger number is a deeper floor). When <paramref name="NoiseSeen"/> is true,
/// the noise power level of the deepest part of the sweep (the mean of the linear power there, in dB). When false,
/// the deepest part is clean, so the floor is at least <see cref="NoiseFloor.MarginDb"/> deeper than it: this value is
/// that lower bound on the depth.
/// </param>
/// <param name="NoiseSeen">True when the deepest part of the sweep scatters like noise (see <see cref="NoiseFloor.NoiseScatterThresholdDb"/>).</param>
/// <param name="ScatterDb">Robust point-to-point scatter of the loss in that part, dB (a standard-deviation equivalent).</param>
/// <param name="StartHz">First frequency of the part of the sweep the estimate was taken from, Hz.</param>
/// <param name="StopHz">Last frequency of that part, Hz.</param>
public sealed record NoiseFloorEstimate(double LossDb, bool NoiseSeen, double ScatterDb, double StartHz, double StopHz);
