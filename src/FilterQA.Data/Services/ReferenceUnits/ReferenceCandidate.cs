using FilterQA.Core.Decisions;

namespace FilterQA.Data.Services;

/// <summary>A stored measurement of a lot that a quality engineer may pick as a reference unit.</summary>
/// <param name="MeasurementId">The stored measurement.</param>
/// <param name="Serial">The unit's serial.</param>
/// <param name="Attempt">Attempt number (1 = first measurement of the unit).</param>
/// <param name="MeasuredAt">When it was measured.</param>
/// <param name="Verdict">The recorded verdict; only a go measurement can be a reference unit.</param>
/// <param name="IsReference">The measurement is already a current reference unit.</param>
public sealed record ReferenceCandidate(long MeasurementId, string Serial, int Attempt, DateTimeOffset MeasuredAt, UnitVerdict Verdict, bool IsReference);
