using FilterQA.Data.Entities;

namespace FilterQA.Data.Services;

/// <summary>
/// Filters of the audit log; null or blank means any. Times are inclusive-exclusive [From, To). Texts match anywhere,
/// ignoring letter case: <see cref="Actor"/> the person's name or account id, <see cref="Subject"/> the kind of record,
/// its key (a lot number, "PART revision 3") or the lot it belongs to.
/// </summary>
public sealed record AuditQuery
{
    /// <summary>The most entries one page may hold.</summary>
    public const int MaxTake = 500;

    /// <summary>Entries at or after this instant.</summary>
    public DateTimeOffset? From { get; init; }

    /// <summary>Entries before this instant.</summary>
    public DateTimeOffset? To { get; init; }

    /// <summary>Part of the actor's name or account id.</summary>
    public string? Actor { get; init; }

    /// <summary>One action.</summary>
    public AuditAction? Action { get; init; }

    /// <summary>Part of the subject kind, the subject key or the lot number.</summary>
    public string? Subject { get; init; }

    /// <summary>Entries to skip (newest first), 0 or more.</summary>
    public int Skip { get; init; }

    /// <summary>Entries in the page, 1 to <see cref="MaxTake"/>.</summary>
    public int Take { get; init; } = 50;
}
