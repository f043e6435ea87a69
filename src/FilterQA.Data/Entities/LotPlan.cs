using FilterQA.Core.Sampling;

namespace FilterQA.Data.Entities;

/// <summary>Every field of the lot's <see cref="SamplingPlan"/>, plus why the severity was chosen.</summary>
public sealed class LotPlan
{
    public SamplingPlanKind Kind { get; set; }

    public required string StandardName { get; set; }

    public int LotSize { get; set; }

    public int SampleSize { get; set; }

    public int TableSampleSize { get; set; }

    public int AcceptanceNumber { get; set; }

    public int RejectionNumber { get; set; }

    public bool IsFullInspection { get; set; }

    public InspectionLevel? Level { get; set; }

    public InspectionSeverity? Severity { get; set; }

    public double? AqlPercent { get; set; }

    public CodeLetter? TableLetter { get; set; }

    public CodeLetter? LetterUsed { get; set; }

    public double? LtpdFraction { get; set; }

    public double? Confidence { get; set; }

    /// <summary>Why this severity: the switching-rule reason, or that it was set by hand.</summary>
    public required string SeverityReason { get; set; }
}
