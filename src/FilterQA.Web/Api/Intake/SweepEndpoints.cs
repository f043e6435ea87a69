using System.Text.Json;
using FilterQA.Core.Formats;
using FilterQA.Data;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Web.Accounts;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.AspNetCore.Http.Json;
using FromQueryAttribute = Microsoft.AspNetCore.Mvc.FromQueryAttribute;
using Microsoft.Extensions.Options;
using Microsoft.OpenApi;

namespace FilterQA.Web.Api.Intake;

/// <summary>POST /api/v1/lots/{lotNumber}/units/{serial}/sweeps: one sweep of one sample unit, through <see cref="SweepIntake"/>.</summary>
public static class SweepEndpoints
{
    public static RouteGroupBuilder MapSweepEndpoints(this RouteGroupBuilder api)
    {
        ArgumentNullException.ThrowIfNull(api);
        api.MapPost("/lots/{lotNumber}/units/{serial}/sweeps", PostSweepAsync)
            .RequireAuthorization(Policies.StationKey)
            .DisableAntiforgery()
            .WithName("PostSweep")
            .WithSummary("Store and judge one sweep of a sample unit")
            .WithDescription("The body is the sweep file (text/plain, text/csv or application/octet-stream with ?fileName=) or JSON (see the API description). The answer is the unit's verdict with every rule result and the lot's progress.")
            // The body is read by hand (any of four content types, size-limited), so it is described here rather
            // than by Accepts, whose content-type matching would answer other types before authorization.
            .AddOpenApiOperationTransformer(async (operation, context, cancellationToken) =>
            {
                var json = new OpenApiMediaType { Schema = await context.GetOrCreateSchemaAsync(typeof(SweepJsonBody), null, cancellationToken).ConfigureAwait(false) };
                var file = new OpenApiMediaType { Schema = new OpenApiSchema { Type = JsonSchemaType.String, Format = "binary" } };
                operation.RequestBody = new OpenApiRequestBody
                {
                    Required = true,
                    Description = "The sweep file (with ?fileName=) or a JSON sweep; see the API description.",
                    Content = new Dictionary<string, OpenApiMediaType>
                    {
                        ["application/json"] = json,
                        ["text/plain"] = file,
                        ["text/csv"] = file,
                        ["application/octet-stream"] = file,
                    },
                };
            })
            .ProducesProblem(StatusCodes.Status401Unauthorized)
            .ProducesProblem(StatusCodes.Status403Forbidden)
            .ProducesProblem(StatusCodes.Status404NotFound)
            .ProducesProblem(StatusCodes.Status409Conflict)
            .ProducesProblem(StatusCodes.Status413PayloadTooLarge)
            .ProducesProblem(StatusCodes.Status415UnsupportedMediaType)
            .ProducesProblem(StatusCodes.Status422UnprocessableEntity);
        return api;
    }

    internal static async Task<Results<StoredJsonResult<SweepAnswer>, ProblemHttpResult>> PostSweepAsync(
        string lotNumber, string serial, [FromQuery] string? fileName, HttpContext http, SweepIntake intake, IdempotentAnswers answers,
        IntakeOptions options, IOptions<JsonOptions> json, CancellationToken cancellationToken)
    {
        if (serial.Length > 64 || serial.Any(char.IsControl) || string.IsNullOrWhiteSpace(serial))
        {
            return Problems.Make(StatusCodes.Status422UnprocessableEntity, "Bad serial", "the serial must be 1 to 64 printable characters");
        }
        string? idempotencyKey = http.Request.Headers["Idempotency-Key"].FirstOrDefault();
        if (idempotencyKey is not null && (idempotencyKey.Length is 0 or > IdempotentAnswers.MaxKeyLength || idempotencyKey.Any(char.IsControl)))
        {
            return Problems.Make(StatusCodes.Status422UnprocessableEntity, "Bad Idempotency-Key",
                FormattableString.Invariant($"the Idempotency-Key must be 1 to {IdempotentAnswers.MaxKeyLength} printable characters"));
        }
        (SweepBody? body, ProblemHttpResult? bad) = await new SweepBodyReader(options, json).ReadAsync(http.Request, fileName, cancellationToken).ConfigureAwait(false);
        if (body is null)
        {
            return bad!;
        }

        Actor actor = ActorClaims.FromClaims(http.User);
        string station = http.User.FindFirst(ActorClaims.Station)!.Value;
        string? scopedKey = idempotencyKey is null ? null : IdempotentAnswers.ScopedKey("station:" + station, idempotencyKey);
        string requestHash = IdempotentAnswers.RequestHash($"{lotNumber}\n{serial}", body.FileName, body.Bytes);
        if (scopedKey is not null && await answers.FindAsync(scopedKey, cancellationToken).ConfigureAwait(false) is { } earlier)
        {
            return earlier.RequestSha256 == requestHash
                ? new StoredJsonResult<SweepAnswer>(earlier.StatusCode, earlier.Body)
                : Problems.Make(StatusCodes.Status422UnprocessableEntity, "Idempotency-Key reused",
                    "this Idempotency-Key was used for a different request (another unit, file name or body); use a new key");
        }

        var submission = new SweepSubmission(lotNumber, serial, station, actor, body.Bytes, body.FileName)
        {
            IdempotencyKey = scopedKey is null ? null : "api:" + scopedKey,
        };
        IntakeResult result;
        try
        {
            result = await intake.SubmitAsync(submission, cancellationToken).ConfigureAwait(false);
        }
        catch (SweepReadException e)
        {
            return Problems.Make(StatusCodes.Status422UnprocessableEntity, "The sweep cannot be read", e.Message, new Dictionary<string, object?>
            {
                ["fileName"] = e.FileName,
                ["line"] = e.Line,
                ["column"] = e.Column,
                ["problem"] = e.Problem,
            });
        }
        catch (RecordNotFoundException e)
        {
            return Problems.Make(StatusCodes.Status404NotFound, "Not found", e.Message);
        }
        catch (Exception e) when (e is IntakeRefusedException or StorageRuleException)
        {
            return Problems.Make(StatusCodes.Status409Conflict, "Refused", e.Message);
        }

        string answer = JsonSerializer.Serialize(SweepAnswer.From(submission, result), json.Value.SerializerOptions);
        if (scopedKey is not null)
        {
            var stored = await answers.SaveAsync(scopedKey, requestHash, StatusCodes.Status201Created, answer, cancellationToken).ConfigureAwait(false);
            return new StoredJsonResult<SweepAnswer>(stored.StatusCode, stored.Body);
        }
        return new StoredJsonResult<SweepAnswer>(StatusCodes.Status201Created, answer);
    }
}
