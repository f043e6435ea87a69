using FilterQA.Core.Decisions;

namespace FilterQA.Reports.Documents;

/// <summary>
/// One rule result as printed: measured value and limit in the SI unit (or dB, ppm) named by <see cref="Unit"/>,
/// margin in the same unit (positive = inside the limit), outcome, and whether it blocks the unit.
/// </summary>
public sealed record RuleLine(
    string RuleId,
    string Title,
    string Unit,
    double? Measured,
    double? Limit,
    LimitSense Sense,
    double? Margin,
    RuleOutcome Outcome,
    bool Blocking);
