namespace FilterQA.Core.Synthesis;

/// <summary>The kind of device a demo part is, which decides the physical model used to synthesise it.</summary>
public enum DemoPartFamily
{
    /// <summary>Ceramic IF bandpass filter (Chebyshev prototype, finite resonator Q).</summary>
    CeramicFilter,

    /// <summary>Monolithic or discrete crystal bandpass filter (Chebyshev prototype, very high resonator Q).</summary>
    CrystalFilter,

    /// <summary>Surface-acoustic-wave bandpass filter (transversal with linear phase, or resonator type).</summary>
    SawFilter,

    /// <summary>Quartz crystal resonator in a series 50 ohm fixture (Butterworth–Van Dyke model with unwanted modes).</summary>
    CrystalResonator,

    /// <summary>Series RLC trap shunted to ground between the two ports.</summary>
    LcTrap,
}
