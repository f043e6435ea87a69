using System.Globalization;
using FilterQA.Data;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services.Certificates;
using FilterQA.Reports.Documents;
using FilterQA.Reports.Pdf;
using FilterQA.Reports.Sources;
using FilterQA.Web.Accounts;
using FilterQA.Web.Api;

namespace FilterQA.Web.Documents;

/// <summary>
/// The PDF documents for signed-in people: a lot's certificate of conformance (as signed), its rejection and yield
/// reports, a part's yield report over a period, a measurement's unit report. Each takes ?paper=a4|letter (default a4); bad input answers ProblemDetails saying why.
/// </summary>
public static class DocumentEndpoints
{
    public static IEndpointRouteBuilder MapDocumentEndpoints(this IEndpointRouteBuilder endpoints)
    {
        ArgumentNullException.ThrowIfNull(endpoints);
        endpoints.MapGet("/lots/{lotNumber}/certificate.pdf", CertificateAsync).RequireAuthorization(Policies.Person).ExcludeFromDescription();
        endpoints.MapGet("/lots/{lotNumber}/rejection-report.pdf", RejectionAsync).RequireAuthorization(Policies.Person).ExcludeFromDescription();
        endpoints.MapGet("/lots/{lotNumber}/yield-report.pdf", LotYieldAsync).RequireAuthorization(Policies.Person).ExcludeFromDescription();
        endpoints.MapGet("/parts/{partNumber}/yield-report.pdf", PartYieldAsync).RequireAuthorization(Policies.Person).ExcludeFromDescription();
        endpoints.MapGet("/measurements/{id:long}/report.pdf", UnitAsync).RequireAuthorization(Policies.Person).ExcludeFromDescription();
        return endpoints;
    }

    // The certificate is drawn from the snapshot frozen at signing, never from today's rows; it is handed out only while
    // the lot's stored data still has the digest it carries, so a printed certificate always verifies.
    private static Task<IResult> CertificateAsync(string lotNumber, string? paper, CertificateService certificates, CertificateDocument document,
        CancellationToken cancellationToken) =>
        AnswerAsync(paper, $"certificate-{lotNumber}.pdf", async (size, stream) =>
        {
            IssuedCertificate issued = await certificates.GetAsync(lotNumber, cancellationToken).ConfigureAwait(false)
                ?? throw new RecordNotFoundException($"lot {lotNumber} has no certificate of conformance: an approver signs one on the lot page once "
                    + "the lot is accepted (a rejected lot gets a rejection report instead)");
            string now = await certificates.ComputeDigestAsync(lotNumber, cancellationToken).ConfigureAwait(false);
            if (!string.Equals(now, issued.DataDigestSha256, StringComparison.Ordinal))
            {
                throw new ReportRefusedException($"certificate {issued.CertificateNumber} of lot {lotNumber} is not handed out: the lot's stored data "
                    + $"no longer has the digest it was signed with ({issued.DataDigestSha256}; now {now})");
            }
            document.Render(issued.Snapshot, size, stream);
        });

    private static Task<IResult> RejectionAsync(string lotNumber, string? paper, HttpContext http, ReportContentSource source, RejectionReportDocument document,
        CancellationToken cancellationToken) =>
        AnswerAsync(paper, $"rejection-report-{lotNumber}.pdf", async (size, stream) =>
            document.Render(await source.RejectionAsync(lotNumber, Who(http), cancellationToken).ConfigureAwait(false), size, stream));

    private static Task<IResult> LotYieldAsync(string lotNumber, string? paper, HttpContext http, ReportContentSource source, YieldReportDocument document,
        CancellationToken cancellationToken) =>
        AnswerAsync(paper, $"yield-report-{lotNumber}.pdf", async (size, stream) =>
            document.Render(await source.LotYieldAsync(lotNumber, Who(http), cancellationToken).ConfigureAwait(false), size, stream));

    private static Task<IResult> PartYieldAsync(string partNumber, string? from, string? to, string? paper, HttpContext http, ReportContentSource source,
        YieldReportDocument document, CancellationToken cancellationToken)
    {
        if (!TryDate(from, "from", out DateOnly start, out IResult? problem) || !TryDate(to, "to", out DateOnly end, out problem))
        {
            return Task.FromResult(problem!);
        }
        return AnswerAsync(paper, $"yield-report-{partNumber}-{start:yyyyMMdd}-{end:yyyyMMdd}.pdf", async (size, stream) =>
            document.Render(await source.PartYieldAsync(partNumber, start, end, Who(http), cancellationToken).ConfigureAwait(false), size, stream));
    }

    private static Task<IResult> UnitAsync(long id, string? paper, HttpContext http, ReportContentSource source, UnitReportDocument document,
        CancellationToken cancellationToken) =>
        AnswerAsync(paper, FormattableString.Invariant($"unit-report-{id}.pdf"), async (size, stream) =>
            document.Render(await source.UnitAsync(id, Who(http), cancellationToken).ConfigureAwait(false), size, stream));

    private static async Task<IResult> AnswerAsync(string? paper, string fileName, Func<PaperSize, Stream, Task> render)
    {
        if (!PaperSizes.TryParse(paper, out PaperSize size))
        {
            return Problems.Make(StatusCodes.Status400BadRequest, "Unknown paper size", $"paper '{paper}' is not known; use a4 or letter");
        }
        try
        {
            using var stream = new MemoryStream();
            await render(size, stream).ConfigureAwait(false);
            return TypedResults.File(stream.ToArray(), "application/pdf", SafeName(fileName));
        }
        catch (RecordNotFoundException e)
        {
            return Problems.Make(StatusCodes.Status404NotFound, "Not found", e.Message);
        }
        catch (ReportRefusedException e)
        {
            return Problems.Make(StatusCodes.Status409Conflict, "No such report", e.Message);
        }
        catch (ReportFontsMissingException e)
        {
            return Problems.Make(StatusCodes.Status500InternalServerError, "Document fonts missing", e.Message);
        }
    }

    private static bool TryDate(string? text, string name, out DateOnly date, out IResult? problem)
    {
        problem = null;
        if (string.IsNullOrWhiteSpace(text))
        {
            date = default;
            problem = Problems.Make(StatusCodes.Status400BadRequest, "Missing date", $"give ?{name}=yyyy-MM-dd (UTC day)");
            return false;
        }
        if (!DateOnly.TryParseExact(text.Trim(), "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out date))
        {
            problem = Problems.Make(StatusCodes.Status400BadRequest, "Bad date", $"{name} '{text}' is not a date written yyyy-MM-dd");
            return false;
        }
        return true;
    }

    private static string Who(HttpContext http) => ActorClaims.FromClaims(http.User).Name;

    // Lot and part numbers are the user's words; keep the download name to characters every file system takes.
    private static string SafeName(string name) =>
        new(name.Select(c => char.IsAsciiLetterOrDigit(c) || c is '-' or '_' or '.' ? c : '_').ToArray());
}
