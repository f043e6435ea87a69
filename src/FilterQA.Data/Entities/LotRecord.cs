using FilterQA.Core.Sampling;

namespace FilterQA.Data.Entities;

/// <summary>
/// An inspection lot: one supplier delivery of one part number, tested against one released
/// template revision, sampled by a plan, and finally accepted or rejected. The summary counters
/// are kept up to date in the same transaction as each stored unit.
/// </summary>
public sealed class LotRecord
{
    public long Id { get; set; }

    public required string LotNumber { get; set; }

    public long PartId { get; set; }

    public PartRecord? Part { get; set; }

    public long TemplateRevisionId { get; set; }

    public TemplateRevisionRecord? TemplateRevision { get; set; }

    public required string Supplier { get; set; }

    public string? SupplierLot { get; set; }

    public string? DateCode { get; set; }

    public int QuantityReceived { get; set; }

    public string? PurchaseOrder { get; set; }

    public string? Customer { get; set; }

    public required LotPlan Plan { get; set; }

    public LotStatus Status { get; set; }

    public DateTimeOffset CreatedAt { get; set; }

    public required string CreatedBy { get; set; }

    /// <summary>What the sampling plan said when the lot was decided (null until decided).</summary>
    public LotDecision? SampleDecision { get; set; }

    public DateTimeOffset? DispositionAt { get; set; }

    public string? DispositionBy { get; set; }

    public string? DispositionReason { get; set; }

    /// <summary>True when the disposition overrides the plan's decision (needs an approver and a reason).</summary>
    public bool DispositionIsOverride { get; set; }

    public string? HoldReason { get; set; }

    public required LotCounters Counters { get; set; }

    /// <summary>Optimistic concurrency token, bumped by every change to the lot row.</summary>
    public int Version { get; set; }
}
