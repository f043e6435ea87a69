namespace FilterQA.Core.Resonators;

/// <summary>
/// How the resonator was connected to the analyser. Each connection loads the resonator with a
/// different external resistance R<sub>ext</sub>, which sets the loaded Q.
/// </summary>
public enum ResonatorFixture
{
    /// <summary>
    /// The part in series between two Z0 ports: S21 = 2·Z0/(2·Z0 + Z); R<sub>ext</sub> = 2·Z0.
    /// The main response is a transmission peak at the series resonance.
    /// </summary>
    SeriesThrough,

    /// <summary>
    /// The part terminating one port: Z = Z0·(1 + S11)/(1 − S11); R<sub>ext</sub> = Z0.
    /// The main response is a dip of |S11| at the series resonance.
    /// </summary>
    OnePortReflection,

    /// <summary>
    /// A series-resonant trap from the through line to ground: S21 = 2·Z/(2·Z + Z0); R<sub>ext</sub> = Z0/2
    /// (the two Z0 ports in parallel, as the trap sees them). The main response is a notch of |S21|.
    /// </summary>
    ShuntToGround,
}
