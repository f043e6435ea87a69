namespace FilterQA.Core.Templates;

/// <summary>The unit of a rule's limit and of its uncertainty.</summary>
public enum RuleUnit
{
    /// <summary>Hertz.</summary>
    Hertz,

    /// <summary>Parts per million of the nominal frequency.</summary>
    PartsPerMillion,

    /// <summary>Decibels (loss, positive for attenuation, or a level difference).</summary>
    Decibel,

    /// <summary>Seconds.</summary>
    Second,

    /// <summary>Ohms.</summary>
    Ohm,

    /// <summary>Farads.</summary>
    Farad,

    /// <summary>A plain number (a quality factor, a shape factor).</summary>
    Ratio,
}
