using FilterQA.Web.Tests.Infrastructure;
using Microsoft.AspNetCore.Hosting.Server;
using Microsoft.AspNetCore.Hosting.Server.Features;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Playwright;

namespace FilterQA.Web.Tests.Browser;

/// <summary>
/// The host on Kestrel at a free loopback port, and headless Debian Chromium driven by Playwright. Screenshots
/// go to tests/TestResults/screenshots. Without /usr/bin/chromium a browser test is skipped, except under
/// CI=true, where it fails.
/// </summary>
public sealed class BrowserHost : IAsyncDisposable
{
    public const string ChromiumPath = "/usr/bin/chromium";

    private readonly TempFolder _data;
    private readonly TempFolder _profile;
    private IPlaywright? _playwright;

    private BrowserHost(TempFolder data, TempFolder profile, WebFactory factory, string baseUrl, IPlaywright playwright, IBrowserContext browser)
    {
        _data = data;
        _profile = profile;
        Factory = factory;
        BaseUrl = baseUrl;
        _playwright = playwright;
        Browser = browser;
    }

    public WebFactory Factory { get; }

    public string BaseUrl { get; }

    public IBrowserContext Browser { get; }

    public static string ScreenshotsFolder
    {
        get
        {
            string root = FilterQA.Web.Hosting.RepositoryPaths.FindRoot(AppContext.BaseDirectory) ?? Path.GetTempPath();
            string folder = Path.Combine(root, "tests", "TestResults", "screenshots");
            Directory.CreateDirectory(folder);
            return folder;
        }
    }

    /// <summary>True under CI=true, where a missing browser fails the browser tests instead of skipping them.</summary>
    public static bool IsCi => string.Equals(Environment.GetEnvironmentVariable("CI"), "true", StringComparison.OrdinalIgnoreCase);

    /// <summary>Null when the browser is there, else the reason; throws under CI=true.</summary>
    public static string? MissingBrowser()
    {
        if (File.Exists(ChromiumPath))
        {
            return null;
        }
        string reason = $"{ChromiumPath} is missing: install Debian's chromium package (.ci/run does)";
        return IsCi
            ? throw new InvalidOperationException("CI=true and " + reason)
            : reason;
    }

    public static async Task<BrowserHost> StartAsync(IDictionary<string, string?>? settings = null)
    {
        var data = new TempFolder();
        var factory = new WebFactory(data.Path, settings);
        factory.UseKestrel(0);
        factory.StartServer();
        string baseUrl = factory.Services.GetRequiredService<IServer>().Features.Get<IServerAddressesFeature>()!.Addresses
            .First().Replace("[::]", "127.0.0.1", StringComparison.Ordinal).Replace("localhost", "127.0.0.1", StringComparison.Ordinal);
        IPlaywright playwright = await Playwright.CreateAsync();
        var profile = new TempFolder();
        IBrowserContext browser = await playwright.Chromium.LaunchPersistentContextAsync(profile.Path, new BrowserTypeLaunchPersistentContextOptions
        {
            ExecutablePath = ChromiumPath,
            Headless = true,
            BaseURL = baseUrl,
            Args = ["--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run"],
        });
        return new BrowserHost(data, profile, factory, baseUrl, playwright, browser);
    }

    public async ValueTask DisposeAsync()
    {
        await Browser.DisposeAsync();
        _playwright?.Dispose();
        _playwright = null;
        await Factory.DisposeAsync();
        _data.Dispose();
        _profile.Dispose();
    }
}
