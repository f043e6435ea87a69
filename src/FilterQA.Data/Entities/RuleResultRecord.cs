using FilterQA.Core.Decisions;
using FilterQA.Core.Templates;

namespace FilterQA.Data.Entities;

/// <summary>One <see cref="RuleResult"/> of a measurement, field for field.</summary>
public sealed class RuleResultRecord : IAppendOnly
{
    public long Id { get; set; }

    public long MeasurementId { get; set; }

    /// <summary>0-based position of the rule in the evaluation.</summary>
    public int Ordinal { get; set; }

    public required string RuleId { get; set; }

    public RuleKind Kind { get; set; }

    public required string Title { get; set; }

    public RuleUnit Unit { get; set; }

    public double? MeasuredValue { get; set; }

    public double? LimitValue { get; set; }

    public LimitSense Sense { get; set; }

    public double? Margin { get; set; }

    public double GuardBand { get; set; }

    public RuleOutcome Outcome { get; set; }

    public bool IsLowerBound { get; set; }

    public double? AtHz { get; set; }

    public required string Message { get; set; }
}
