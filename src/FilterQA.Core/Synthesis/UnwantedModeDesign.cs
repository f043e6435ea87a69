namespace FilterQA.Core.Synthesis;

/// <summary>An unwanted (anharmonic) mode of a crystal: an extra motional arm above the main resonance.</summary>
/// <param name="OffsetHz">Its series resonance above the unit's fs, Hz.</param>
/// <param name="OffsetSigmaHz">Spread of the offset, Hz.</param>
/// <param name="ROhm">Its motional resistance, ohm (good units).</param>
/// <param name="RSigmaRelative">Relative spread of that resistance.</param>
/// <param name="InductanceRatio">Its motional inductance divided by the main arm's L1.</param>
internal sealed record UnwantedModeDesign(double OffsetHz, double OffsetSigmaHz, double ROhm, double RSigmaRelative, double InductanceRatio);
