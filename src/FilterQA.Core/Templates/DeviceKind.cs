namespace FilterQA.Core.Templates;

/// <summary>What kind of part a template describes; it decides which rule kinds make sense.</summary>
public enum DeviceKind
{
    /// <summary>A bandpass filter (ceramic, crystal, SAW or LC): passband, edges, stopbands.</summary>
    BandpassFilter,

    /// <summary>A band-stop filter or trap: a notch with passbands either side.</summary>
    BandStop,

    /// <summary>A quartz (or ceramic) resonator measured in a series fixture.</summary>
    Resonator,
}
