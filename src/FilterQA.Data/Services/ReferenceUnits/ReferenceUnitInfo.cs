using FilterQA.Core.Decisions;

namespace FilterQA.Data.Services;

/// <summary>A current reference (known-good) unit of a part, as the screens list it.</summary>
/// <param name="Id">The reference-unit record's id (what <see cref="ReferenceUnitService.RemoveAsync"/> takes).</param>
/// <param name="PartNumber">The part.</param>
/// <param name="MeasurementId">The stored measurement marked as reference.</param>
/// <param name="LotNumber">The measurement's lot.</param>
/// <param name="Serial">The unit's serial.</param>
/// <param name="Attempt">The measurement's attempt number (1 = first measurement of the unit).</param>
/// <param name="MeasuredAt">When the unit was measured.</param>
/// <param name="RecordedVerdict">The verdict stored with the measurement (under the lot's template revision).</param>
/// <param name="Note">Why the unit is known good.</param>
/// <param name="MarkedBy">Who marked it.</param>
/// <param name="MarkedAt">When it was marked.</param>
public sealed record ReferenceUnitInfo(long Id, string PartNumber, long MeasurementId, string LotNumber, string Serial, int Attempt,
    DateTimeOffset MeasuredAt, UnitVerdict RecordedVerdict, string Note, string MarkedBy, DateTimeOffset MarkedAt);
