using System.Globalization;
using System.Text;
using FilterQA.Core.Decisions;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Web.Tests.Infrastructure;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Playwright;

namespace FilterQA.Web.Tests.Browser;

/// <summary>
/// The template editor in a real browser: a quality engineer tightens a rule and sees the preview judge a stored unit
/// again; an operator cannot open the editor.
/// </summary>
public sealed class TemplateEditorBrowserTests
{
    private const float WaitMs = 30_000;
    private const string LotNumber = "VP-2611-0907";

    [BrowserFact]
    public async Task Quality_engineer_tightens_the_loss_limit_sees_the_preview_fail_the_unit_and_saves()
    {
        Assert.Null(BrowserHost.MissingBrowser());
        await using BrowserHost host = await BrowserHost.StartAsync();
        int draft = await SeedAsync(host.Factory);
        await Bench.CreatePersonAsync(host.Factory, "jlindqvist", RoleNames.QualityEngineer, badge: "1007", pin: "638214");

        IPage page = await host.Browser.NewPageAsync();
        await BenchBrowserTests.SignInAsync(page, "1007", "638214");
        await page.GotoAsync($"/templates/{Bench.Part}/{draft}/edit");
        await page.Locator(".editor-bar[data-interactive=yes]").WaitForAsync(new() { Timeout = WaitMs });
        await page.Locator("#preview-stored").SelectOptionAsync(new SelectOptionValue { Index = 1 });
        await page.Locator("#preview-add").ClickAsync();
        ILocator lossRow = page.Locator(".preview-unit tr[data-rule='loss']");
        await lossRow.WaitForAsync(new() { Timeout = WaitMs });
        Assert.Equal(nameof(RuleOutcome.Pass), await lossRow.GetAttributeAsync("data-outcome"));
        double measuredDb = Db(await lossRow.Locator("td.value").InnerTextAsync());
        double marginBeforeDb = Db(await lossRow.Locator("td.margin").InnerTextAsync());
        // The shipped limit is "maximum: 6 dB": margin = limit − measured for an at-most rule (limit-templates/README.md).
        // Both figures are shown to 4 decimals, so they agree within 2e-4 dB.
        Assert.Equal(6 - measuredDb, marginBeforeDb, 2e-4);

        // A limit 0.5 dB below the measured loss: the margin becomes −0.5 dB, beyond the rule's 0.3 dB uncertainty, so a fail
        // (ILAC-G8:09/2019: measured value outside the limit by more than U).
        double newLimitDb = Math.Round(measuredDb - 0.5, 2);
        string typed = newLimitDb.ToString("0.##", CultureInfo.InvariantCulture);
        await page.Locator("fieldset[data-rule-kind='insertion-loss'] [data-key='maximum'] input").FillAsync(typed);
        await Assertions.Expect(lossRow).ToHaveAttributeAsync("data-outcome", nameof(RuleOutcome.Fail), new() { Timeout = WaitMs });
        double marginAfterDb = Db(await lossRow.Locator("td.margin").InnerTextAsync());
        Assert.Equal(newLimitDb - measuredDb, marginAfterDb, 2e-4);
        Assert.Contains($"maximum: {typed} dB", await page.Locator("#template-text").InputValueAsync(), StringComparison.Ordinal);
        await Assertions.Expect(page.Locator(".preview-unit")).ToHaveAttributeAsync("data-verdict", nameof(UnitVerdict.NoGo), new() { Timeout = WaitMs });

        await page.Locator("#save-draft").ClickAsync();
        await Assertions.Expect(page.Locator("p.note")).ToContainTextAsync("Saved as version 2", new() { Timeout = WaitMs });
        await page.ScreenshotAsync(new() { Path = Path.Combine(BrowserHost.ScreenshotsFolder, "template-editor.png"), FullPage = true });

        await using AsyncServiceScope scope = host.Factory.Services.CreateAsyncScope();
        StoredTemplateText stored = await scope.ServiceProvider.GetRequiredService<TemplateCatalog>().LoadTextAsync(Bench.Part, draft);
        Assert.Contains($"maximum: {typed} dB", stored.Text, StringComparison.Ordinal);
    }

    [BrowserFact]
    public async Task An_operator_cannot_open_the_template_editor()
    {
        Assert.Null(BrowserHost.MissingBrowser());
        await using BrowserHost host = await BrowserHost.StartAsync();
        int draft = await SeedAsync(host.Factory);
        await Bench.CreatePersonAsync(host.Factory, "rhaldane", RoleNames.Operator, badge: "1008", pin: "402917");

        IPage page = await host.Browser.NewPageAsync();
        await BenchBrowserTests.SignInAsync(page, "1008", "402917");
        Assert.Equal(0, await page.Locator("nav a[href='templates']").CountAsync());
        await page.GotoAsync($"/templates/{Bench.Part}/{draft}/edit");

        await Assertions.Expect(page).ToHaveURLAsync(new System.Text.RegularExpressions.Regex("/signin\\?error="), new() { Timeout = WaitMs });
        await Assertions.Expect(page.Locator("body")).ToContainTextAsync("may not open that page", new() { Timeout = WaitMs });
        Assert.Equal(0, await page.Locator("#template-text").CountAsync());
    }

    /// <summary>The shipped template released, a lot with one stored unit, and a draft started from the release; returns the draft's revision.</summary>
    private static async Task<int> SeedAsync(WebFactory factory)
    {
        await Bench.PrepareLotAsync(factory, LotNumber);
        await using AsyncServiceScope scope = factory.Services.CreateAsyncScope();
        IServiceProvider services = scope.ServiceProvider;
        byte[] bytes = Encoding.UTF8.GetBytes(Bench.UnitTouchstone(serialIndex: 1));
        IntakeResult result = await services.GetRequiredService<SweepIntake>().SubmitAsync(
            new SweepSubmission(LotNumber, "S0001", Bench.Station, new Actor("u-rhaldane", "R. Haldane"), bytes, "S0001.s2p"));
        Assert.Equal(UnitVerdict.Go, result.Evaluation.Verdict);
        StoredTemplateText draft = await services.GetRequiredService<TemplateCatalog>().StartDraftAsync(Bench.Part, 1, Bench.Engineer);
        return draft.Revision;
    }

    private static double Db(string text) => double.Parse(text.Replace("at least ", "", StringComparison.Ordinal).Replace(" dB", "", StringComparison.Ordinal).Trim(),
        NumberStyles.Float, CultureInfo.InvariantCulture);
}
