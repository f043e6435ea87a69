namespace FilterQA.Core.Measurement;

/// <summary>Rejection over one stopband.</summary>
/// <param name="StartHz">Band start, Hz, as asked for.</param>
/// <param name="StopHz">Band stop, Hz, as asked for.</param>
/// <param name="MinRejectionDb">
/// Least relative attenuation in the band, dB: the least loss in the band minus the trace's minimum loss (positive when
/// the band is below the passband). When <paramref name="FloorLimited"/> is true this is only a lower bound ("at least").
/// Null when the band holds no point.
/// </param>
/// <param name="AbsoluteLossDb">The least loss in the band itself, dB (positive = attenuation); null when the band holds no point.</param>
/// <param name="AtHz">Frequency of that least-loss point, Hz (a sweep point, not interpolated); null when the band holds no point.</param>
/// <param name="FloorLimited">
/// True when the least-loss point is at the noise floor: it keeps less than <see cref="NoiseFloor.MarginDb"/> to the floor
/// (or, with an estimated floor, the points around it scatter like noise; see <see cref="NoiseFloor"/>). The rejection is then
/// at least the value given, never a plain number. False when the band holds no point or no floor is known.
/// </param>
/// <param name="FloorLossDb">
/// The floor level the decision used, dB (positive loss): the least loss of the caller's floor trace inside the band, or the
/// estimated floor level. Null when no floor is known or the band holds no point.
/// </param>
public sealed record StopbandResult(double StartHz, double StopHz, double? MinRejectionDb, double? AbsoluteLossDb, double? AtHz, bool FloorLimited,
    double? FloorLossDb);
