using FilterQA.Data.Entities;

namespace FilterQA.Data.Services;

/// <summary>Filters for the lot list; null means any. Created times are inclusive-exclusive [From, To).</summary>
public sealed record LotQuery
{
    public string? PartNumber { get; init; }

    public string? Supplier { get; init; }

    public LotStatus? Status { get; init; }

    public DateTimeOffset? CreatedFrom { get; init; }

    public DateTimeOffset? CreatedTo { get; init; }

    public int Skip { get; init; }

    public int Take { get; init; } = 100;
}
