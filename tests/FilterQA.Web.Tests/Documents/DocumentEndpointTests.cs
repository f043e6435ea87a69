using System.Net;
using System.Text;
using FilterQA.Core.Formats.Touchstone;
using FilterQA.Core.Synthesis;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Web.Tests.Infrastructure;
using Microsoft.Extensions.DependencyInjection;

namespace FilterQA.Web.Tests.Documents;

/// <summary>The PDF report endpoints against the whole host: a signed-in person gets a PDF, bad input a ProblemDetails naming what was wrong.</summary>
public sealed class DocumentEndpointTests : IDisposable
{
    private readonly TempFolder _data = new();
    private readonly WebFactory _factory;

    public DocumentEndpointTests() => _factory = new WebFactory(_data.Path);

    public void Dispose()
    {
        _factory.Dispose();
        _data.Dispose();
    }

    private async Task<(HttpClient Client, string Lot, long MeasurementId)> PrepareAsync()
    {
        string lot = await Bench.PrepareLotAsync(_factory);
        long measurementId;
        await using (AsyncServiceScope scope = _factory.Services.CreateAsyncScope())
        {
            Core.Sweeps.Sweep sweep = new UnitSynthesiser(7).Unit(DemoParts.Get(Bench.Part), 1);
            byte[] bytes = Encoding.ASCII.GetBytes(TouchstoneWriter.WriteToString(sweep));
            IntakeResult stored = await scope.ServiceProvider.GetRequiredService<SweepIntake>()
                .SubmitAsync(new SweepSubmission(lot, "S0001", Bench.Station, Bench.Engineer, bytes, lot + "__S0001.s2p"));
            measurementId = stored.Stored.MeasurementId;
        }
        await Bench.CreatePersonAsync(_factory, "inspector", RoleNames.Operator);
        return (await Bench.SignedInAsync(_factory, "inspector"), lot, measurementId);
    }

    private static async Task AssertPdfAsync(HttpResponseMessage answer, string fileNamePart)
    {
        Assert.Equal(HttpStatusCode.OK, answer.StatusCode);
        Assert.Equal("application/pdf", answer.Content.Headers.ContentType?.MediaType);
        Assert.Contains(fileNamePart, answer.Content.Headers.ContentDisposition?.FileName ?? "", StringComparison.Ordinal);
        byte[] body = await answer.Content.ReadAsByteArrayAsync();
        // ISO 32000-1 §7.5.2: a PDF file begins with the header "%PDF-".
        Assert.Equal("%PDF-", Encoding.ASCII.GetString(body, 0, 5));
    }

    private static async Task AssertProblemAsync(HttpResponseMessage answer, HttpStatusCode status, string phrase)
    {
        Assert.Equal(status, answer.StatusCode);
        Assert.Equal("application/problem+json", answer.Content.Headers.ContentType?.MediaType);
        Assert.Contains(phrase, await answer.Content.ReadAsStringAsync(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_signed_in_person_gets_the_reports_as_pdf()
    {
        (HttpClient client, string lot, long id) = await PrepareAsync();
        await AssertPdfAsync(await client.GetAsync($"/lots/{lot}/yield-report.pdf"), "yield-report-" + lot);
        await AssertPdfAsync(await client.GetAsync($"/lots/{lot}/yield-report.pdf?paper=letter"), "yield-report-" + lot);
        await AssertPdfAsync(await client.GetAsync($"/measurements/{id}/report.pdf"), FormattableString.Invariant($"unit-report-{id}"));
        string today = DateTime.UtcNow.ToString("yyyy-MM-dd", System.Globalization.CultureInfo.InvariantCulture);
        await AssertPdfAsync(await client.GetAsync($"/parts/{Bench.Part}/yield-report.pdf?from=2020-01-01&to={today}&paper=a4"), "yield-report-" + Bench.Part);
    }

    [Fact]
    public async Task Bad_requests_answer_problem_details_that_say_why()
    {
        (HttpClient client, string lot, _) = await PrepareAsync();
        await AssertProblemAsync(await client.GetAsync($"/lots/{lot}/rejection-report.pdf"), HttpStatusCode.Conflict, "not rejected");
        await AssertProblemAsync(await client.GetAsync("/lots/VP-0000-NONE/yield-report.pdf"), HttpStatusCode.NotFound, "VP-0000-NONE");
        await AssertProblemAsync(await client.GetAsync($"/lots/{lot}/yield-report.pdf?paper=a3"), HttpStatusCode.BadRequest, "a3");
        await AssertProblemAsync(await client.GetAsync("/measurements/987654/report.pdf"), HttpStatusCode.NotFound, "987654");
        await AssertProblemAsync(await client.GetAsync($"/parts/{Bench.Part}/yield-report.pdf?from=2026-13-01&to=2026-12-31"), HttpStatusCode.BadRequest, "2026-13-01");
        await AssertProblemAsync(await client.GetAsync($"/parts/{Bench.Part}/yield-report.pdf?to=2026-12-31"), HttpStatusCode.BadRequest, "from");
        await AssertProblemAsync(await client.GetAsync($"/parts/{Bench.Part}/yield-report.pdf?from=2026-12-31&to=2026-01-01"), HttpStatusCode.Conflict, "before it starts");
        await AssertProblemAsync(await client.GetAsync("/parts/TME-NO-SUCH/yield-report.pdf?from=2026-01-01&to=2026-12-31"), HttpStatusCode.NotFound, "TME-NO-SUCH");
    }

    [Fact]
    public async Task Reports_need_a_signed_in_person()
    {
        (_, string lot, _) = await PrepareAsync();
        HttpResponseMessage answer = await Bench.Client(_factory).GetAsync($"/lots/{lot}/yield-report.pdf");
        Assert.NotEqual(HttpStatusCode.OK, answer.StatusCode);
        Assert.NotEqual("application/pdf", answer.Content.Headers.ContentType?.MediaType);
    }
}
