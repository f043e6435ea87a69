namespace FilterQA.Core.Sampling;

/// <summary>Settings of the switching rules; one set per part, supplier and defect class.</summary>
public sealed record SwitchingOptions
{
    /// <summary>Switching score at which ISO 2859-1:1999 allows reduced inspection.</summary>
    public const int IsoSwitchingScoreLimit = 30;

    /// <summary>Rule for normal → reduced; default <see cref="SwitchingVariant.Mil105E"/>.</summary>
    public SwitchingVariant Variant { get; init; } = SwitchingVariant.Mil105E;

    /// <summary>Rule for discontinuing on tightened; default <see cref="DiscontinueRule.FiveRejectedOnTightened"/> (Z1.4/ISO).</summary>
    public DiscontinueRule Discontinue { get; init; } = DiscontinueRule.FiveRejectedOnTightened;

    /// <summary>Severity of the first lot of the history; default normal (a history resumed after discontinuation starts on tightened).</summary>
    public InspectionSeverity InitialSeverity { get; init; } = InspectionSeverity.Normal;

    /// <summary>True when the responsible authority approves reduced inspection; default false (reduced is never entered).</summary>
    public bool ReducedApproved { get; init; }

    /// <summary>
    /// MIL-STD-105E Table VIII (limit numbers for reduced inspection) is not transcribed: this
    /// function gives the limit number for the total sample size (units) of the last 10 lots, or
    /// null where the table allows no switch. When the function is null, the 105E rule never
    /// switches to reduced.
    /// </summary>
    public Func<int, int?>? LimitNumberForTotalSampleSize { get; init; }
}
