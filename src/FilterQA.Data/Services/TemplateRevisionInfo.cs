using FilterQA.Core.Templates;

namespace FilterQA.Data.Services;

/// <summary>A stored template revision as the screens show it.</summary>
public sealed record TemplateRevisionInfo(long Id, string PartNumber, int Revision, TemplateStatus Status, string ContentHash,
    string? Author, DateOnly? ReleaseDate, string? ReleasedBy, DateTimeOffset? ReleasedAt, string? ReleaseReason = null);
