namespace FilterQA.Data.Services;

/// <summary>One sweep offered for one unit of a lot, from the bench, the intake API, a watched folder or an import.</summary>
/// <param name="LotNumber">The lot the unit belongs to.</param>
/// <param name="Serial">The unit's serial (or position label) in the sample.</param>
/// <param name="Station">The test station that measured it; its latest thru reference is applied.</param>
/// <param name="Operator">Who measured it.</param>
/// <param name="SweepBytes">The file exactly as received; stored byte for byte.</param>
/// <param name="FileName">The file's name (its extension picks the format).</param>
public sealed record SweepSubmission(string LotNumber, string Serial, string Station, Actor Operator, ReadOnlyMemory<byte> SweepBytes, string FileName)
{
    /// <summary>A key that makes a retried submission store the unit once.</summary>
    public string? IdempotencyKey { get; init; }

    /// <summary>Why the unit is measured again, when it is a retest.</summary>
    public string? RetestReason { get; init; }

    /// <summary>Position of the unit in the sample, when known.</summary>
    public int? SamplePosition { get; init; }
}
