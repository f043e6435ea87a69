using FilterQA.Data;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Web.Accounts;
using Microsoft.AspNetCore.Http.HttpResults;

namespace FilterQA.Web.Api.Keys;

/// <summary>
/// Station API keys, for administrators signed in with the cookie: POST makes a key (shown once in the
/// answer), GET lists keys without their secrets, DELETE revokes one.
/// </summary>
public static class ApiKeyEndpoints
{
    public static RouteGroupBuilder MapApiKeyEndpoints(this RouteGroupBuilder api)
    {
        ArgumentNullException.ThrowIfNull(api);
        RouteGroupBuilder keys = api.MapGroup("/stations/{station}/api-keys")
            .RequireAuthorization(Policies.Administrator)
            .ProducesProblem(StatusCodes.Status401Unauthorized)
            .ProducesProblem(StatusCodes.Status403Forbidden)
            .ProducesProblem(StatusCodes.Status404NotFound);
        keys.MapPost("/", CreateAsync).WithName("CreateApiKey").WithSummary("Make a station key; the key is in this answer only")
            .ProducesProblem(StatusCodes.Status422UnprocessableEntity);
        keys.MapGet("/", ListAsync).WithName("ListApiKeys").WithSummary("A station's keys (never the secrets)");
        keys.MapDelete("/{keyId:long}", RevokeAsync).WithName("RevokeApiKey").WithSummary("Revoke a station key");
        return api;
    }

    private static async Task<Results<Created<CreatedApiKey>, ProblemHttpResult>> CreateAsync(string station, NewApiKeyRequest request,
        HttpContext http, StationApiKeys keys, CancellationToken cancellationToken)
    {
        if (string.IsNullOrWhiteSpace(request?.Label) || request.Label.Length > 200 || request.Label.Any(char.IsControl))
        {
            return Problems.Make(StatusCodes.Status422UnprocessableEntity, "Bad label", "label: say what the key is for, 1 to 200 printable characters");
        }
        try
        {
            NewStationApiKey made = await keys.CreateAsync(station, request.Label, ActorClaims.FromClaims(http.User), cancellationToken).ConfigureAwait(false);
            return TypedResults.Created(FormattableString.Invariant($"/api/v1/stations/{Uri.EscapeDataString(station)}/api-keys/{made.Info.Id}"),
                new CreatedApiKey(made.Info, made.Key));
        }
        catch (RecordNotFoundException e)
        {
            return Problems.Make(StatusCodes.Status404NotFound, "Not found", e.Message);
        }
    }

    private static async Task<Ok<IReadOnlyList<StationApiKeyInfo>>> ListAsync(string station, StationApiKeys keys, CancellationToken cancellationToken) =>
        TypedResults.Ok(await keys.ListAsync(station, cancellationToken).ConfigureAwait(false));

    private static async Task<Results<Ok<StationApiKeyInfo>, ProblemHttpResult>> RevokeAsync(string station, long keyId, HttpContext http,
        StationApiKeys keys, CancellationToken cancellationToken)
    {
        try
        {
            return TypedResults.Ok(await keys.RevokeAsync(station, keyId, ActorClaims.FromClaims(http.User), cancellationToken).ConfigureAwait(false));
        }
        catch (RecordNotFoundException e)
        {
            return Problems.Make(StatusCodes.Status404NotFound, "Not found", e.Message);
        }
    }
}
