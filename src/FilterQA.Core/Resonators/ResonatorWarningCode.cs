namespace FilterQA.Core.Resonators;

/// <summary>
/// Stable codes of <see cref="ResonatorWarning"/>. The names are part of the report contract: never
/// rename one; add new codes at the end.
/// </summary>
public enum ResonatorWarningCode
{
    /// <summary>The sweep has too few points to locate and fit a resonance (fewer than 5).</summary>
    TooFewPoints,

    /// <summary>The main response lies at the first or last point: the resonance may be outside the span; nothing was fitted.</summary>
    ResonanceAtSpanEdge,

    /// <summary>Neither half-power point of the main response lies inside the span; nothing was fitted.</summary>
    BandwidthNotInSpan,

    /// <summary>
    /// Fewer points than <see cref="ResonatorOptions.MinPointsInBandwidth"/> lie within fs ± B/2, B = fs/QL
    /// (common practice, no published source): peak level, R1 and Q are poorly defined.
    /// </summary>
    TooFewPointsInBandwidth,

    /// <summary>
    /// The frequency step near fs exceeds <see cref="ResonatorOptions.MaxStepFractionOfBandwidth"/>·B; the message
    /// gives the worst sampled-peak error 10·log10(1 + (Δ/B)²) dB.
    /// </summary>
    StepTooCoarse,

    /// <summary>No antiresonance (parallel resonance) inside the span: C0 and fp are not reported (a series LC has none).</summary>
    NoAntiresonance,

    /// <summary>The least-squares refinement stopped at its iteration limit before converging; fitted values are the last iterate.</summary>
    FitNotConverged,

    /// <summary>The fitted model leaves an RMS residual above the allowed fraction of the peak response and above 3× the noise.</summary>
    FitPoorResidual,

    /// <summary>The input has no phase and the fixture needs it (one-port, shunt): only the peak and notch fields are reported.</summary>
    MagnitudeOnlyNotFitted,

    /// <summary>More unwanted modes were found than are modelled as arms of their own; the weakest are left out of the fit.</summary>
    ModesNotModelled,
}
