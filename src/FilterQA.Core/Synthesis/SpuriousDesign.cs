namespace FilterQA.Core.Synthesis;

/// <summary>
/// An unwanted resonance of a bandpass filter: a narrow second-order path added to S21.
/// </summary>
/// <param name="OffsetHz">Its frequency relative to the filter's centre, Hz.</param>
/// <param name="WidthHz">Its 3 dB width, Hz.</param>
/// <param name="RejectionDb">Good units: how far its peak lies below the passband, dB (positive).</param>
/// <param name="RejectionSigmaDb">Unit-to-unit standard deviation of that, dB.</param>
/// <param name="DefectRejectionDb">Units with <see cref="DefectKind.StrongUnwantedMode"/>: the same, dB.</param>
internal sealed record SpuriousDesign(double OffsetHz, double WidthHz, double RejectionDb, double RejectionSigmaDb, double DefectRejectionDb);
