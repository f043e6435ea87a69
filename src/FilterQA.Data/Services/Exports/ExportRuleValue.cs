using FilterQA.Core.Decisions;

namespace FilterQA.Data.Services.Exports;

/// <summary>One rule result as exported: measured value, limit and margin in the rule's unit (null when not measured or none), and the outcome.</summary>
public sealed record ExportRuleValue(string RuleId, double? Value, double? Limit, double? Margin, RuleOutcome Outcome);
