using FilterQA.Core.Decisions;

namespace FilterQA.Data.Services;

/// <summary>
/// The result of storing a measurement. <see cref="WasAlreadyStored"/> is true when the
/// idempotency key had been stored before (nothing new was written).
/// </summary>
public sealed record StoredMeasurement(long MeasurementId, long UnitId, int Attempt, long? SupersedesMeasurementId, UnitVerdict Verdict,
    bool CountsForLot, bool WasAlreadyStored, LotSummary Lot);
