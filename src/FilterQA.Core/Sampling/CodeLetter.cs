namespace FilterQA.Core.Sampling;

/// <summary>
/// Sample-size code letter of MIL-STD-105E (the standard skips I and O). Table I gives A to R;
/// S (n = 3150) exists only in the tightened table, reached by an arrow at very low AQL.
/// </summary>
public enum CodeLetter
{
    /// <summary>Letter A.</summary>
    A,

    /// <summary>Letter B.</summary>
    B,

    /// <summary>Letter C.</summary>
    C,

    /// <summary>Letter D.</summary>
    D,

    /// <summary>Letter E.</summary>
    E,

    /// <summary>Letter F.</summary>
    F,

    /// <summary>Letter G.</summary>
    G,

    /// <summary>Letter H.</summary>
    H,

    /// <summary>Letter J.</summary>
    J,

    /// <summary>Letter K.</summary>
    K,

    /// <summary>Letter L.</summary>
    L,

    /// <summary>Letter M.</summary>
    M,

    /// <summary>Letter N.</summary>
    N,

    /// <summary>Letter P.</summary>
    P,

    /// <summary>Letter Q.</summary>
    Q,

    /// <summary>Letter R.</summary>
    R,

    /// <summary>Letter S: tightened inspection only (n = 3150).</summary>
    S,
}
