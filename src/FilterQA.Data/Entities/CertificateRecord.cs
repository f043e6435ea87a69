namespace FilterQA.Data.Entities;

/// <summary>
/// An issued certificate of conformance: its number, the lot it certifies, the digest of the lot's
/// stored data at signing and the frozen snapshot (JSON) that every reprint renders. Written once:
/// at most one certificate per lot, and a number is never given twice.
/// </summary>
public sealed class CertificateRecord : IAppendOnly
{
    public long Id { get; set; }

    /// <summary>The printed number, e.g. TME-COC-2026-000017.</summary>
    public required string CertificateNumber { get; set; }

    /// <summary>The running number inside <see cref="CertificateNumber"/>, unique over all certificates.</summary>
    public long Sequence { get; set; }

    public long LotId { get; set; }

    /// <summary>Lower-case hex SHA-256 of the lot's canonical data (see <c>LotDataDigest</c>).</summary>
    public required string DataDigestSha256 { get; set; }

    public DateTimeOffset IssuedAt { get; set; }

    public required string SignerId { get; set; }

    public required string SignerName { get; set; }

    public required string Reason { get; set; }

    /// <summary>The <c>CertificateSnapshot</c> as JSON text, exactly as signed.</summary>
    public required string SnapshotJson { get; set; }
}
