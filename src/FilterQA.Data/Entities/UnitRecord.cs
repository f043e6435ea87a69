using FilterQA.Core.Decisions;

namespace FilterQA.Data.Entities;

/// <summary>A unit of a lot's sample, identified by its serial and its position in the sample.</summary>
public sealed class UnitRecord
{
    public long Id { get; set; }

    public long LotId { get; set; }

    public LotRecord? Lot { get; set; }

    public required string Serial { get; set; }

    /// <summary>1-based position in the sample.</summary>
    public int SamplePosition { get; set; }

    public int Attempts { get; set; }

    public UnitVerdict FirstVerdict { get; set; }

    public UnitVerdict LatestVerdict { get; set; }

    /// <summary>The verdict that counts for the lot under the part's retest policy.</summary>
    public UnitVerdict CountedVerdict { get; set; }

    /// <summary>The unit's counted measurement (the one that decides it for the lot).</summary>
    public long? CountedMeasurementId { get; set; }

    public long? LatestMeasurementId { get; set; }

    public MeasurementRecord? LatestMeasurement { get; set; }

    public DateTimeOffset FirstTestedAt { get; set; }

    public DateTimeOffset LastTestedAt { get; set; }

    public int Version { get; set; }
}
