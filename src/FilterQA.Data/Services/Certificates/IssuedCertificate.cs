namespace FilterQA.Data.Services.Certificates;

/// <summary>
/// A stored certificate: its number, lot, the digest of the lot's data at signing, when and by whom it
/// was signed, and the frozen snapshot a PDF is rendered from. <see cref="NewlyIssued"/> is false when
/// the certificate already existed (asking again returns the same one).
/// </summary>
public sealed record IssuedCertificate(
    string CertificateNumber,
    string LotNumber,
    string DataDigestSha256,
    DateTimeOffset IssuedAt,
    string SignerName,
    CertificateSnapshot Snapshot,
    bool NewlyIssued);
