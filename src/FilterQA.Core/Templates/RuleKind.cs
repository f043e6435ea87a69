namespace FilterQA.Core.Templates;

/// <summary>The kinds of limit rule; each has one rule class in <c>FilterQA.Core.Templates.Rules</c>.</summary>
public enum RuleKind
{
    /// <summary>Centre frequency within a tolerance of the nominal, from the edges at a level.</summary>
    CentreFrequency,

    /// <summary>Bandwidth at a level between a minimum and/or a maximum.</summary>
    Bandwidth,

    /// <summary>Insertion loss at most a maximum.</summary>
    InsertionLoss,

    /// <summary>Passband ripple (max − min loss over a band) at most a maximum.</summary>
    PassbandRipple,

    /// <summary>Stopband rejection at least a minimum over a band.</summary>
    StopbandRejection,

    /// <summary>Shape factor BW(stop level)/BW(pass level) at most a maximum.</summary>
    ShapeFactor,

    /// <summary>Unwanted responses in a band at least a stated amount below the passband.</summary>
    SpuriousResponse,

    /// <summary>Group-delay variation (max − min) over a band at most a maximum.</summary>
    GroupDelayVariation,

    /// <summary>Return loss at a port at least a minimum over a band.</summary>
    ReturnLoss,

    /// <summary>Series resonance within a tolerance of the nominal.</summary>
    SeriesResonance,

    /// <summary>Motional resistance R1 at most a maximum.</summary>
    MotionalResistance,

    /// <summary>Shunt capacitance C0 at most a maximum.</summary>
    ShuntCapacitance,

    /// <summary>Unloaded Q at least a minimum.</summary>
    UnloadedQ,

    /// <summary>Unwanted modes within a window at least a stated amount below the main response.</summary>
    UnwantedModes,

    /// <summary>Notch frequency within a tolerance of the nominal.</summary>
    NotchFrequency,

    /// <summary>Notch depth at least a minimum.</summary>
    NotchDepth,

    /// <summary>A free piecewise-linear boundary of (frequency, loss) points.</summary>
    LimitLine,
}
