namespace FilterQA.Core.Templates;

/// <summary>Unit a frequency tolerance is stated in.</summary>
public enum ToleranceUnit
{
    /// <summary>Hertz.</summary>
    Hertz,

    /// <summary>Parts per million of the nominal frequency.</summary>
    PartsPerMillion,
}
