namespace FilterQA.Data.Services;

/// <summary>
/// What a draft template would have made of a part's stored measurements: per lot the recorded and what-if yields,
/// and every measurement whose verdict changes (ordered by lot, serial and attempt).
/// </summary>
/// <param name="PartNumber">The part.</param>
/// <param name="DraftRevision">The draft's revision number.</param>
/// <param name="DraftHash">The draft's content hash.</param>
/// <param name="Lots">Every lot of the part, oldest first.</param>
/// <param name="Flips">Measurements whose verdict changes.</param>
/// <param name="MeasurementsEvaluated">Measurements judged again (counted and first measurements, each once).</param>
/// <param name="FromOriginalFiles">How many of them were judged from the original sweep file rather than the compact trace.</param>
/// <param name="WhyOriginalFiles">Why the original files were read; null when the compact traces were enough.</param>
public sealed record WhatIfReport(string PartNumber, int DraftRevision, string DraftHash, IReadOnlyList<WhatIfLot> Lots,
    IReadOnlyList<WhatIfFlip> Flips, int MeasurementsEvaluated, int FromOriginalFiles, string? WhyOriginalFiles);
