namespace FilterQA.Data.Entities;

/// <summary>A thru (fixture without a device) measured at a station, used to normalise unit sweeps.</summary>
public sealed class ThruReferenceRecord : IAppendOnly
{
    public long Id { get; set; }

    public long StationId { get; set; }

    public StationRecord? Station { get; set; }

    public DateTimeOffset MeasuredAt { get; set; }

    public required string OperatorId { get; set; }

    public required string OperatorName { get; set; }

    /// <summary>Peak-to-peak loss variation of the thru over its sweep, in dB (≥ 0).</summary>
    public double FlatnessDb { get; set; }

    public required StoredSweep Sweep { get; set; }
}
