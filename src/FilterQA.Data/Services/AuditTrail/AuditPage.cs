namespace FilterQA.Data.Services;

/// <summary>One page of the audit log, newest first; <see cref="HasMore"/> says whether older entries follow.</summary>
public sealed record AuditPage(IReadOnlyList<AuditRow> Entries, int Skip, int Take, bool HasMore);
