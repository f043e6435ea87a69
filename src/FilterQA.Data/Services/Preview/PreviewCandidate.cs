using FilterQA.Core.Decisions;

namespace FilterQA.Data.Services;

/// <summary>A stored measurement of a part that a template preview can judge again.</summary>
/// <param name="MeasurementId">The measurement's id.</param>
/// <param name="LotNumber">Its lot.</param>
/// <param name="Serial">The unit's serial.</param>
/// <param name="Attempt">1 for the first measurement of the unit, 2 for its first retest, ...</param>
/// <param name="RecordedVerdict">The verdict recorded when it was measured.</param>
/// <param name="MeasuredAt">When it was measured (UTC).</param>
public sealed record PreviewCandidate(long MeasurementId, string LotNumber, string Serial, int Attempt, UnitVerdict RecordedVerdict, DateTimeOffset MeasuredAt);
