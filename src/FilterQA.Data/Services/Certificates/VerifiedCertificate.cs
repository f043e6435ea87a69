namespace FilterQA.Data.Services.Certificates;

/// <summary>
/// What the public verification page may show for a matching number and digest. <see cref="LotDataUnchanged"/>
/// is false when the lot's stored data today no longer has the certificate's digest.
/// </summary>
public sealed record VerifiedCertificate(
    string CertificateNumber,
    string? IssuedTo,
    string PartNumber,
    int TemplateRevision,
    string LotNumber,
    string Supplier,
    DateTimeOffset SignedAt,
    string SignerName,
    string SignerRole,
    bool LotDataUnchanged);
