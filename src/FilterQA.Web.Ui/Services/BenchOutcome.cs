using FilterQA.Core.Sweeps;
using FilterQA.Data.Services;

namespace FilterQA.Web.Ui.Services;

/// <summary>
/// One file's outcome at the bench. For <see cref="BenchOutcomeKind.Judged"/>, <see cref="Result"/> holds the
/// stored measurement and the evaluation, and <see cref="Trace"/> the stored response for the chart.
/// </summary>
public sealed record BenchOutcome(string FileName, string? Serial, BenchOutcomeKind Kind, string Message)
{
    public IntakeResult? Result { get; init; }

    public ResponseTrace? Trace { get; init; }

    /// <summary>True when the part's retest policy lets this unit be measured again.</summary>
    public bool MayMeasureAgain { get; init; }

    /// <summary>1-based line of an unreadable file's problem; 0 when not at one line.</summary>
    public int Line { get; init; }

    /// <summary>1-based column of an unreadable file's problem; 0 when not at one column.</summary>
    public int Column { get; init; }
}
