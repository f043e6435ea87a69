namespace FilterQA.Core.Templates;

/// <summary>Whether a loss limit is read as measured or relative to the unit's own minimum loss.</summary>
public enum LossReference
{
    /// <summary>Relative attenuation: loss at f minus the minimum loss of the main trace, dB.</summary>
    Relative,

    /// <summary>The loss as measured (after thru normalisation), dB, positive for attenuation.</summary>
    Absolute,
}
