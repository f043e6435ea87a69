using System.Text;
using FilterQA.Core.Decisions;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;
using FilterQA.Core.Templates.Text;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Web.Hosting;
using FilterQA.Web.Tests.Infrastructure;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Playwright;

namespace FilterQA.Web.Tests.Browser;

/// <summary>
/// A quality engineer on the release page in a real browser: a draft that rejects the part's reference units cannot be
/// released and the failing units are shown; a draft that passes them is released with a reason.
/// </summary>
public sealed class TemplateReleaseBrowserTests
{
    private const float WaitMs = 30_000;

    [BrowserFact]
    public async Task A_quality_engineer_cannot_release_a_draft_that_fails_the_reference_units_and_releases_a_valid_one_with_a_reason()
    {
        Assert.Null(BrowserHost.MissingBrowser());
        await using BrowserHost host = await BrowserHost.StartAsync();
        LimitTemplate released = await SeedReferenceUnitsAsync(host.Factory, "VP-2611-0911");
        // The demo 455 kHz filter is built with at least 4.0 - 4 x 0.3 = 2.8 dB minimum loss (DemoParts design note,
        // normal draw cut at 4 sigma), so a 2 dB limit fails both reference units on the loss rule.
        await RegisterDraftAsync(host.Factory, WithLossLimit(Draft(released), 2.0));
        await Bench.CreatePersonAsync(host.Factory, "jlindqvist", RoleNames.QualityEngineer, badge: "1003", pin: "730418");

        IPage page = await host.Browser.NewPageAsync();
        await BenchBrowserTests.SignInAsync(page, "1003", "730418");
        await page.GotoAsync($"/templates/{Bench.Part}/2/release");
        ILocator check = page.Locator("section.reference-check[data-interactive=yes]");
        await check.WaitForAsync(new() { Timeout = WaitMs });
        Assert.Equal("no", await check.GetAttributeAsync("data-passed"));
        foreach (string serial in new[] { "S0001", "S0002" })
        {
            ILocator row = page.Locator($"tr[data-serial={serial}]");
            Assert.Equal("NoGo", await row.GetAttributeAsync("data-outcome"));
            Assert.Contains("VP-2611-0911", await row.InnerTextAsync(), StringComparison.Ordinal);
            await Assertions.Expect(row.Locator("li[data-rule=loss]")).ToBeVisibleAsync();
        }
        await page.FillAsync("#r-reason", "tighter loss limit requested by the customer");
        ILocator release = page.GetByRole(AriaRole.Button, new() { NameRegex = new("^Release revision 2") });
        await Assertions.Expect(release).ToBeDisabledAsync();
        await page.ScreenshotAsync(new() { Path = Path.Combine(BrowserHost.ScreenshotsFolder, "release-refused.png"), FullPage = true });

        // The same draft replaced by one with the released limits passes both units.
        await RegisterDraftAsync(host.Factory, Draft(released));
        await page.ReloadAsync();
        await check.WaitForAsync(new() { Timeout = WaitMs });
        Assert.Equal("yes", await check.GetAttributeAsync("data-passed"));
        await page.FillAsync("#r-reason", "description updated for the new supplier data sheet");
        await Assertions.Expect(release).ToBeEnabledAsync(new() { Timeout = WaitMs });
        await release.ClickAsync();

        await Assertions.Expect(page.Locator(".revision-status")).ToHaveAttributeAsync("data-status", "Released", new() { Timeout = WaitMs });
        await Assertions.Expect(page.Locator(".done")).ToContainTextAsync("Released by Test jlindqvist", new() { Timeout = WaitMs });
        await page.ScreenshotAsync(new() { Path = Path.Combine(BrowserHost.ScreenshotsFolder, "release-done.png"), FullPage = true });

        // The difference of the two revisions: the description changed, the rules did not.
        await page.GotoAsync($"/templates/{Bench.Part}/diff?from=1&to=2");
        await page.Locator(".pickers[data-interactive=yes]").WaitForAsync(new() { Timeout = WaitMs });
        await Assertions.Expect(page.Locator("tr[data-field=description] .what")).ToHaveTextAsync("changed");
        await Assertions.Expect(page.Locator("tr[data-rule=loss]")).ToHaveAttributeAsync("data-change", "Unchanged");
        await page.ScreenshotAsync(new() { Path = Path.Combine(BrowserHost.ScreenshotsFolder, "template-diff.png"), FullPage = true });

        await using AsyncServiceScope scope = host.Factory.Services.CreateAsyncScope();
        TemplateCatalog catalog = scope.ServiceProvider.GetRequiredService<TemplateCatalog>();
        LimitTemplate stored = await catalog.LoadAsync(Bench.Part, 2);
        Assert.Equal(TemplateStatus.Released, stored.Status);
        Assert.Equal("Test jlindqvist", stored.Author);
    }

    [BrowserFact]
    public async Task A_quality_engineer_adds_a_reference_unit_by_lot_and_unit_and_removes_one_with_a_note()
    {
        Assert.Null(BrowserHost.MissingBrowser());
        await using BrowserHost host = await BrowserHost.StartAsync();
        await SeedReferenceUnitsAsync(host.Factory, "VP-2611-0912", mark: 1);
        await Bench.CreatePersonAsync(host.Factory, "jlindqvist", RoleNames.QualityEngineer, badge: "1003", pin: "730418");

        IPage page = await host.Browser.NewPageAsync();
        await BenchBrowserTests.SignInAsync(page, "1003", "730418");
        await page.GotoAsync($"/templates/{Bench.Part}/reference-units");
        await page.Locator("section[data-interactive=yes]").WaitForAsync(new() { Timeout = WaitMs });
        await Assertions.Expect(page.Locator("table.reference-units tbody tr[data-serial]")).ToHaveCountAsync(1);

        await page.SelectOptionAsync("#a-lot", "VP-2611-0912");
        await Assertions.Expect(page.Locator("#a-unit option")).ToHaveCountAsync(3, new() { Timeout = WaitMs });
        await page.SelectOptionAsync("#a-unit", new SelectOptionValue { Label = (await page.Locator("#a-unit option", new() { HasTextString = "S0002" }).InnerTextAsync()).Trim() });
        await page.FillAsync("#a-note", "measured again on bench 2, same result");
        await page.GetByRole(AriaRole.Button, new() { Name = "Add the reference unit" }).ClickAsync();
        await Assertions.Expect(page.Locator(".done")).ToContainTextAsync("S0002 of lot VP-2611-0912 is now a reference unit", new() { Timeout = WaitMs });
        await Assertions.Expect(page.Locator("table.reference-units tbody tr[data-serial]")).ToHaveCountAsync(2);

        ILocator first = page.Locator("tr[data-serial=S0001]");
        await page.GetByRole(AriaRole.Button, new() { Name = "Remove S0001" }).ClickAsync();
        await Assertions.Expect(page.Locator("[role=alert]")).ToContainTextAsync("Say why S0001 is removed", new() { Timeout = WaitMs });
        await first.Locator("input").FillAsync("connector worn");
        await page.GetByRole(AriaRole.Button, new() { Name = "Remove S0001" }).ClickAsync();
        await Assertions.Expect(page.Locator(".done")).ToContainTextAsync("S0001 of lot VP-2611-0912 is no longer a reference unit", new() { Timeout = WaitMs });
        await Assertions.Expect(first).ToHaveCountAsync(0);
        await page.ScreenshotAsync(new() { Path = Path.Combine(BrowserHost.ScreenshotsFolder, "reference-units.png"), FullPage = true });

        await using AsyncServiceScope scope = host.Factory.Services.CreateAsyncScope();
        IReadOnlyList<ReferenceUnitInfo> now = await scope.ServiceProvider.GetRequiredService<ReferenceUnitService>().ListAsync(Bench.Part);
        Assert.Equal(["S0002"], now.Select(u => u.Serial));
        Assert.Equal("measured again on bench 2, same result", now[0].Note);
    }

    /// <summary>The shipped released revision 1, a lot of two go units under it, the first <paramref name="mark"/> marked as reference units.</summary>
    private static async Task<LimitTemplate> SeedReferenceUnitsAsync(WebFactory factory, string lotNumber, int mark = 2)
    {
        await using AsyncServiceScope scope = factory.Services.CreateAsyncScope();
        IServiceProvider services = scope.ServiceProvider;
        string root = RepositoryPaths.FindRoot(AppContext.BaseDirectory) ?? throw new InvalidOperationException("repository root not found");
        LimitTemplate template = LimitTemplateReader.ReadFile(Path.Combine(root, "limit-templates", Bench.Part + ".yaml")).Template!;
        await services.GetRequiredService<TemplateCatalog>().RegisterAsync(template, Bench.Engineer);
        await services.GetRequiredService<StationRegistry>().RegisterStationAsync(Bench.Station, "bench 1", Bench.Engineer);
        await services.GetRequiredService<LotService>().CreateLotAsync(
            new NewLot(lotNumber, Bench.Part, null, "Veltrane Piezo", 2, PlanRequest.FullInspection()), Bench.Engineer);
        SweepIntake intake = services.GetRequiredService<SweepIntake>();
        ReferenceUnitService references = services.GetRequiredService<ReferenceUnitService>();
        var operatorActor = new Actor("u-rhaldane", "R. Haldane");
        for (int i = 1; i <= 2; i++)
        {
            string serial = $"S{i:D4}";
            byte[] bytes = Encoding.UTF8.GetBytes(Bench.UnitTouchstone(serialIndex: i));
            IntakeResult result = await intake.SubmitAsync(new SweepSubmission(lotNumber, serial, Bench.Station, operatorActor, bytes, serial + ".s2p"));
            Assert.Equal(UnitVerdict.Go, result.Evaluation.Verdict);
            if (i <= mark)
            {
                await references.AddAsync(Bench.Part, result.Stored.MeasurementId, "cross-checked on a second analyser", Bench.Engineer);
            }
        }
        return template;
    }

    private static async Task RegisterDraftAsync(WebFactory factory, LimitTemplate draft)
    {
        await using AsyncServiceScope scope = factory.Services.CreateAsyncScope();
        await scope.ServiceProvider.GetRequiredService<TemplateCatalog>().RegisterAsync(draft, Bench.Engineer);
    }

    private static LimitTemplate Draft(LimitTemplate released) => released.NewRevision(edit => edit.Description = released.Description + ", data sheet C");

    private static LimitTemplate WithLossLimit(LimitTemplate draft, double maximumDb) =>
        LimitTemplate.Create(draft.PartNumber, draft.Revision, draft.Description, draft.Device, draft.NominalHz, draft.Status, draft.Author, null,
            draft.Sweep, draft.DecisionRule, draft.Rules.Select(r => r is InsertionLossRule loss
                ? new InsertionLossRule(loss.Id, loss.Title, maximumDb, loss.Measure, loss.At, loss.Uncertainty)
                : r).ToArray());
}
