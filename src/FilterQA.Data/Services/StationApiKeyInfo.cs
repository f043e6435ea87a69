namespace FilterQA.Data.Services;

/// <summary>A station API key as it may be shown again: never the key itself, only its first characters.</summary>
public sealed record StationApiKeyInfo(long Id, string Station, string Label, string KeyPrefix, DateTimeOffset CreatedAt, string CreatedBy,
    DateTimeOffset? RevokedAt, string? RevokedBy);
