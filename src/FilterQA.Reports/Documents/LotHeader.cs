using FilterQA.Data.Services.Certificates;

namespace FilterQA.Reports.Documents;

/// <summary>A lot as a report heads it: identity, part and template, supplier, quantities and the sampling plan.</summary>
public sealed record LotHeader(
    string LotNumber,
    string PartNumber,
    string PartDescription,
    int TemplateRevision,
    string TemplateHash,
    string Supplier,
    string? SupplierLot,
    string? DateCode,
    string? PurchaseOrder,
    string? Customer,
    int QuantityReceived,
    string Status,
    DateTimeOffset CreatedAt,
    CertificatePlan Plan);
