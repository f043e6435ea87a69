namespace FilterQA.Core.Templates;

/// <summary>Which side of a free limit line a unit must stay on (in loss, positive dB).</summary>
public enum LimitBoundary
{
    /// <summary>An upper boundary: the loss must not exceed the line (a maximum loss).</summary>
    Upper,

    /// <summary>A lower boundary: the loss must not fall below the line (a minimum loss).</summary>
    Lower,
}
