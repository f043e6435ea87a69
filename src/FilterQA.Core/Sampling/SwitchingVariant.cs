namespace FilterQA.Core.Sampling;

/// <summary>Which rule moves inspection from normal to reduced.</summary>
public enum SwitchingVariant
{
    /// <summary>
    /// MIL-STD-105E / Z1.4: the last 10 lots on normal all accepted, their total defectives within
    /// the Table VIII limit number (given by the caller: Table VIII is not transcribed), steady
    /// production, and reduced inspection approved.
    /// </summary>
    Mil105E,

    /// <summary>
    /// ISO 2859-1:1999: a switching score of at least 30, steady production and approval. The score
    /// rules (+3 when Ac ≥ 2 and the lot would have passed at the next tighter AQL, +2 when Ac ≤ 1 and
    /// the lot is accepted, otherwise reset to 0) are from memory.
    /// </summary>
    Iso2859Part1Of1999,
}
