using FilterQA.Data.Accounts;
using FilterQA.Web.Tests.Infrastructure;
using Microsoft.Playwright;

namespace FilterQA.Web.Tests.Browser;

/// <summary>
/// An operator measures one unit at the bench in a real browser: badge + PIN, lot, serial, sweep file, verdict and
/// chart; then hands the bench to the next operator with "Switch operator".
/// </summary>
public sealed class BenchBrowserTests
{
    // Generous: the machine is shared and the first circuit start compiles a lot of Razor.
    private const float WaitMs = 30_000;

    [BrowserFact]
    public async Task Operator_opens_a_lot_gives_a_sweep_sees_go_and_the_chart_then_hands_over()
    {
        Assert.Null(BrowserHost.MissingBrowser());
        await using BrowserHost host = await BrowserHost.StartAsync();
        // A network (.s2p) sweep counts as analyser-calibrated, so station IQC-1 needs no recorded thru.
        string lotNumber = await Bench.PrepareLotAsync(host.Factory);
        await Bench.CreatePersonAsync(host.Factory, "rhaldane", RoleNames.Operator, badge: "1001", pin: "640215");
        await Bench.CreatePersonAsync(host.Factory, "mokafor", RoleNames.Operator, badge: "1002", pin: "318804");
        using var files = new TempFolder();
        // A synthetic unit without defect: the demo synthesiser centres it inside the shipped template's limits.
        string sweepPath = Path.Combine(files.Path, "S0001.s2p");
        await File.WriteAllTextAsync(sweepPath, Bench.UnitTouchstone(serialIndex: 1));

        IPage page = await host.Browser.NewPageAsync();
        await SignInAsync(page, "1001", "640215");
        await page.GotoAsync("/bench");
        await page.Locator(".bench[data-interactive=yes]").WaitForAsync(new() { Timeout = WaitMs });
        Assert.Equal(Bench.Station, await page.Locator("#station").InputValueAsync());

        await page.FillAsync("#lot", lotNumber);
        await page.PressAsync("#lot", "Enter");
        ILocator lotTitle = page.Locator(".lot-title");
        await lotTitle.WaitForAsync(new() { Timeout = WaitMs });
        Assert.Contains(lotNumber, await lotTitle.InnerTextAsync(), StringComparison.Ordinal);

        await page.FillAsync("#serial", "S0001");
        await page.PressAsync("#serial", "Enter");
        await Assertions.Expect(page.Locator("#drop-help")).ToContainTextAsync("S0001", new() { Timeout = WaitMs });
        await page.Locator("#sweep-files").SetInputFilesAsync(sweepPath);

        ILocator verdict = page.Locator("section.verdict");
        await verdict.WaitForAsync(new() { Timeout = WaitMs });
        Assert.Equal("go", await verdict.GetAttributeAsync("data-verdict"));
        Assert.Equal("GO", (await verdict.Locator(".verdict-word").InnerTextAsync()).Trim());
        Assert.Contains("Unit S0001", await verdict.Locator(".verdict-unit").InnerTextAsync(), StringComparison.Ordinal);
        // Plotly draws into an svg of class main-svg inside its container once the script has run.
        await page.Locator(".sweep-chart .js-plotly-plot svg.main-svg").First.WaitForAsync(new() { Timeout = WaitMs });
        await page.Locator("tr[data-outcome]").First.WaitForAsync(new() { Timeout = WaitMs });
        await page.ScreenshotAsync(new() { Path = Path.Combine(BrowserHost.ScreenshotsFolder, "bench-verdict.png"), FullPage = true });

        await page.ClickAsync("form.switch-form button[type=submit]");
        await page.WaitForURLAsync(url => url.Contains("/signin", StringComparison.Ordinal), new() { Timeout = WaitMs, WaitUntil = WaitUntilState.Commit });
        await Assertions.Expect(page.Locator("#signed-in-as")).ToHaveCountAsync(0);

        await SignInAsync(page, "1002", "318804");
        ILocator who = page.Locator("#signed-in-as");
        await who.WaitForAsync(new() { Timeout = WaitMs });
        Assert.Equal("mokafor", await who.GetAttributeAsync("data-who"));
        Assert.Contains("Test mokafor", await who.Locator(".who-name").InnerTextAsync(), StringComparison.Ordinal);
        await page.ScreenshotAsync(new() { Path = Path.Combine(BrowserHost.ScreenshotsFolder, "bench-second-operator.png"), FullPage = true });
    }

    internal static async Task SignInAsync(IPage page, string badge, string pin)
    {
        if (!page.Url.Contains("/signin", StringComparison.Ordinal))
        {
            await page.GotoAsync("/signin");
        }
        await page.FillAsync("input[name=badge]", badge);
        await page.FillAsync("input[name=pin]", pin);
        await page.ClickAsync("button[type=submit] >> nth=0");
        await page.WaitForURLAsync(url => !url.Contains("/signin", StringComparison.Ordinal), new() { Timeout = WaitMs, WaitUntil = WaitUntilState.Commit });
    }
}
