using System.Net;
using System.Text.Json;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Data.Services.Certificates;
using FilterQA.Web.Tests.Infrastructure;
using Microsoft.Extensions.DependencyInjection;

namespace FilterQA.Web.Tests.Files;

/// <summary>The public verification page and the lot export endpoints: who reaches them and what each mistake is answered.</summary>
public sealed class CertificateAndExportEndpointTests : IDisposable
{
    private static readonly Actor Approver = new("u-test-approver", "S. Petrova", isApprover: true);

    private readonly TempFolder _data = new();
    private readonly WebFactory _factory;

    public CertificateAndExportEndpointTests() => _factory = new WebFactory(_data.Path, new Dictionary<string, string?> { ["Verify:PermitsPerMinute"] = "8" });

    public void Dispose()
    {
        _factory.Dispose();
        _data.Dispose();
    }

    [Fact]
    public async Task Verify_answers_anyone_and_shows_the_certificate_only_for_its_number_and_digest()
    {
        (string lot, IssuedCertificate certificate) = await AcceptedLotWithCertificateAsync();
        HttpClient anonymous = Bench.Client(_factory);
        string forged = certificate.DataDigestSha256[..^1] + (certificate.DataDigestSha256[^1] == 'a' ? 'b' : 'a');

        HttpResponseMessage real = await anonymous.GetAsync($"/verify?number={certificate.CertificateNumber}&digest={certificate.DataDigestSha256}");
        string realPage = await real.Content.ReadAsStringAsync();
        string wrongPage = await anonymous.GetStringAsync($"/verify?number={certificate.CertificateNumber}&digest={forged}");
        string unknownPage = await anonymous.GetStringAsync($"/verify?number=TME-COC-1999-000001&digest={certificate.DataDigestSha256}");
        string formPage = await anonymous.GetStringAsync("/verify");

        Assert.Equal(HttpStatusCode.OK, real.StatusCode);
        Assert.Contains("data-outcome=\"valid\"", realPage, StringComparison.Ordinal);
        Assert.Contains(lot, realPage, StringComparison.Ordinal);
        Assert.Contains(Approver.Name, realPage, StringComparison.Ordinal);
        foreach (string page in new[] { wrongPage, unknownPage })
        {
            Assert.Contains("No certificate with this number and digest", page, StringComparison.Ordinal);
            Assert.DoesNotContain(lot, page, StringComparison.Ordinal);
            Assert.DoesNotContain(Approver.Name, page, StringComparison.Ordinal);
        }
        // The real digest is never shown for a wrong one.
        Assert.DoesNotContain(certificate.DataDigestSha256, wrongPage, StringComparison.Ordinal);
        Assert.Contains("name=\"digest\"", formPage, StringComparison.Ordinal);
        Assert.DoesNotContain("data-outcome", formPage, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Verify_is_rate_limited_per_client()
    {
        HttpClient anonymous = Bench.Client(_factory);
        var statuses = new List<HttpStatusCode>();
        for (int i = 0; i < 10; i++)
        {
            statuses.Add((await anonymous.GetAsync($"/verify?number=TME-COC-2026-{i:000000}&digest=00")).StatusCode);
        }
        // Verify:PermitsPerMinute = 8 in this host: eight answers, then 429.
        Assert.Equal(Enumerable.Repeat(HttpStatusCode.OK, 8), statuses.Take(8));
        Assert.Equal(HttpStatusCode.TooManyRequests, statuses[8]);
    }

    [Fact]
    public async Task Exports_need_a_signed_in_person_and_name_an_unknown_lot_or_format()
    {
        (string lot, _) = await AcceptedLotWithCertificateAsync();
        HttpResponseMessage anonymous = await Bench.Client(_factory).GetAsync($"/lots/{lot}/export/results.csv");
        Assert.Equal(HttpStatusCode.Redirect, anonymous.StatusCode);
        Assert.Equal("/signin", anonymous.Headers.Location?.AbsolutePath);

        await Bench.CreatePersonAsync(_factory, "mokafor", RoleNames.Operator);
        HttpClient client = await Bench.SignedInAsync(_factory, "mokafor");
        HttpResponseMessage csv = await client.GetAsync($"/lots/{lot}/export/results.csv");
        Assert.Equal(HttpStatusCode.OK, csv.StatusCode);
        Assert.Equal("text/csv", csv.Content.Headers.ContentType?.MediaType);
        Assert.StartsWith("Serial,Attempt,Counted,Verdict", await csv.Content.ReadAsStringAsync(), StringComparison.Ordinal);
        HttpResponseMessage xlsx = await client.GetAsync($"/lots/{lot}/export/results.xlsx");
        Assert.Equal(HttpStatusCode.OK, xlsx.StatusCode);
        byte[] workbook = await xlsx.Content.ReadAsByteArrayAsync();
        Assert.Equal("PK"u8.ToArray(), workbook[..2]);
        HttpResponseMessage zip = await client.GetAsync($"/lots/{lot}/export/sweeps.zip?format=csv");
        Assert.Equal(HttpStatusCode.OK, zip.StatusCode);
        Assert.Equal("application/zip", zip.Content.Headers.ContentType?.MediaType);

        HttpResponseMessage unknownLot = await client.GetAsync("/lots/VP-2611-NOSUCH/export/results.xlsx");
        Assert.Equal(HttpStatusCode.NotFound, unknownLot.StatusCode);
        Assert.Contains("VP-2611-NOSUCH does not exist", Detail(await unknownLot.Content.ReadAsStringAsync()), StringComparison.Ordinal);
        HttpResponseMessage badFormat = await client.GetAsync($"/lots/{lot}/export/sweeps.zip?format=pdf");
        Assert.Equal(HttpStatusCode.BadRequest, badFormat.StatusCode);
        Assert.Contains("format 'pdf' is not known", Detail(await badFormat.Content.ReadAsStringAsync()), StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_certificate_pdf_is_the_signed_certificate_and_a_lot_without_one_is_answered_with_the_reason()
    {
        await Bench.CreatePersonAsync(_factory, "mokafor", RoleNames.Operator);
        HttpClient client = await Bench.SignedInAsync(_factory, "mokafor");
        string unsigned = await Bench.PrepareLotAsync(_factory);
        HttpResponseMessage none = await client.GetAsync($"/lots/{unsigned}/certificate.pdf");
        Assert.Equal(HttpStatusCode.NotFound, none.StatusCode);
        Assert.Contains($"lot {unsigned} has no certificate of conformance", Detail(await none.Content.ReadAsStringAsync()), StringComparison.Ordinal);

        (string lot, IssuedCertificate certificate) = await AcceptedLotWithCertificateAsync();
        foreach (string paper in new[] { "a4", "letter" })
        {
            HttpResponseMessage pdf = await client.GetAsync($"/lots/{lot}/certificate.pdf?paper={paper}");
            Assert.Equal(HttpStatusCode.OK, pdf.StatusCode);
            Assert.Equal("application/pdf", pdf.Content.Headers.ContentType?.MediaType);
            byte[] body = await pdf.Content.ReadAsByteArrayAsync();
            // ISO 32000-1 section 7.5.2: a PDF file begins with "%PDF-"; the number is printed as text, so it is in the file's words.
            Assert.Equal("%PDF-"u8.ToArray(), body[..5]);
            Assert.Contains(certificate.CertificateNumber, PdfReading.Words(body), StringComparison.Ordinal);
        }
        HttpResponseMessage badPaper = await client.GetAsync($"/lots/{lot}/certificate.pdf?paper=a5");
        Assert.Equal(HttpStatusCode.BadRequest, badPaper.StatusCode);
        HttpResponseMessage anonymous = await Bench.Client(_factory).GetAsync($"/lots/{lot}/certificate.pdf");
        Assert.NotEqual(HttpStatusCode.OK, anonymous.StatusCode);
    }

    private static string Detail(string problem) => JsonDocument.Parse(problem).RootElement.GetProperty("detail").GetString()!;

    // A lot accepted by override (no unit needed for the pages under test) and its certificate.
    private async Task<(string Lot, IssuedCertificate Certificate)> AcceptedLotWithCertificateAsync()
    {
        string lot = await Bench.PrepareLotAsync(_factory);
        await using AsyncServiceScope scope = _factory.Services.CreateAsyncScope();
        await scope.ServiceProvider.GetRequiredService<LotService>().OverrideAsync(lot, true, "supplier's own data reviewed", Approver);
        IssuedCertificate certificate = await scope.ServiceProvider.GetRequiredService<CertificateService>().IssueAsync(lot, "for shipment", Approver);
        return (lot, certificate);
    }
}
