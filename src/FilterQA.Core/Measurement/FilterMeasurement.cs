namespace FilterQA.Core.Measurement;

/// <summary>The measurements of one transmission trace, made by <see cref="FilterMeasurer.Measure"/>. Immutable.</summary>
/// <param name="MinLossHz">Frequency of the sampled minimum-loss point, Hz (no interpolation).</param>
/// <param name="InsertionLossDb">Loss at that point, dB, positive = attenuation (the insertion loss at maximum transmission).</param>
/// <param name="Bands">One entry per requested level, in request order, with the innermost edges.</param>
/// <param name="RippleDb">Passband ripple (max − min loss) over the requested band, dB; null when none was requested or the band holds no point.</param>
/// <param name="Stopbands">One entry per requested stopband, in request order.</param>
/// <param name="Warnings">Everything the user should know, in the order found.</param>
public sealed record FilterMeasurement(
    double MinLossHz,
    double InsertionLossDb,
    IReadOnlyList<LevelBandwidth> Bands,
    double? RippleDb,
    IReadOnlyList<StopbandResult> Stopbands,
    IReadOnlyList<MeasurementWarning> Warnings);
