using FilterQA.Data.Entities;

namespace FilterQA.Data.Services;

/// <summary>Appends audit entries to the context, to be saved in the same transaction as the change they describe.</summary>
internal static class Audit
{
    internal static void Add(FilterQaDbContext context, TimeProvider clock, Actor actor, AuditAction action,
        string subject, string subjectKey, string detail, long? lotId = null, string? reason = null)
    {
        context.AuditEntries.Add(new AuditEntry
        {
            At = clock.GetUtcNow(),
            ActorId = actor.Id,
            ActorName = actor.Name,
            Action = action,
            Subject = subject,
            SubjectKey = subjectKey,
            LotId = lotId,
            Detail = detail,
            Reason = reason,
        });
    }
}
