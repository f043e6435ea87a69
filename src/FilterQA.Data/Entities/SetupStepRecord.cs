namespace FilterQA.Data.Entities;

/// <summary>A one-time start-up step that has been done (first accounts, demo data), so it is never done twice.</summary>
public sealed class SetupStepRecord
{
    public long Id { get; set; }

    public required string Name { get; set; }

    public DateTimeOffset DoneAt { get; set; }
}
