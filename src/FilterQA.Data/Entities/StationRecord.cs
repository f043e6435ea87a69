namespace FilterQA.Data.Entities;

/// <summary>A test station (analyser, fixture, bench) where units are measured.</summary>
public sealed class StationRecord
{
    public long Id { get; set; }

    public required string Name { get; set; }

    public required string Description { get; set; }

    public DateTimeOffset CreatedAt { get; set; }
}
