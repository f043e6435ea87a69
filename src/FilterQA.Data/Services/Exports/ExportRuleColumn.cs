namespace FilterQA.Data.Services.Exports;

/// <summary>One rule of the lot's template as an export column group: its id, title and the unit symbol of its value, limit and margin.</summary>
public sealed record ExportRuleColumn(string RuleId, string Title, string Unit);
