using FilterQA.Data.Entities;
using FilterQA.Web.Ui.Pages;

namespace FilterQA.Web.Ui.Tests.Services;

public sealed class LotQueryTests
{
    [Fact]
    public void The_end_date_includes_its_whole_day_and_blank_filters_mean_any()
    {
        var query = Lots.Query("", " Quorra Quartz ", "Held", new DateOnly(2026, 11, 1), new DateOnly(2026, 11, 30));
        Assert.Null(query.PartNumber);
        Assert.Equal("Quorra Quartz", query.Supplier);
        Assert.Equal(LotStatus.Held, query.Status);
        Assert.Equal(new DateTimeOffset(2026, 11, 1, 0, 0, 0, TimeSpan.Zero), query.CreatedFrom);
        // [From, To) is exclusive at To, so the last day inclusive ends at the next midnight.
        Assert.Equal(new DateTimeOffset(2026, 12, 1, 0, 0, 0, TimeSpan.Zero), query.CreatedTo);
    }
}
