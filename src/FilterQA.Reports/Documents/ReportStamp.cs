namespace FilterQA.Reports.Documents;

/// <summary>Who asked for a document and when (UTC): printed in its footer and metadata.</summary>
public sealed record ReportStamp(string GeneratedBy, DateTimeOffset GeneratedAt);
