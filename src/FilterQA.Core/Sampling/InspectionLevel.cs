namespace FilterQA.Core.Sampling;

/// <summary>
/// Inspection level of MIL-STD-105E Table I (same levels in ANSI/ASQ Z1.4 and ISO 2859-1): the
/// special levels S-1 to S-4 give small samples where testing is costly; the general levels I, II
/// and III give increasing discrimination. Level II is the usual default.
/// </summary>
public enum InspectionLevel
{
    /// <summary>Special level S-1 (smallest samples).</summary>
    S1,

    /// <summary>Special level S-2.</summary>
    S2,

    /// <summary>Special level S-3.</summary>
    S3,

    /// <summary>Special level S-4.</summary>
    S4,

    /// <summary>General level I (less discrimination than II).</summary>
    I,

    /// <summary>General level II (the usual default).</summary>
    II,

    /// <summary>General level III (more discrimination than II).</summary>
    III,
}
