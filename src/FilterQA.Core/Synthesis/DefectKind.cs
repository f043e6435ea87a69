namespace FilterQA.Core.Synthesis;

/// <summary>
/// What is wrong with a synthetic unit. Each defect moves one physical parameter far enough to
/// break the matching limit of the demo scenario clearly, and leaves every other parameter as a good
/// unit with the same serial would have it. <see cref="DemoPart.Defects"/> lists the kinds a part can have.
/// </summary>
public enum DefectKind
{
    /// <summary>A good unit: every parameter drawn from the part's normal spread.</summary>
    None,

    /// <summary>
    /// The centre (filter), series resonance (resonator) or notch (trap) has moved outside its tolerance.
    /// Only for parts whose limits include a centre frequency.
    /// </summary>
    CentreDrift,

    /// <summary>
    /// Stopband rejection too low: a raised feedthrough floor (filters) or a shallow notch (trap).
    /// </summary>
    LowRejection,

    /// <summary>
    /// An unwanted response too strong: an unwanted mode of a crystal resonator less than 6 dB below the
    /// main response, or a spurious response of a crystal filter less than 60 dB below its passband.
    /// </summary>
    StrongUnwantedMode,

    /// <summary>
    /// Too much loss: passband insertion loss (filters), motional resistance R1 (resonator) or loss away
    /// from the notch (trap) beyond its limit.
    /// </summary>
    HighLoss,
}
