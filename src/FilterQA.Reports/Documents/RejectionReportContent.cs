using FilterQA.Core.Statistics;

namespace FilterQA.Reports.Documents;

/// <summary>Everything a rejection report prints: the lot, its plan and decision, the failing units and the Pareto of failing rules.</summary>
public sealed record RejectionReportContent(
    LotHeader Lot,
    int UnitsTested,
    int Defectives,
    string Decision,
    string? DecidedBy,
    DateTimeOffset? DecidedAt,
    string? DecisionReason,
    bool DecisionIsOverride,
    IReadOnlyList<NonConformingUnit> FailingUnits,
    IReadOnlyList<ParetoEntry> Pareto,
    ReportStamp Stamp);
