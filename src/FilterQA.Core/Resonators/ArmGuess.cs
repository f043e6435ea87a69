namespace FilterQA.Core.Resonators;

/// <summary>Starting values of one motional arm, read off the data; also the scale of its fit parameters.</summary>
/// <param name="FsHz">Series resonance, Hz.</param>
/// <param name="BandwidthHz">Loaded half-power width, Hz: the unit of the frequency parameter, so fs is fitted in widths, not in hertz.</param>
/// <param name="ROhm">Motional resistance, ohm (fitted as a logarithm).</param>
/// <param name="Q">Unloaded Q (fitted as a logarithm).</param>
internal readonly record struct ArmGuess(double FsHz, double BandwidthHz, double ROhm, double Q);
