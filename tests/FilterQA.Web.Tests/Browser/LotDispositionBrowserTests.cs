using System.Text;
using FilterQA.Core.Templates.Text;
using FilterQA.Data;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Web.Hosting;
using FilterQA.Web.Tests.Infrastructure;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Playwright;

namespace FilterQA.Web.Tests.Browser;

/// <summary>An approver decides a fully sampled lot by its plan on the lot page in a real browser.</summary>
public sealed class LotDispositionBrowserTests
{
    private const float WaitMs = 30_000;

    [BrowserFact]
    public async Task Approver_decides_a_complete_lot_by_the_plan_and_sees_it_accepted()
    {
        Assert.Null(BrowserHost.MissingBrowser());
        await using BrowserHost host = await BrowserHost.StartAsync();
        const string lotNumber = "VP-2611-0901";
        await SeedTestedLotAsync(host.Factory, lotNumber);
        await Bench.CreatePersonAsync(host.Factory, "spetrova", RoleNames.Approver, badge: "1004", pin: "552190");

        IPage page = await host.Browser.NewPageAsync();
        await BenchBrowserTests.SignInAsync(page, "1004", "552190");
        await page.GotoAsync($"/lots/{lotNumber}");
        await page.Locator("section.disposition[data-interactive=yes]").WaitForAsync(new() { Timeout = WaitMs });
        ILocator status = page.Locator(".lot-status");
        Assert.NotEqual("Accepted", await status.GetAttributeAsync("data-status"));

        await page.GetByRole(AriaRole.Button, new() { NameRegex = new("^Decide by the plan") }).ClickAsync();
        await Assertions.Expect(status).ToHaveAttributeAsync("data-status", "Accepted", new() { Timeout = WaitMs });
        Assert.Contains("Status: Accepted", await status.InnerTextAsync(), StringComparison.Ordinal);
        Assert.Contains("decided by", await status.InnerTextAsync(), StringComparison.Ordinal);
        await Assertions.Expect(page.Locator(".disposition .done")).ToHaveTextAsync("Decided by the plan.", new() { Timeout = WaitMs });
        await page.ScreenshotAsync(new() { Path = Path.Combine(BrowserHost.ScreenshotsFolder, "lot-page.png"), FullPage = true });
    }

    /// <summary>
    /// A lot of two under 100 % inspection with acceptance number 0: its sample is both units, and two GO units
    /// complete it with no defective, so the plan accepts it (accept when defectives ≤ Ac; ISO 2859-1 / MIL-STD-105E
    /// single sampling rule).
    /// </summary>
    private static async Task SeedTestedLotAsync(WebFactory factory, string lotNumber)
    {
        await using AsyncServiceScope scope = factory.Services.CreateAsyncScope();
        IServiceProvider services = scope.ServiceProvider;
        string root = RepositoryPaths.FindRoot(AppContext.BaseDirectory) ?? throw new InvalidOperationException("repository root not found");
        TemplateReadResult read = LimitTemplateReader.ReadFile(Path.Combine(root, "limit-templates", Bench.Part + ".yaml"));
        await services.GetRequiredService<TemplateCatalog>().RegisterAsync(read.Template!, Bench.Engineer);
        await services.GetRequiredService<StationRegistry>().RegisterStationAsync(Bench.Station, "bench 1", Bench.Engineer);
        await services.GetRequiredService<LotService>().CreateLotAsync(
            new NewLot(lotNumber, Bench.Part, null, "Veltrane Piezo", 2, PlanRequest.FullInspection()), Bench.Engineer);
        SweepIntake intake = services.GetRequiredService<SweepIntake>();
        var operatorActor = new Actor("u-rhaldane", "R. Haldane");
        for (int i = 1; i <= 2; i++)
        {
            string serial = $"S{i:D4}";
            byte[] bytes = Encoding.UTF8.GetBytes(Bench.UnitTouchstone(serialIndex: i));
            IntakeResult result = await intake.SubmitAsync(new SweepSubmission(lotNumber, serial, Bench.Station, operatorActor, bytes, serial + ".s2p"));
            Assert.Equal(FilterQA.Core.Decisions.UnitVerdict.Go, result.Evaluation.Verdict);
        }
    }
}
