namespace FilterQA.Core.Sampling;

/// <summary>
/// A single sampling plan by attributes for one lot: inspect <see cref="SampleSize"/> units, accept
/// the lot with at most <see cref="AcceptanceNumber"/> defectives, reject it with
/// <see cref="RejectionNumber"/> or more. Immutable; made by <see cref="SamplingPlanner"/>.
/// </summary>
public sealed record SamplingPlan
{
    internal SamplingPlan(SamplingPlanKind kind, string standardName, int lotSize, int tableSampleSize, int acceptanceNumber, int rejectionNumber)
    {
        Kind = kind;
        StandardName = standardName;
        LotSize = lotSize;
        TableSampleSize = tableSampleSize;
        IsFullInspection = kind == SamplingPlanKind.FullInspection || tableSampleSize >= lotSize;
        SampleSize = IsFullInspection ? lotSize : tableSampleSize;
        AcceptanceNumber = acceptanceNumber;
        RejectionNumber = rejectionNumber;
    }

    /// <summary>How the plan was chosen.</summary>
    public SamplingPlanKind Kind { get; }

    /// <summary>Standard or method, for reports: "MIL-STD-105E single sampling", "zero-acceptance (c = 0) plan", "100 % inspection".</summary>
    public string StandardName { get; }

    /// <summary>Units in the lot (at least 1).</summary>
    public int LotSize { get; }

    /// <summary>Units to inspect: the table's (or formula's) n, or the lot size when that n reaches it.</summary>
    public int SampleSize { get; }

    /// <summary>n as the table or formula gives it, before the 100 % rule (may exceed the lot size).</summary>
    public int TableSampleSize { get; }

    /// <summary>Ac: accept the lot with at most this many defectives in the sample.</summary>
    public int AcceptanceNumber { get; }

    /// <summary>Re: reject the lot with this many defectives or more. Re = Ac + 1 except on reduced inspection.</summary>
    public int RejectionNumber { get; }

    /// <summary>
    /// True when every unit is inspected: chosen so, or because n reached the lot size (the tables
    /// say: if n is at least the lot size, inspect 100 %). Ac and Re still judge the lot.
    /// </summary>
    public bool IsFullInspection { get; }

    /// <summary>Inspection level (table plans only; null otherwise).</summary>
    public InspectionLevel? Level { get; internal init; }

    /// <summary>Severity (table plans only; null otherwise).</summary>
    public InspectionSeverity? Severity { get; internal init; }

    /// <summary>AQL, percent nonconforming (table plans only; null otherwise).</summary>
    public double? AqlPercent { get; internal init; }

    /// <summary>Code letter from Table I (table plans only; null otherwise).</summary>
    public CodeLetter? TableLetter { get; internal init; }

    /// <summary>Code letter whose plan is used after following the table's arrows (table plans only).</summary>
    public CodeLetter? LetterUsed { get; internal init; }

    /// <summary>Lot tolerance fraction defective p1 the plan guards against, 0..1 (zero-acceptance plans only).</summary>
    public double? LtpdFraction { get; internal init; }

    /// <summary>Confidence 1 − β that a lot at the LTPD is rejected, 0..1 (zero-acceptance plans only).</summary>
    public double? Confidence { get; internal init; }

    /// <summary>
    /// True when the plan leaves a gap between Ac and Re (reduced inspection): a result in the gap
    /// accepts the lot but returns inspection to normal.
    /// </summary>
    public bool HasAcceptReturnGap => RejectionNumber > AcceptanceNumber + 1;
}
