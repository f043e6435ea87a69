namespace FilterQA.Core.Statistics;

/// <summary>Which standard deviation the capability indices use.</summary>
public enum SigmaBasis
{
    /// <summary>
    /// The overall sample standard deviation s (n − 1). The indices are then strictly the
    /// performance indices Pp/Ppk, reported under the names Cp/Cpk as is common. The default.
    /// </summary>
    OverallSample,

    /// <summary>Within-subgroup σ estimated as MR̄/1.128 from the values in production order (d2 = 1.128 for moving ranges of 2).</summary>
    MovingRange,

    /// <summary>A σ_within given by the caller (e.g. pooled s/c4 from subgroups).</summary>
    Given,
}
