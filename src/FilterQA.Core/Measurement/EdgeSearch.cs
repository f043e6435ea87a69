namespace FilterQA.Core.Measurement;

/// <summary>Which crossing of a level a band-edge search takes on each side of the minimum-loss point.</summary>
public enum EdgeSearch
{
    /// <summary>
    /// Walk outward from the minimum-loss point and take the first crossing on each side: the pass
    /// bandwidth convention, conservative for a minimum-bandwidth limit (a ripple that dips
    /// below the level narrows the band).
    /// </summary>
    Innermost,

    /// <summary>
    /// Walk inward from each sweep end and take the first point where the loss falls below the level: the
    /// stop-bandwidth convention (the spacing beyond which attenuation stays at or above the level),
    /// conservative for a maximum-bandwidth or shape-factor limit. Needs the sweep end on that side to be
    /// at or above the level; otherwise that edge is null.
    /// </summary>
    Outermost,
}
