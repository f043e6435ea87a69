using System.Security.Claims;
using System.Text.Encodings.Web;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using Microsoft.AspNetCore.Authentication;
using Microsoft.Extensions.Options;

namespace FilterQA.Web.Accounts;

/// <summary>
/// Authenticates a station by the X-Api-Key header: the key's SHA-256 must match a key that is not
/// revoked. The principal names the station (claim <see cref="ActorClaims.Station"/>) and the key.
/// </summary>
internal sealed class StationKeyHandler(IOptionsMonitor<AuthenticationSchemeOptions> options, ILoggerFactory logger, UrlEncoder encoder, StationApiKeys keys)
    : AuthenticationHandler<AuthenticationSchemeOptions>(options, logger, encoder)
{
    protected override async Task<AuthenticateResult> HandleAuthenticateAsync()
    {
        if (!Request.Headers.TryGetValue(Policies.ApiKeyHeader, out var values))
        {
            return AuthenticateResult.NoResult();
        }
        string key = values.ToString().Trim();
        StationApiKeyInfo? found = await keys.FindLiveAsync(key, Context.RequestAborted).ConfigureAwait(false);
        if (found is null)
        {
            return AuthenticateResult.Fail("the API key is not known or has been revoked");
        }
        var identity = new ClaimsIdentity(
        [
            new Claim(ClaimTypes.NameIdentifier, FormattableString.Invariant($"station-key:{found.Id}")),
            new Claim(ClaimTypes.Name, $"{found.Station} key {found.KeyPrefix}… ({found.Label})"),
            new Claim(ActorClaims.DisplayName, $"{found.Station} key '{found.Label}'"),
            new Claim(ActorClaims.Station, found.Station),
        ], Scheme.Name);
        return AuthenticateResult.Success(new AuthenticationTicket(new ClaimsPrincipal(identity), Scheme.Name));
    }

    protected override Task HandleChallengeAsync(AuthenticationProperties properties)
    {
        bool sent = Request.Headers.ContainsKey(Policies.ApiKeyHeader);
        return ApiProblems.WriteAsync(Context, StatusCodes.Status401Unauthorized, "Not signed in",
            sent ? "the X-Api-Key is not known or has been revoked" : "send a station key in the X-Api-Key header");
    }

    protected override Task HandleForbiddenAsync(AuthenticationProperties properties) =>
        ApiProblems.WriteAsync(Context, StatusCodes.Status403Forbidden, "Not allowed",
            "a station key may only post sweeps and read lots; this needs a signed-in person with the right role");
}
