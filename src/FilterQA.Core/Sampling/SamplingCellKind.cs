namespace FilterQA.Core.Sampling;

/// <summary>What a cell of a single-sampling table holds.</summary>
public enum SamplingCellKind
{
    /// <summary>An acceptance number and a rejection number (Ac/Re).</summary>
    Plan,

    /// <summary>↓: use the first plan below the arrow (its letter's sample size and its Ac/Re).</summary>
    ArrowDown,

    /// <summary>↑: use the first plan above the arrow (its letter's sample size and its Ac/Re).</summary>
    ArrowUp,

    /// <summary>No entry: the letter is not used in this AQL column (tightened letter S in the columns held here).</summary>
    Blank,
}
