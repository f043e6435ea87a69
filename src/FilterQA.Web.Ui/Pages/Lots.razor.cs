using FilterQA.Data.Entities;
using FilterQA.Data.Services;
using FilterQA.Web.Ui.Services;
using Microsoft.AspNetCore.Components;

namespace FilterQA.Web.Ui.Pages;

/// <summary>The lot list with filters by part, supplier, status and registration date (UTC days, both ends inclusive).</summary>
public partial class Lots
{
    [Inject]
    private LotService LotsService { get; set; } = null!;

    [Inject]
    private PartDirectory PartList { get; set; } = null!;

    private IReadOnlyList<string> Parts { get; set; } = [];

    private IReadOnlyList<LotSummary> Found { get; set; } = [];

    private string? PartNumber { get; set; }

    private string? Supplier { get; set; }

    private string? Status { get; set; }

    private DateOnly? From { get; set; }

    private DateOnly? To { get; set; }

    private string? Problem { get; set; }

    protected override async Task OnInitializedAsync()
    {
        Parts = await PartList.PartNumbersAsync().ConfigureAwait(true);
        await SearchAsync().ConfigureAwait(true);
    }

    internal static LotQuery Query(string? partNumber, string? supplier, string? status, DateOnly? from, DateOnly? to) => new()
    {
        PartNumber = string.IsNullOrWhiteSpace(partNumber) ? null : partNumber,
        Supplier = string.IsNullOrWhiteSpace(supplier) ? null : supplier.Trim(),
        Status = Enum.TryParse(status, out LotStatus s) ? s : null,
        CreatedFrom = from is { } f ? new DateTimeOffset(f.ToDateTime(TimeOnly.MinValue), TimeSpan.Zero) : null,
        // The end date is inclusive: lots up to the end of that day.
        CreatedTo = to is { } t ? new DateTimeOffset(t.AddDays(1).ToDateTime(TimeOnly.MinValue), TimeSpan.Zero) : null,
    };

    private async Task SearchAsync()
    {
        if (From is { } f && To is { } t && t < f)
        {
            Problem = "The end date is before the start date.";
            return;
        }
        Problem = null;
        Found = await LotsService.FindLotsAsync(Query(PartNumber, Supplier, Status, From, To)).ConfigureAwait(true);
    }
}
