using FilterQA.Data.Services;

namespace FilterQA.Web.Ui.Services;

/// <summary>The lot after a disposition action, or the reason it was not done.</summary>
public sealed record LotActionResult(LotSummary? Lot, string? Problem)
{
    public bool Succeeded => Problem is null;
}
