using FilterQA.Core.Decisions;
using FilterQA.Core.Sweeps;

namespace FilterQA.Data.Services;

/// <summary>
/// One measurement of a unit to store: the sweep file's original bytes, the sweep parsed from
/// them, the response the evaluation used, the evaluation itself, and who measured where and when.
/// A null <see cref="SamplePosition"/> gives a new unit the next free position.
/// A second measurement of the same serial is a retest that supersedes the first.
/// </summary>
public sealed record UnitMeasurement(
    string LotNumber,
    string Serial,
    string Station,
    Actor Operator,
    DateTimeOffset MeasuredAt,
    ReadOnlyMemory<byte> SweepBytes,
    Sweep Sweep,
    ResponseTrace Response,
    UnitEvaluation Evaluation)
{
    public int? SamplePosition { get; init; }

    public long? ThruReferenceId { get; init; }

    /// <summary>A key chosen by the client; a post retried with the same key stores the measurement once.</summary>
    public string? IdempotencyKey { get; init; }

    /// <summary>Why the unit is measured again (recorded with a retest).</summary>
    public string? RetestReason { get; init; }
}
