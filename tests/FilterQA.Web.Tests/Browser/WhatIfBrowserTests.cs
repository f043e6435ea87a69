using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Web.Tests.Infrastructure;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Playwright;

namespace FilterQA.Web.Tests.Browser;

/// <summary>
/// A quality engineer tries a draft of the 455 kHz template on the demo lots in a real browser: chooses the part and
/// the draft, runs the what-if, sees the progress and the per-lot table, and opens a flipped unit's chart.
/// </summary>
public sealed class WhatIfBrowserTests
{
    private const float WaitMs = 60_000;
    private const string Part = "TME-CF455-15";

    [BrowserFact]
    public async Task Quality_engineer_runs_a_what_if_on_the_demo_lots_and_opens_a_flipped_units_chart()
    {
        Assert.Null(BrowserHost.MissingBrowser());
        await using BrowserHost host = await BrowserHost.StartAsync(new Dictionary<string, string?> { ["Demo:Seed"] = "true" });
        await RegisterDraftAsync(host.Factory);
        await Bench.CreatePersonAsync(host.Factory, "qe-browser", RoleNames.QualityEngineer, badge: "3901", pin: "771204");

        IPage page = await host.Browser.NewPageAsync();
        await BenchBrowserTests.SignInAsync(page, "3901", "771204");
        await page.GotoAsync("/whatif");
        await page.Locator("form.whatif-choice[data-interactive=yes]").WaitForAsync(new() { Timeout = WaitMs });
        await page.SelectOptionAsync("#w-part", Part);
        // Drafts are offered first: revision 2 is chosen once the part's revisions are read.
        await Assertions.Expect(page.Locator("#w-revision")).ToHaveValueAsync("2", new() { Timeout = WaitMs });
        await page.ClickAsync("#w-run");

        ILocator progress = page.Locator("section.whatif-progress");
        await progress.WaitForAsync(new() { Timeout = WaitMs });
        await Assertions.Expect(progress).ToHaveAttributeAsync("data-state", "Finished", new() { Timeout = WaitMs });
        string done = await page.Locator(".progress-text").InnerTextAsync();
        Assert.Matches(@"^Done: (\d+) of \1 measurements judged\.$", done);
        Assert.Equal(await progress.Locator("progress").GetAttributeAsync("max"), await progress.Locator("progress").GetAttributeAsync("value"));

        // The demo's two lots of the part: VP-2611-0042 (20 units) and VP-2611-0043 (decided at its second defective).
        ILocator lots = page.Locator("table.whatif-lots tbody tr");
        Assert.Equal(["VP-2611-0042", "VP-2611-0043"], await lots.EvaluateAllAsync<string[]>("rows => rows.map(r => r.dataset.lot)"));
        ILocator flips = page.Locator("table.whatif-flips tbody tr");
        Assert.True(await flips.CountAsync() > 0, "the draft changes at least one verdict");

        string serial = (await flips.First.Locator("td").Nth(1).InnerTextAsync()).Trim();
        await flips.First.Locator("button.show-chart").ClickAsync();
        ILocator chart = page.Locator("section.whatif-chart");
        await chart.Locator(".js-plotly-plot svg.main-svg").First.WaitForAsync(new() { Timeout = WaitMs });
        Assert.Contains($"Unit {serial}", await chart.Locator("h2").InnerTextAsync(), StringComparison.Ordinal);
        // The legend names both sets of limit lines.
        await Assertions.Expect(chart.Locator(".legend")).ToContainTextAsync("draft rev 2", new() { Timeout = WaitMs });
        await Assertions.Expect(chart.Locator(".legend")).ToContainTextAsync("recorded rev 1", new() { Timeout = WaitMs });
        await page.ScreenshotAsync(new() { Path = Path.Combine(BrowserHost.ScreenshotsFolder, "whatif-page.png"), FullPage = true });

        // The same engineer's trends of the part over the demo lots: the yield chart and the first rule's X-bar, S and Ppk charts.
        await page.GotoAsync($"/trends?part={Part}");
        await Assertions.Expect(page.Locator("table.trend-lots tbody tr")).ToHaveCountAsync(2, new() { Timeout = WaitMs });
        await Assertions.Expect(page.Locator("article.parameter-trend .js-plotly-plot svg.main-svg")).Not.ToHaveCountAsync(0, new() { Timeout = WaitMs });
        Assert.True(await page.Locator("ul.signals li").CountAsync() > 0, "the control chart says in words which lots are out of control, or that none is");
        await page.ScreenshotAsync(new() { Path = Path.Combine(BrowserHost.ScreenshotsFolder, "trends-page.png"), FullPage = true });

        // And the audit log, newest first: the draft registered above is the latest entry of the demo data.
        await page.GotoAsync("/audit");
        ILocator first = page.Locator("table.audit-entries tbody tr").First;
        await first.WaitForAsync(new() { Timeout = WaitMs });
        Assert.Equal("TemplateRegistered", await first.GetAttributeAsync("data-action"));
        await page.ScreenshotAsync(new() { Path = Path.Combine(BrowserHost.ScreenshotsFolder, "audit-page.png"), FullPage = true });
    }

    /// <summary>
    /// Revision 2 as a draft: centre tolerance widened to ±4 kHz, so the demo's units drifted by 3 kHz (lot VP-2611-0043)
    /// would pass, and the 6 dB bandwidth minimum raised to 19 kHz (a change that may or may not catch a unit).
    /// </summary>
    private static async Task RegisterDraftAsync(WebFactory factory)
    {
        await using AsyncServiceScope scope = factory.Services.CreateAsyncScope();
        TemplateCatalog catalog = scope.ServiceProvider.GetRequiredService<TemplateCatalog>();
        LimitTemplate released = await catalog.LoadAsync(Part, 1);
        LimitTemplate draft = released.NewRevision(editor =>
        {
            for (int i = 0; i < editor.Rules.Count; i++)
            {
                editor.Rules[i] = editor.Rules[i] switch
                {
                    CentreFrequencyRule c => new CentreFrequencyRule(c.Id, "Centre frequency 455.0 kHz ±4 kHz (draft)", c.LevelDb,
                        new FrequencyTolerance(4e3, ToleranceUnit.Hertz), c.Method, c.Uncertainty),
                    BandwidthRule { Id: "bw-6db" } b => new BandwidthRule(b.Id, "6 dB bandwidth at least 19 kHz (draft)", b.LevelDb, 19e3, b.MaximumHz, b.Uncertainty),
                    var other => other,
                };
            }
        });
        await catalog.RegisterAsync(draft, Bench.Engineer);
    }
}
