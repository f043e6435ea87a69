using FilterQA.Core.Decisions;

namespace FilterQA.Data.Services.Exports;

/// <summary>One stored measurement attempt of a lot's unit, with every rule result keyed by rule id.</summary>
public sealed record ExportMeasurement(
    long MeasurementId,
    string Serial,
    int SamplePosition,
    int Attempt,
    bool CountsForLot,
    UnitVerdict Verdict,
    DateTimeOffset MeasuredAt,
    string Station,
    IReadOnlyDictionary<string, ExportRuleValue> Rules);
