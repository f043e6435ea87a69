using FilterQA.Core.Sampling;
using FilterQA.Data.Entities;

namespace FilterQA.Data.Services;

/// <summary>
/// A lot as its page shows it, read from the lot row alone (no sweep is read). Counts follow the
/// part's retest policy; <see cref="Defectives"/> = no-go + not verifiable.
/// <see cref="Decision"/> is what the plan says for the units tested so far.
/// </summary>
public sealed record LotSummary(
    long Id,
    string LotNumber,
    string PartNumber,
    int TemplateRevision,
    string TemplateHash,
    string Supplier,
    string? SupplierLot,
    string? DateCode,
    int QuantityReceived,
    string? PurchaseOrder,
    string? Customer,
    SamplingPlan Plan,
    string SeverityReason,
    LotStatus Status,
    int UnitsTested,
    int Go,
    int NoGo,
    int NotVerifiable,
    int Defectives,
    int FirstPassGo,
    int UnitsRetested,
    int Measurements,
    LotDecision Decision,
    LotDecision? SampleDecision,
    DateTimeOffset CreatedAt,
    string CreatedBy,
    DateTimeOffset? DispositionAt,
    string? DispositionBy,
    string? DispositionReason,
    bool DispositionIsOverride);
