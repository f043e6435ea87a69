using FilterQA.Data.Entities;

namespace FilterQA.Data.Services;

/// <summary>One audit entry as the audit page shows it, with the number of the lot it belongs to (null when none).</summary>
public sealed record AuditRow(long Id, DateTimeOffset At, string ActorId, string ActorName, AuditAction Action, string Subject, string SubjectKey,
    string? LotNumber, string Detail, string? Reason);
