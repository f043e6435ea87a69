using Bunit;
using FilterQA.Web.Ui.Pages;
using FilterQA.Web.Ui.Tests.Infrastructure;

namespace FilterQA.Web.Ui.Tests.Components;

public sealed class BenchPageTests : SeededStore
{
    [Fact]
    public async Task A_scanned_lot_number_and_Enter_open_the_lot_with_its_plan_and_the_safety_cautions()
    {
        await SeedAsync();
        var cut = Render<Bench>();
        cut.WaitForElement("#lot", TimeSpan.FromSeconds(10));

        // A barcode scanner types the number and presses Enter; Enter in a form's text field submits the form
        // (HTML implicit submission), which bUnit raises on the form itself.
        cut.Find("#lot").Change("  " + LotNumber + " ");
        cut.Find("form.step").Submit();
        cut.WaitForElement("section.lot-progress", TimeSpan.FromSeconds(10));

        // Lot of 1 200 at level II, AQL 0.65 %: n 80, Ac 1, Re 2 (MIL-STD-105E Table I letter J; Table II-A).
        Assert.Equal("80", cut.Find("[data-figure=sample-size]").TextContent.Trim());
        Assert.Equal("0", cut.Find("[data-figure=tested]").TextContent.Trim());
        Assert.Contains("ESD", cut.Find("aside.safety").TextContent, StringComparison.Ordinal);
        Assert.Contains("IEC 61010-1", cut.Find("aside.safety").TextContent, StringComparison.Ordinal);
        // No thru recorded at IQC-1: the bench says so before any sweep is given.
        Assert.Equal("no", cut.Find("[data-thru-current]").GetAttribute("data-thru-current"));
        Assert.NotNull(cut.Find("#serial"));
    }

    [Fact]
    public async Task An_unknown_lot_number_is_named_in_the_message()
    {
        await SeedAsync();
        var cut = Render<Bench>();
        cut.WaitForElement("#lot", TimeSpan.FromSeconds(10));
        cut.Find("#lot").Change("VP-2611-9999");
        cut.Find("form.step").Submit();
        cut.WaitForAssertion(() => Assert.Contains("VP-2611-9999", cut.Find(".problem").TextContent, StringComparison.Ordinal), TimeSpan.FromSeconds(10));
        Assert.Empty(cut.FindAll("section.lot-progress"));
    }
}
