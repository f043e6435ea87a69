using FilterQA.Core.Decisions;

namespace FilterQA.Data.Entities;

/// <summary>
/// One measurement attempt of a unit with its verdict and every rule result. Never edited:
/// a retest is a new row whose <see cref="SupersedesMeasurementId"/> points to the attempt before it.
/// </summary>
public sealed class MeasurementRecord : IAppendOnly
{
    public long Id { get; set; }

    public long UnitId { get; set; }

    public UnitRecord? Unit { get; set; }

    /// <summary>The unit's lot (kept here too so lot-wide queries need no join).</summary>
    public long LotId { get; set; }

    /// <summary>1 for the first measurement of the unit, 2 for the first retest, ...</summary>
    public int Attempt { get; set; }

    public long? SupersedesMeasurementId { get; set; }

    /// <summary>False when the attempt is beyond the part's retest policy (stored, but it does not decide the unit).</summary>
    public bool CountsForLot { get; set; }

    public long TemplateRevisionId { get; set; }

    public required string TemplateHash { get; set; }

    public long StationId { get; set; }

    public StationRecord? Station { get; set; }

    public long? ThruReferenceId { get; set; }

    public ThruReferenceRecord? ThruReference { get; set; }

    public required string OperatorId { get; set; }

    public required string OperatorName { get; set; }

    public DateTimeOffset MeasuredAt { get; set; }

    public DateTimeOffset StoredAt { get; set; }

    public UnitVerdict Verdict { get; set; }

    /// <summary>The evaluation's warnings, one per line.</summary>
    public required string Warnings { get; set; }

    public string? RetestReason { get; set; }

    /// <summary>Optional key from the client so that a retried post stores the measurement once.</summary>
    public string? IdempotencyKey { get; set; }

    public required StoredSweep Sweep { get; set; }

    public List<RuleResultRecord> Rules { get; set; } = [];
}
