using FilterQA.Core.Decisions;
using FilterQA.Core.Sweeps;

namespace FilterQA.Data.Services;

/// <summary>
/// One stored measurement as the what-if shows it on a chart: its stored response (the compact trace, float32) with
/// the limit lines of the revision it was recorded against and of the draft, each placed for this unit.
/// </summary>
/// <param name="MeasurementId">The stored measurement.</param>
/// <param name="LotNumber">Its lot.</param>
/// <param name="Serial">The unit's serial.</param>
/// <param name="Attempt">Attempt number, 1 = first.</param>
/// <param name="RecordedRevision">The template revision the measurement was judged against when stored.</param>
/// <param name="RecordedVerdict">The stored verdict.</param>
/// <param name="Trace">The stored response (loss in dB, positive = attenuation).</param>
/// <param name="RecordedMaskLines">The recorded revision's limit lines, placed on this trace.</param>
/// <param name="DraftMaskLines">The draft's limit lines, placed on this trace.</param>
/// <param name="Note">Why limit lines are missing or approximate; null when both sets are drawn as judged.</param>
public sealed record WhatIfUnitView(long MeasurementId, string LotNumber, string Serial, int Attempt, int RecordedRevision, UnitVerdict RecordedVerdict,
    ResponseTrace Trace, IReadOnlyList<MaskLine> RecordedMaskLines, IReadOnlyList<MaskLine> DraftMaskLines, string? Note);
