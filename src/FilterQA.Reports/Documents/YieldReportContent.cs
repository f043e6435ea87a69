using FilterQA.Core.Decisions;
using FilterQA.Core.Statistics;
using FilterQA.Core.Sweeps;
using FilterQA.Reports.Charts;

namespace FilterQA.Reports.Documents;

/// <summary>
/// Everything a yield report prints, for one lot or for a part over a period: yield per lot and in total,
/// the Pareto of failing rules, per key parameter its histogram, limits and Cp/Cpk, every unit's counted sweep
/// as a min/max envelope (with a few units as lines) against the mask, and the non-conforming units.
/// </summary>
public sealed record YieldReportContent(
    string Scope,
    string PartNumber,
    string PartDescription,
    IReadOnlyList<LotYieldRow> Lots,
    IReadOnlyList<ParetoEntry> Pareto,
    IReadOnlyList<ParameterSummary> Parameters,
    LossEnvelope Envelope,
    IReadOnlyList<ResponseTrace> ExampleSweeps,
    IReadOnlyList<MaskLine> Mask,
    string MaskNote,
    IReadOnlyList<NonConformingUnit> NonConforming,
    ReportStamp Stamp)
{
    public int UnitsTested => Lots.Sum(l => l.UnitsTested);

    public int FirstPassGo => Lots.Sum(l => l.FirstPassGo);

    public int FinalGo => Lots.Sum(l => l.FinalGo);
}
