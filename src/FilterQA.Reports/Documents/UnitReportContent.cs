using FilterQA.Core.Decisions;
using FilterQA.Core.Sweeps;

namespace FilterQA.Reports.Documents;

/// <summary>One stored measurement as its one-page report prints it.</summary>
public sealed record UnitReportContent(
    long MeasurementId,
    string LotNumber,
    string PartNumber,
    int TemplateRevision,
    string Serial,
    int Attempt,
    bool CountsForLot,
    string Verdict,
    string Station,
    string Operator,
    DateTimeOffset MeasuredAt,
    string Thru,
    string SweepFile,
    string SweepSha256,
    ResponseTrace Sweep,
    IReadOnlyList<MaskLine> Mask,
    IReadOnlyList<RuleLine> Rules,
    IReadOnlyList<string> Warnings,
    ReportStamp Stamp);
