using FilterQA.Data.Accounts;
using FilterQA.Web.Tests.Infrastructure;
using Microsoft.Playwright;

namespace FilterQA.Web.Tests.Browser;

/// <summary>A person at the bench signs in with badge and PIN in a real browser and reaches a signed-in page.</summary>
public sealed class SignInBrowserTests
{
    [BrowserFact]
    public async Task Badge_and_pin_sign_in_in_the_browser_opens_a_signed_in_page()
    {
        Assert.Null(BrowserHost.MissingBrowser());
        await using BrowserHost host = await BrowserHost.StartAsync();
        await Bench.CreatePersonAsync(host.Factory, "rhaldane", RoleNames.Operator, badge: "1001", pin: "640215");

        IPage page = await host.Browser.NewPageAsync();
        await page.GotoAsync("/");
        Assert.Contains("/signin", page.Url, StringComparison.Ordinal);
        await page.FillAsync("input[name=badge]", "1001");
        await page.FillAsync("input[name=pin]", "640215");
        await page.ClickAsync("button[type=submit] >> nth=0");
        await page.WaitForURLAsync(url => !url.Contains("/signin", StringComparison.Ordinal), new() { Timeout = 30_000, WaitUntil = WaitUntilState.Commit });
        ILocator signedIn = page.Locator("#signed-in-as, [data-signed-in]");
        await signedIn.First.WaitForAsync(new() { Timeout = 30_000 });
        Assert.Contains("Test rhaldane", await signedIn.First.InnerTextAsync(), StringComparison.Ordinal);
        await page.ScreenshotAsync(new() { Path = Path.Combine(BrowserHost.ScreenshotsFolder, "signed-in.png"), FullPage = true });
    }
}
