using System.Diagnostics;
using System.Net;
using System.Net.Sockets;
using System.Text;
using System.Text.RegularExpressions;
using FilterQA.Web.Tests.Infrastructure;

namespace FilterQA.Web.Tests.Browser;

/// <summary>
/// The README's run command as a newcomer types it, from the repository root, against a throw-away data folder:
/// the host starts, prints the first-start demo credentials, and the printed operator badge and PIN sign in and
/// reach the lot list with the demo lots. Needs the solution built: it runs with --no-build, which dotnet test
/// has already done.
/// </summary>
public sealed partial class ReadmeRunTests
{
    private static readonly TimeSpan ListenTimeout = TimeSpan.FromSeconds(120);

    [Fact]
    [Trait("Needs", "build")]
    public async Task Readme_run_command_starts_prints_demo_credentials_and_the_operator_reaches_the_demo_lots()
    {
        string root = FindSolutionRoot();
        string configuration = new DirectoryInfo(AppContext.BaseDirectory).Parent?.Name ?? "Debug";
        using var data = new TempFolder();
        int port = FreePort();
        string url = $"http://127.0.0.1:{port}";

        var start = new ProcessStartInfo("dotnet")
        {
            WorkingDirectory = root,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        foreach (string arg in (string[])["run", "--project", "src/FilterQA.Web", "--no-build", "--urls", url])
        {
            start.ArgumentList.Add(arg);
        }
        // The test host may be a Release build; run the web host built alongside it.
        if (!string.Equals(configuration, "Debug", StringComparison.Ordinal))
        {
            start.ArgumentList.Add("-c");
            start.ArgumentList.Add(configuration);
        }
        start.Environment["Storage__DataFolder"] = data.Path;
        start.Environment["ASPNETCORE_ENVIRONMENT"] = "Development";
        start.Environment["DOTNET_NOLOGO"] = "1";
        start.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";

        var output = new StringBuilder();
        var listening = new TaskCompletionSource(TaskCreationOptions.RunContinuationsAsynchronously);
        using var process = new Process { StartInfo = start };
        void Take(string? line)
        {
            if (line is null)
            {
                return;
            }
            lock (output)
            {
                output.AppendLine(line);
            }
            if (line.Contains("Now listening", StringComparison.Ordinal))
            {
                listening.TrySetResult();
            }
        }
        process.OutputDataReceived += (_, e) => Take(e.Data);
        process.ErrorDataReceived += (_, e) => Take(e.Data);
        process.EnableRaisingEvents = true;
        process.Exited += (_, _) => listening.TrySetException(new InvalidOperationException("the host exited before listening"));
        Assert.True(process.Start(), "dotnet run did not start");
        try
        {
            process.BeginOutputReadLine();
            process.BeginErrorReadLine();
            try
            {
                await listening.Task.WaitAsync(ListenTimeout);
            }
            catch (Exception e) when (e is TimeoutException or InvalidOperationException)
            {
                Assert.Fail($"no \"Now listening\" within {ListenTimeout.TotalSeconds} s ({e.Message}); output:\n{Snapshot(output)}");
            }

            // The credentials table is printed during first start; give it until the lots answer.
            (string badge, string pin) = await OperatorCredentialsAsync(output, TimeSpan.FromSeconds(60));
            Assert.Equal("1001", badge);

            using var client = new HttpClient(new HttpClientHandler { AllowAutoRedirect = false, CookieContainer = new CookieContainer() })
            {
                BaseAddress = new Uri(url),
                Timeout = TimeSpan.FromSeconds(60),
            };
            string form = await client.GetStringAsync("/signin");
            Match token = TokenField().Match(form);
            Assert.True(token.Success, "the sign-in form carries no antiforgery token");
            HttpResponseMessage signedIn = await client.PostAsync("/account/sign-in", new FormUrlEncodedContent(new Dictionary<string, string>
            {
                ["badge"] = badge,
                ["pin"] = pin,
                ["returnUrl"] = "/",
                ["__RequestVerificationToken"] = WebUtility.HtmlDecode(token.Groups[1].Value),
            }));
            Assert.Equal(HttpStatusCode.Redirect, signedIn.StatusCode);
            Assert.DoesNotContain("/signin", signedIn.Headers.Location?.OriginalString ?? "", StringComparison.Ordinal);

            HttpResponseMessage lots = await client.GetAsync("/lots");
            Assert.Equal(HttpStatusCode.OK, lots.StatusCode);
            Assert.Contains("VP-2611-0042", await lots.Content.ReadAsStringAsync(), StringComparison.Ordinal);
        }
        finally
        {
            if (!process.HasExited)
            {
                process.Kill(entireProcessTree: true);
                await process.WaitForExitAsync().WaitAsync(TimeSpan.FromSeconds(30));
            }
        }
    }

    private static async Task<(string Badge, string Pin)> OperatorCredentialsAsync(StringBuilder output, TimeSpan timeout)
    {
        var watch = Stopwatch.StartNew();
        while (true)
        {
            // A row of the first-start table: user name, display name, role, badge, PIN, one-time password.
            Match row = OperatorRow().Match(Snapshot(output));
            if (row.Success)
            {
                return (row.Groups["badge"].Value, row.Groups["pin"].Value);
            }
            if (watch.Elapsed > timeout)
            {
                Assert.Fail($"no demo credentials row for rhaldane within {timeout.TotalSeconds} s; output:\n{Snapshot(output)}");
            }
            await Task.Delay(200);
        }
    }

    private static string Snapshot(StringBuilder output)
    {
        lock (output)
        {
            return output.ToString();
        }
    }

    private static string FindSolutionRoot()
    {
        for (DirectoryInfo? dir = new(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "FilterQA.sln")))
            {
                return dir.FullName;
            }
        }
        throw new InvalidOperationException($"no FilterQA.sln above {AppContext.BaseDirectory}");
    }

    private static int FreePort()
    {
        using var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        return ((IPEndPoint)listener.LocalEndpoint).Port;
    }

    [GeneratedRegex(@"^\s+rhaldane\s+.+?\s(?<badge>\d{4})\s+(?<pin>\d{6})\s+\S+\s*$", RegexOptions.Multiline)]
    private static partial Regex OperatorRow();

    [GeneratedRegex("name=\"__RequestVerificationToken\" value=\"([^\"]+)\"")]
    private static partial Regex TokenField();
}
