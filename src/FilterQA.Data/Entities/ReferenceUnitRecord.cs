namespace FilterQA.Data.Entities;

/// <summary>
/// A stored measurement of a part that a quality engineer marked as a reference (known-good) unit, with why. A draft
/// template is released only when it passes every current reference unit of its part. A removal keeps the row (who,
/// when, why) so the history of the reference set stays on record; only rows without a removal are current.
/// </summary>
public sealed class ReferenceUnitRecord
{
    public long Id { get; set; }

    public long PartId { get; set; }

    public PartRecord? Part { get; set; }

    public long MeasurementId { get; set; }

    public MeasurementRecord? Measurement { get; set; }

    /// <summary>Why the unit is known good (e.g. "cross-checked on the second analyser").</summary>
    public required string Note { get; set; }

    public DateTimeOffset MarkedAt { get; set; }

    public required string MarkedById { get; set; }

    public required string MarkedBy { get; set; }

    public DateTimeOffset? RemovedAt { get; set; }

    public string? RemovedBy { get; set; }

    public string? RemovalNote { get; set; }
}
