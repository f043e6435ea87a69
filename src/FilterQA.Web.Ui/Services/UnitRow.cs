using FilterQA.Core.Decisions;

namespace FilterQA.Web.Ui.Services;

/// <summary>A unit of a lot's sample as the lot page lists it.</summary>
public sealed record UnitRow(
    string Serial,
    int SamplePosition,
    int Attempts,
    UnitVerdict FirstVerdict,
    UnitVerdict CountedVerdict,
    UnitVerdict LatestVerdict,
    DateTimeOffset LastTestedAt,
    long? CountedMeasurementId);
