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

    private static readonly string[] LaunchArgs =
        ["--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run"];

    private readonly TempFolder _data;
    private readonly TempFolder _profile;
    private IPlaywright? _playwright;
    private IBrowser? _separate;

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

    /// <summary>
    /// Starts the host on <paramref name="port"/> (0: any free port; a test that must know the address before the host
    /// starts, e.g. to configure it, picks one with <see cref="FreePort"/>) and the browser.
    /// </summary>
    public static async Task<BrowserHost> StartAsync(IDictionary<string, string?>? settings = null, int port = 0)
    {
        var data = new TempFolder();
        var factory = new WebFactory(data.Path, settings);
        factory.UseKestrel(port);
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
            Args = LaunchArgs,
        });
        return new BrowserHost(data, profile, factory, baseUrl, playwright, browser);
    }

    /// <summary>A loopback port free at the time of asking.</summary>
    public static int FreePort()
    {
        using var listener = new System.Net.Sockets.TcpListener(System.Net.IPAddress.Loopback, 0);
        listener.Start();
        return ((System.Net.IPEndPoint)listener.LocalEndpoint).Port;
    }

    /// <summary>
    /// A fresh context that shares no cookies with <see cref="Browser"/> (nobody signed in), in a second browser
    /// process: the persistent context's browser cannot open another context. Closed with the host.
    /// </summary>
    public async Task<IBrowserContext> NewContextAsync()
    {
        ObjectDisposedException.ThrowIf(_playwright is null, this);
        _separate ??= await _playwright.Chromium.LaunchAsync(new BrowserTypeLaunchOptions
        {
            ExecutablePath = ChromiumPath,
            Headless = true,
            Args = LaunchArgs,
        });
        return await _separate.NewContextAsync(new BrowserNewContextOptions { BaseURL = BaseUrl });
    }

    public async ValueTask DisposeAsync()
    {
        if (_separate is not null)
        {
            await _separate.DisposeAsync();
            _separate = null;
        }
        await Browser.DisposeAsync();
        _playwright?.Dispose();
        _playwright = null;
        await Factory.DisposeAsync();
        _data.Dispose();
        _profile.Dispose();
    }
}
