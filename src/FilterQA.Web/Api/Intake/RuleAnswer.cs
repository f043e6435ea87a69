using FilterQA.Core.Decisions;
using FilterQA.Core.Templates;

namespace FilterQA.Web.Api.Intake;

/// <summary>One rule's result: measured value and limit in <see cref="Unit"/> (SI: Hz, dB, s, ohm, F); margin positive when inside the limit.</summary>
public sealed record RuleAnswer(string RuleId, string Title, RuleKind Kind, RuleOutcome Outcome, double? Measured, double? Limit,
    LimitSense Sense, double? Margin, RuleUnit Unit, double? AtHz, string Message);
