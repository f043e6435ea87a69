using FilterQA.Web.Setup;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.AspNetCore.TestHost;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.DependencyInjection.Extensions;

namespace FilterQA.Web.Tests.Infrastructure;

/// <summary>
/// The host in process on its own SQLite file in a temp folder, demo seeding off unless a test turns it
/// on, first-start secrets captured in <see cref="Console"/> instead of the process console.
/// </summary>
public sealed class WebFactory : WebApplicationFactory<Program>
{
    private readonly Dictionary<string, string?> _settings;
    private readonly TimeProvider? _clock;

    public WebFactory(string dataFolder, IDictionary<string, string?>? settings = null, TimeProvider? clock = null)
    {
        DataFolder = dataFolder;
        _clock = clock;
        _settings = new Dictionary<string, string?>(StringComparer.Ordinal)
        {
            ["Storage:DataFolder"] = dataFolder,
            ["Demo:Seed"] = "false",
            ["Watch:PollSeconds"] = "3600",
        };
        foreach ((string key, string? value) in settings ?? new Dictionary<string, string?>())
        {
            _settings[key] = value;
        }
    }

    public string DataFolder { get; }

    /// <summary>What first start printed (one-time passwords, PINs).</summary>
    public StringWriter Console { get; } = new();

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        builder.UseEnvironment("Testing");
        // Outside Development the host does not map the static web assets of the framework and the page library
        // (blazor.web.js, the scoped CSS bundle) by itself; a browser needs them to start a circuit.
        builder.UseStaticWebAssets();
        foreach ((string key, string? value) in _settings)
        {
            builder.UseSetting(key, value);
        }
        builder.ConfigureTestServices(services =>
        {
            services.RemoveAll<SetupConsole>();
            services.AddSingleton(new SetupConsole(TextWriter.Synchronized(Console)));
            if (_clock is not null)
            {
                services.RemoveAll<TimeProvider>();
                services.AddSingleton(_clock);
            }
        });
    }
}
