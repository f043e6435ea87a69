namespace FilterQA.Data.Entities;

/// <summary>
/// A key a station's script or instrument uses to post sweeps. Only the SHA-256 of the key is kept;
/// the key itself is shown once, when it is made. A revoked key stays on record.
/// </summary>
public sealed class StationApiKeyRecord
{
    public long Id { get; set; }

    public long StationId { get; set; }

    public StationRecord? Station { get; set; }

    /// <summary>What the key is for, e.g. "VNA script on bench 1".</summary>
    public required string Label { get; set; }

    /// <summary>Lower-case hex SHA-256 of the key's UTF-8 text.</summary>
    public required string KeySha256 { get; set; }

    /// <summary>The first characters of the key, so a person can tell keys apart without the secret.</summary>
    public required string KeyPrefix { get; set; }

    public DateTimeOffset CreatedAt { get; set; }

    public required string CreatedBy { get; set; }

    public DateTimeOffset? RevokedAt { get; set; }

    public string? RevokedBy { get; set; }
}
