using FilterQA.Core.Templates;
using FilterQA.Data.Services;

namespace FilterQA.Data.Tests.Infrastructure;

/// <summary>A registered part with a released template, a station, and a lot created against them.</summary>
public sealed record PreparedLot(LimitTemplate Template, string Station, LotSummary Lot)
{
    public string LotNumber => Lot.LotNumber;

    public string PartNumber => Template.PartNumber;
}
