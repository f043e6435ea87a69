namespace FilterQA.Data.Services.Certificates;

/// <summary>
/// Everything a certificate of conformance prints, frozen when the approver signs: a reprint years
/// later shows exactly what was signed, whatever happened to the database since. Parameter values
/// are in SI units (Hz, s, ohm, F) or dB as their <see cref="CertificateParameter.Unit"/> says; loss
/// figures are positive for attenuation.
/// </summary>
public sealed record CertificateSnapshot(
    string CertificateNumber,
    CertificateIssuer Issuer,
    string? Customer,
    string? PurchaseOrder,
    string LotNumber,
    string PartNumber,
    string PartDescription,
    int TemplateRevision,
    string TemplateHash,
    string Supplier,
    string? SupplierLot,
    string? DateCode,
    int QuantityReceived,
    int QuantitySampled,
    CertificatePlan Plan,
    CertificateResult Result,
    IReadOnlyList<CertificateParameter> Parameters,
    string Statement,
    CertificateSignature Signature,
    string DataDigestSha256,
    string VerificationUrl);
