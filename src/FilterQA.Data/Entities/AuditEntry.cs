namespace FilterQA.Data.Entities;

/// <summary>One line of the append-only audit log: who did what, when, to what, and why.</summary>
public sealed class AuditEntry : IAppendOnly
{
    public long Id { get; set; }

    public DateTimeOffset At { get; set; }

    public required string ActorId { get; set; }

    public required string ActorName { get; set; }

    public AuditAction Action { get; set; }

    /// <summary>The kind of record acted on, e.g. "lot", "template".</summary>
    public required string Subject { get; set; }

    /// <summary>The record's natural key, e.g. the lot number or "PART rev 3".</summary>
    public required string SubjectKey { get; set; }

    public long? LotId { get; set; }

    public required string Detail { get; set; }

    public string? Reason { get; set; }
}
