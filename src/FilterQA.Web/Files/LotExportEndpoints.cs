using FilterQA.Data;
using FilterQA.Data.Services;
using FilterQA.Data.Services.Exports;
using FilterQA.Reports.Exports;
using FilterQA.Web.Accounts;
using FilterQA.Web.Api;
using Microsoft.AspNetCore.Http.HttpResults;

namespace FilterQA.Web.Files;

/// <summary>
/// A lot's exports for a signed-in person: GET /lots/{lotNumber}/export/results.csv, results.xlsx and
/// sweeps.zip?format=touchstone|csv. An unknown lot or format answers ProblemDetails naming it.
/// </summary>
public static class LotExportEndpoints
{
    public static IEndpointRouteBuilder MapLotExportEndpoints(this IEndpointRouteBuilder endpoints)
    {
        ArgumentNullException.ThrowIfNull(endpoints);
        RouteGroupBuilder exports = endpoints.MapGroup("/lots/{lotNumber}/export").RequireAuthorization(Policies.Person).ExcludeFromDescription();
        exports.MapGet("/results.csv", ResultsCsvAsync);
        exports.MapGet("/results.xlsx", ResultsXlsxAsync);
        exports.MapGet("/sweeps.zip", SweepsZipAsync);
        return endpoints;
    }

    private static async Task<Results<PushStreamHttpResult, ProblemHttpResult>> ResultsCsvAsync(string lotNumber, LotService lots, LotExportReader reader,
        CancellationToken cancellationToken)
    {
        if (await MissingLotAsync(lots, lotNumber, cancellationToken).ConfigureAwait(false) is { } missing)
        {
            return missing;
        }
        return TypedResults.Stream(body => LotResultsCsv.WriteAsync(reader, lotNumber, body, cancellationToken), LotResultsCsv.ContentType,
            FileName(lotNumber, "results.csv"));
    }

    private static async Task<Results<FileStreamHttpResult, ProblemHttpResult>> ResultsXlsxAsync(string lotNumber, LotService lots, LotExportReader reader,
        CancellationToken cancellationToken)
    {
        if (await MissingLotAsync(lots, lotNumber, cancellationToken).ConfigureAwait(false) is { } missing)
        {
            return missing;
        }
        // An xlsx package is a zip whose directory is written last, so it is built in a temporary file (removed on close), not in memory.
        var file = new FileStream(Path.Combine(Path.GetTempPath(), "filterqa-export-" + Guid.NewGuid().ToString("N") + ".xlsx"), FileMode.CreateNew,
            FileAccess.ReadWrite, FileShare.None, 64 * 1024, FileOptions.DeleteOnClose | FileOptions.Asynchronous);
        try
        {
            await LotResultsWorkbook.WriteAsync(lots, reader, lotNumber, file, cancellationToken).ConfigureAwait(false);
            file.Position = 0;
            return TypedResults.File(file, LotResultsWorkbook.ContentType, FileName(lotNumber, "results.xlsx"));
        }
        catch
        {
            await file.DisposeAsync().ConfigureAwait(false);
            throw;
        }
    }

    private static async Task<Results<PushStreamHttpResult, ProblemHttpResult>> SweepsZipAsync(string lotNumber, string? format, LotService lots,
        LotExportReader reader, CancellationToken cancellationToken)
    {
        if (LotSweepsArchive.ParseFormat(format ?? "touchstone") is not { } parsed)
        {
            return Problems.Make(StatusCodes.Status400BadRequest, "Unknown format",
                $"format '{format}' is not known; use format=touchstone (each file as stored) or format=csv (each sweep as delimited text)");
        }
        if (await MissingLotAsync(lots, lotNumber, cancellationToken).ConfigureAwait(false) is { } missing)
        {
            return missing;
        }
        string suffix = parsed == SweepExportFormat.Csv ? "sweeps-csv.zip" : "sweeps.zip";
        return TypedResults.Stream(body => LotSweepsArchive.WriteAsync(reader, lotNumber, parsed, body, cancellationToken), LotSweepsArchive.ContentType,
            FileName(lotNumber, suffix));
    }

    private static async Task<ProblemHttpResult?> MissingLotAsync(LotService lots, string lotNumber, CancellationToken cancellationToken)
    {
        try
        {
            await lots.GetSummaryAsync(lotNumber, cancellationToken).ConfigureAwait(false);
            return null;
        }
        catch (RecordNotFoundException e)
        {
            return Problems.Make(StatusCodes.Status404NotFound, "No such lot", e.Message);
        }
    }

    private static string FileName(string lotNumber, string what)
    {
        char[] invalid = Path.GetInvalidFileNameChars();
        string safe = new(lotNumber.Select(c => invalid.Contains(c) || char.IsControl(c) ? '_' : c).ToArray());
        return $"{safe}_{what}";
    }
}
