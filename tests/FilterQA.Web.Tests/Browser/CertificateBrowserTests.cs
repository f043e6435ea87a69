using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;
using FilterQA.Core.Decisions;
using FilterQA.Core.Templates.Text;
using FilterQA.Data;
using FilterQA.Data.Accounts;
using FilterQA.Data.Entities;
using FilterQA.Data.Services;
using FilterQA.Web.Hosting;
using FilterQA.Web.Tests.Infrastructure;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Playwright;

namespace FilterQA.Web.Tests.Browser;

/// <summary>
/// The certificate of conformance as its users meet it in a real browser: an operator on an accepted lot's page is
/// not offered the signing; an approver cannot sign without a reason, signs with one and sees the number and digest;
/// the downloaded PDF prints what the database holds; the printed verification address, opened by someone not signed
/// in, says the certificate is genuine, and the same address with one digest digit changed finds nothing and tells
/// nothing about the lot.
/// </summary>
public sealed partial class CertificateBrowserTests
{
    private const float WaitMs = 30_000;
    private const string LotNumber = "VP-2611-0921";
    private const string NumberPrefix = "TME-COC";
    private const string Reason = "sample of three met the plan, data reviewed";

    [BrowserFact]
    public async Task An_approver_signs_with_a_reason_the_pdf_prints_the_stored_certificate_and_the_printed_address_verifies_it()
    {
        Assert.Null(BrowserHost.MissingBrowser());
        // The verification address printed on the certificate must reach this host, so the port is chosen first.
        int port = BrowserHost.FreePort();
        string publicBaseUrl = $"http://127.0.0.1:{port.ToString(CultureInfo.InvariantCulture)}";
        await using BrowserHost host = await BrowserHost.StartAsync(new Dictionary<string, string?>
        {
            ["Certificates:IssuerName"] = "Tarnwell Marine Electronics",
            ["Certificates:NumberPrefix"] = NumberPrefix,
            ["Certificates:PublicBaseUrl"] = publicBaseUrl,
        }, port);
        await SeedAcceptedLotAsync(host.Factory);
        await Bench.CreatePersonAsync(host.Factory, "spetrova", RoleNames.Approver, badge: "1004", pin: "552190");
        await Bench.CreatePersonAsync(host.Factory, "rhaldane", RoleNames.Operator, badge: "1001", pin: "640215");

        // An operator on the accepted, not yet certified lot: no signing form, and the panel says who signs.
        IBrowserContext operatorContext = await host.NewContextAsync();
        IPage operatorPage = await operatorContext.NewPageAsync();
        await BenchBrowserTests.SignInAsync(operatorPage, "1001", "640215");
        await operatorPage.GotoAsync($"/lots/{LotNumber}");
        ILocator operatorPanel = operatorPage.Locator("section.documents[data-interactive=yes]");
        await operatorPanel.WaitForAsync(new() { Timeout = WaitMs });
        Assert.Equal("Accepted", await operatorPage.Locator(".lot-status").GetAttributeAsync("data-status"));
        await Assertions.Expect(operatorPanel.GetByRole(AriaRole.Button, new() { NameRegex = new("^Sign") })).ToHaveCountAsync(0);
        await Assertions.Expect(operatorPanel.Locator("#cert-reason")).ToHaveCountAsync(0);
        await Assertions.Expect(operatorPanel).ToContainTextAsync("an approver signs it");

        // The approver: an empty reason (and one of spaces only) is refused on the spot, nothing is asked to be confirmed.
        IPage page = await host.Browser.NewPageAsync();
        await BenchBrowserTests.SignInAsync(page, "1004", "552190");
        await page.GotoAsync($"/lots/{LotNumber}");
        ILocator panel = page.Locator("section.documents[data-interactive=yes]");
        await panel.WaitForAsync(new() { Timeout = WaitMs });
        ILocator askToSign = panel.GetByRole(AriaRole.Button, new() { Name = "Sign the certificate…" });
        foreach (string blank in new[] { "", "   " })
        {
            await panel.Locator("#cert-reason").FillAsync(blank);
            await askToSign.ClickAsync();
            await Assertions.Expect(panel.Locator("[role=alert]")).ToHaveTextAsync("Give the reason for signing the certificate.", new() { Timeout = WaitMs });
            await Assertions.Expect(panel.Locator("[role=alertdialog]")).ToHaveCountAsync(0);
            await Assertions.Expect(panel.Locator("[data-certificate]")).ToHaveCountAsync(0);
        }
        Assert.Null(await StoredCertificateAsync(host.Factory));

        // With a reason: the confirm step names the lot, the signer and the reason; Sign issues the certificate.
        await panel.Locator("#cert-reason").FillAsync(Reason);
        await askToSign.ClickAsync();
        ILocator confirm = panel.Locator("[role=alertdialog]");
        await Assertions.Expect(confirm).ToContainTextAsync($"lot {LotNumber} as Test spetrova, with the reason “{Reason}”", new() { Timeout = WaitMs });
        await confirm.GetByRole(AriaRole.Button, new() { Name = "Sign", Exact = true }).ClickAsync();
        ILocator shown = panel.Locator("p[data-certificate]");
        await shown.WaitForAsync(new() { Timeout = WaitMs });

        CertificateRecord stored = await StoredCertificateAsync(host.Factory) ?? throw new Xunit.Sdk.XunitException("no certificate row after signing");
        // Number form <prefix>-<year of signing>-<six-digit running number> (README, Certificates); the first certificate is 1.
        Assert.Equal($"{NumberPrefix}-{stored.IssuedAt.UtcDateTime.Year.ToString("0000", CultureInfo.InvariantCulture)}-000001", stored.CertificateNumber);
        Assert.Equal("Test spetrova", stored.SignerName);
        Assert.Equal(Reason, stored.Reason);
        Assert.Matches(Sha256Hex(), stored.DataDigestSha256);
        Assert.Equal(stored.CertificateNumber, await shown.GetAttributeAsync("data-certificate"));
        Assert.Equal(stored.CertificateNumber, (await shown.Locator("strong").InnerTextAsync()).Trim());
        Assert.Contains("signed by Test spetrova", await shown.InnerTextAsync(), StringComparison.Ordinal);
        Assert.Equal(stored.DataDigestSha256, (await panel.Locator("code[data-digest]").InnerTextAsync()).Trim());
        await Assertions.Expect(panel.Locator("p.done")).ToHaveTextAsync($"Certificate {stored.CertificateNumber} is signed.");
        await Assertions.Expect(panel.GetByRole(AriaRole.Button, new() { NameRegex = new("^Sign") })).ToHaveCountAsync(0);
        // A certified lot's record is final: the disposition section says so instead of offering hold, decide or override.
        await Assertions.Expect(page.Locator("#disp-final")).ToContainTextAsync(stored.CertificateNumber, new() { Timeout = WaitMs });
        await Assertions.Expect(page.Locator("section.disposition button")).ToHaveCountAsync(0);
        await page.ScreenshotAsync(new() { Path = Path.Combine(BrowserHost.ScreenshotsFolder, "lot-certificate.png"), FullPage = true });

        // The download link gives the PDF; PdfPig (independent of the writer) reads it back.
        IDownload download = await page.RunAndWaitForDownloadAsync(
            () => panel.GetByRole(AriaRole.Link, new() { NameRegex = new("^Download the certificate") }).ClickAsync(), new() { Timeout = WaitMs });
        Assert.Equal($"certificate-{LotNumber}.pdf", download.SuggestedFilename);
        byte[] pdf = await File.ReadAllBytesAsync(await download.PathAsync());
        // ISO 32000-1 §7.5.2: a PDF file begins with the header "%PDF-".
        Assert.Equal("%PDF-", Encoding.ASCII.GetString(pdf, 0, 5));
        Assert.Equal(1, PdfReading.Pages(pdf));
        string words = PdfReading.Words(pdf);
        Assert.Contains("Number " + stored.CertificateNumber, words, StringComparison.Ordinal);
        // The digest is printed in full in groups of 8 hex digits separated by spaces (README: "grouped digests");
        // the grouping is done here, not by the code under test.
        string grouped = string.Join(' ', Enumerable.Range(0, 8).Select(i => stored.DataDigestSha256.Substring(i * 8, 8)));
        Assert.Contains(grouped, words, StringComparison.Ordinal);
        // The QR code's address is printed beside it; a long address wraps, so it is looked for with spaces removed.
        // Its form is the README's public page /verify?number=…&digest=… under the configured public address.
        string expectedUrl = $"{publicBaseUrl}/verify?number={Uri.EscapeDataString(stored.CertificateNumber)}&digest={stored.DataDigestSha256}";
        Match printed = PrintedAddress().Match(words.Replace(" ", string.Empty, StringComparison.Ordinal));
        Assert.True(printed.Success, "no verification address is printed on the certificate");
        Assert.Equal(expectedUrl, printed.Groups["url"].Value);

        // Someone not signed in opens the printed address: genuine, with the lot, part and signer.
        IBrowserContext outsider = await host.NewContextAsync();
        IPage verify = await outsider.NewPageAsync();
        await verify.GotoAsync(printed.Groups["url"].Value);
        Assert.StartsWith(publicBaseUrl + "/verify", verify.Url, StringComparison.Ordinal);
        ILocator valid = verify.Locator("[data-outcome=valid]");
        await valid.WaitForAsync(new() { Timeout = WaitMs });
        await Assertions.Expect(verify.Locator("#signed-in-as")).ToHaveCountAsync(0);
        await Assertions.Expect(valid.Locator("h2")).ToHaveTextAsync($"Certificate {stored.CertificateNumber} is genuine");
        string facts = await valid.InnerTextAsync();
        Assert.Contains(LotNumber, facts, StringComparison.Ordinal);
        Assert.Contains(Bench.Part, facts, StringComparison.Ordinal);
        Assert.Contains("Test spetrova", facts, StringComparison.Ordinal);
        await Assertions.Expect(valid.Locator("[data-lot-unchanged]")).ToBeVisibleAsync();
        await verify.ScreenshotAsync(new() { Path = Path.Combine(BrowserHost.ScreenshotsFolder, "verify-valid.png"), FullPage = true });

        // The same address with one hex digit of the digest changed: no match, and neither the lot nor the real digest shown.
        string digest = stored.DataDigestSha256;
        int at = 17;
        string forgedDigest = digest[..at] + (digest[at] == '0' ? '1' : '0') + digest[(at + 1)..];
        Assert.NotEqual(digest, forgedDigest);
        await verify.GotoAsync(printed.Groups["url"].Value.Replace(digest, forgedDigest, StringComparison.Ordinal));
        ILocator noMatch = verify.Locator("[data-outcome=no-match]");
        await noMatch.WaitForAsync(new() { Timeout = WaitMs });
        Assert.Contains("No certificate with this number and digest", await noMatch.InnerTextAsync(), StringComparison.Ordinal);
        await Assertions.Expect(verify.Locator("[data-outcome=valid]")).ToHaveCountAsync(0);
        string html = await verify.ContentAsync();
        Assert.DoesNotContain(LotNumber, html, StringComparison.Ordinal);
        Assert.DoesNotContain(digest, html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("Test spetrova", html, StringComparison.Ordinal);
        Assert.Equal(forgedDigest, await verify.Locator("#digest").InputValueAsync());
        await verify.ScreenshotAsync(new() { Path = Path.Combine(BrowserHost.ScreenshotsFolder, "verify-forged.png"), FullPage = true });

        // The operator again, now the certificate exists: its number and digest, still no signing.
        await operatorPage.ReloadAsync();
        await operatorPanel.WaitForAsync(new() { Timeout = WaitMs });
        await Assertions.Expect(operatorPanel.Locator("p[data-certificate]")).ToHaveAttributeAsync("data-certificate", stored.CertificateNumber, new() { Timeout = WaitMs });
        Assert.Equal(stored.DataDigestSha256, (await operatorPanel.Locator("code[data-digest]").InnerTextAsync()).Trim());
        await Assertions.Expect(operatorPanel.GetByRole(AriaRole.Button, new() { NameRegex = new("^Sign") })).ToHaveCountAsync(0);
    }

    /// <summary>
    /// A lot of three under 100 % inspection, acceptance number 0, three GO units: the sample is complete with no
    /// defective, so the plan accepts it (accept when defectives ≤ Ac; ISO 2859-1 / MIL-STD-105E single sampling rule).
    /// </summary>
    private static async Task SeedAcceptedLotAsync(WebFactory factory)
    {
        await using AsyncServiceScope scope = factory.Services.CreateAsyncScope();
        IServiceProvider services = scope.ServiceProvider;
        string root = RepositoryPaths.FindRoot(AppContext.BaseDirectory) ?? throw new InvalidOperationException("repository root not found");
        TemplateReadResult read = LimitTemplateReader.ReadFile(Path.Combine(root, "limit-templates", Bench.Part + ".yaml"));
        await services.GetRequiredService<TemplateCatalog>().RegisterAsync(read.Template!, Bench.Engineer);
        await services.GetRequiredService<StationRegistry>().RegisterStationAsync(Bench.Station, "bench 1", Bench.Engineer);
        LotService lots = services.GetRequiredService<LotService>();
        await lots.CreateLotAsync(new NewLot(LotNumber, Bench.Part, null, "Veltrane Piezo", 3, PlanRequest.FullInspection()), Bench.Engineer);
        SweepIntake intake = services.GetRequiredService<SweepIntake>();
        var operatorActor = new Actor("u-rhaldane", "R. Haldane");
        for (int i = 1; i <= 3; i++)
        {
            string serial = $"S{i:D4}";
            byte[] bytes = Encoding.UTF8.GetBytes(Bench.UnitTouchstone(serialIndex: i));
            IntakeResult result = await intake.SubmitAsync(new SweepSubmission(LotNumber, serial, Bench.Station, operatorActor, bytes, serial + ".s2p"));
            Assert.Equal(UnitVerdict.Go, result.Evaluation.Verdict);
        }
        LotSummary decided = await lots.DecideAsync(LotNumber, new Actor("u-spetrova", "Test spetrova", isApprover: true));
        Assert.Equal(LotStatus.Accepted, decided.Status);
    }

    /// <summary>The lot's row in the certificates table, read straight from the database.</summary>
    private static async Task<CertificateRecord?> StoredCertificateAsync(WebFactory factory)
    {
        IDbContextFactory<FilterQaDbContext> contexts = factory.Services.GetRequiredService<IDbContextFactory<FilterQaDbContext>>();
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync();
        return await context.Certificates.AsNoTracking()
            .Join(context.Lots.Where(l => l.LotNumber == LotNumber), c => c.LotId, l => l.Id, (c, _) => c)
            .SingleOrDefaultAsync();
    }

    // SHA-256 as lower-case hex: 64 digits (FIPS 180-4, 256-bit output).
    [GeneratedRegex("^[0-9a-f]{64}$")]
    private static partial Regex Sha256Hex();

    // "Verify at <address>" ends with the 64 lower-case hex digits of the digest; what follows starts with a capital.
    [GeneratedRegex(@"Verifyat(?<url>https?://[^\s]+?/verify\?number=[^&\s]+&digest=[0-9a-f]{64})")]
    private static partial Regex PrintedAddress();
}
