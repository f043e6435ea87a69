namespace FilterQA.Data.Services;

/// <summary>
/// A delivery to register as a lot. A null <see cref="TemplateRevision"/> takes the part's
/// latest released revision. The plan's lot size is <see cref="QuantityReceived"/>.
/// </summary>
public sealed record NewLot(string LotNumber, string PartNumber, int? TemplateRevision, string Supplier, int QuantityReceived, PlanRequest Plan)
{
    public string? SupplierLot { get; init; }

    public string? DateCode { get; init; }

    public string? PurchaseOrder { get; init; }

    public string? Customer { get; init; }
}
