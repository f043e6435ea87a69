using FilterQA.Core.Templates;

namespace FilterQA.Data.Services;

/// <summary>What a what-if run covers, read once when it begins.</summary>
internal sealed record WhatIfScope(long PartId, IReadOnlyList<WhatIfScope.Lot> Lots, IReadOnlyDictionary<long, DateTimeOffset> ThruMeasuredAt,
    long LastMeasurementId, int Total)
{
    internal sealed record Lot(long Id, string LotNumber, int TemplateRevision, DecisionRule DecisionRule, int UnitsTested);
}
