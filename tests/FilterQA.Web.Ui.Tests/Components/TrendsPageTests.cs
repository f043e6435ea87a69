using System.Security.Claims;
using System.Text;
using Bunit;
using FilterQA.Core.Formats.Touchstone;
using FilterQA.Core.Sampling;
using FilterQA.Core.Synthesis;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Web.Ui.Components;
using FilterQA.Web.Ui.Pages;
using FilterQA.Web.Ui.Services;
using FilterQA.Web.Ui.Tests.Infrastructure;
using Microsoft.AspNetCore.Components;
using Microsoft.Extensions.DependencyInjection;

namespace FilterQA.Web.Ui.Tests.Components;

/// <summary>The trends page over two stored lots of the 455 kHz part: yields per lot, a control chart per rule, Ppk per lot.</summary>
public sealed class TrendsPageTests : SeededStore
{
    private const string SecondLot = "VP-2611-0044";

    public TrendsPageTests()
    {
        var auth = AddAuthorization();
        auth.SetAuthorized("Administrator");
        auth.SetRoles(RoleNames.Administrator);
        auth.SetClaims(new Claim(ClaimTypes.NameIdentifier, "u-admin"));
    }

    private async Task SeedTwoLotsAsync()
    {
        await SeedAsync();
        await Services.GetRequiredService<LotService>().CreateLotAsync(
            new NewLot(SecondLot, PartNumber, null, "Veltrane Piezo", 1200, PlanRequest.Mil105E(InspectionLevel.II, 0.65)), Engineer);
        DemoPart part = DemoParts.Get(PartNumber);
        var synthesiser = new UnitSynthesiser(5);
        SweepIntake intake = Services.GetRequiredService<SweepIntake>();
        foreach ((string lot, int first) in new[] { (LotNumber, 1), (SecondLot, 11) })
        {
            for (int index = first; index < first + 3; index++)
            {
                string serial = UnitSynthesiser.Serial(index);
                DefectKind defect = index == 12 ? DefectKind.CentreDrift : DefectKind.None;
                byte[] bytes = Encoding.ASCII.GetBytes(TouchstoneWriter.WriteToString(synthesiser.Unit(part, index, defect)));
                await intake.SubmitAsync(new SweepSubmission(lot, serial, Station, new Actor("u-rhaldane", "R. Haldane"), bytes, serial + ".s2p"));
            }
        }
    }

    [Fact]
    public async Task Two_lots_show_their_yields_a_control_chart_with_its_limits_and_ppk_per_lot()
    {
        await SeedTwoLotsAsync();
        Services.GetRequiredService<NavigationManager>().NavigateTo($"trends?part={PartNumber}");
        var cut = Render<Trends>();
        cut.WaitForElement("table.trend-lots tbody tr", TimeSpan.FromSeconds(20));

        var lots = cut.FindAll("table.trend-lots tbody tr");
        Assert.Equal([LotNumber, SecondLot], lots.Select(r => r.GetAttribute("data-lot")));
        // Lot 1: three good units, 3 of 3 go = 100.0 %; lot 2: unit 12 drifts 3 kHz beyond the ±1.5 kHz centre limit, 2 of 3 = 66.7 %.
        Assert.Contains("100.0 %", lots[0].TextContent, StringComparison.Ordinal);
        Assert.Contains("66.7 %", lots[1].TextContent, StringComparison.Ordinal);

        Assert.Equal("centre", cut.Find("article.parameter-trend").GetAttribute("data-rule"));
        Assert.Contains("Centre lines", cut.Find("p.centre-lines").TextContent, StringComparison.Ordinal);
        Assert.NotEmpty(cut.FindAll("ul.signals li"));
        // X-bar, S and Ppk charts of the rule, and the yield chart.
        Assert.Equal(4, cut.FindComponents<SweepChart>().Count);
        Assert.Equal(2, cut.FindAll("table.capability tbody tr").Count);

        // The part's yield report over a period starts with the span of the lots shown (their registration days, UTC).
        string[] days = (await Services.GetRequiredService<LotService>().FindLotsAsync(new LotQuery { PartNumber = PartNumber }))
            .Select(l => l.CreatedAt.UtcDateTime.ToString("yyyy-MM-dd", System.Globalization.CultureInfo.InvariantCulture)).Order(StringComparer.Ordinal).ToArray();
        Assert.Equal($"parts/{PartNumber}/yield-report.pdf?from={days[0]}&to={days[^1]}&paper=a4", cut.Find("#t-period-report").GetAttribute("href"));
        cut.Find("#t-paper").Change("letter");
        Assert.EndsWith("&paper=letter", cut.Find("#t-period-report").GetAttribute("href"), StringComparison.Ordinal);

        cut.Find("#t-rule").Change("loss");
        cut.WaitForAssertion(() => Assert.Equal("loss", cut.Find("article.parameter-trend").GetAttribute("data-rule")), TimeSpan.FromSeconds(10));
        Assert.Contains("dB", cut.Find("table.capability").TextContent, StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_model_builds_the_control_chart_from_the_lot_means_and_spreads()
    {
        await SeedTwoLotsAsync();
        TrendPage page = await Services.GetRequiredService<TrendPageModel>().LoadAsync(PartNumber, "Veltrane Piezo");
        ParameterTrend centre = page.Parameters.Single(p => p.RuleId == "centre");
        Assert.NotNull(centre.Chart);
        Assert.Equal(2, centre.Chart.Points.Count);
        // Both lots have n = 3: x̿ is the mean of the two lot means, s̄ the mean of the two s (Montgomery 6.3, equal n).
        // 1e-9 relative: the same sums in another order.
        double grand = centre.Lots.Average(l => l.Moments.Mean), sBar = centre.Lots.Average(l => l.Moments.StandardDeviation);
        Assert.Equal(grand, centre.Chart.GrandMean, Math.Abs(grand) * 1e-9);
        Assert.Equal(sBar, centre.Chart.AverageS, sBar * 1e-9);
        Assert.Equal(["Veltrane Piezo"], page.Suppliers);
        await Assert.ThrowsAsync<FilterQA.Data.RecordNotFoundException>(() => Services.GetRequiredService<TrendPageModel>().LoadAsync("TME-NO-SUCH", null));
    }
}
