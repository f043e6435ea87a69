using Microsoft.AspNetCore.Antiforgery;
using Microsoft.AspNetCore.Http.HttpResults;

namespace FilterQA.Web.Accounts;

/// <summary>
/// The sign-in form's endpoints. POST /account/sign-in takes form fields userName + password or badge + pin,
/// returnUrl and the antiforgery token, and redirects to returnUrl (local paths only) or back to
/// /signin?error=…; POST /account/sign-out ends the session and redirects to /signin.
/// </summary>
public static class AccountEndpoints
{
    /// <summary>Maps the two endpoints; both answer anonymous callers.</summary>
    public static IEndpointRouteBuilder MapAccountEndpoints(this IEndpointRouteBuilder endpoints)
    {
        RouteGroupBuilder account = endpoints.MapGroup("/account").AllowAnonymous().ExcludeFromDescription();
        account.MapPost("/sign-in", SignInAsync).DisableAntiforgery();
        account.MapPost("/sign-out", SignOutAsync).DisableAntiforgery();
        return endpoints;
    }

    // The token is checked here rather than by the middleware so a stale form gets the sign-in page
    // with a reason instead of a bare 400.
    private static async Task<RedirectHttpResult> SignInAsync(HttpContext context, IAntiforgery antiforgery, AccountSignIn accounts)
    {
        if (!context.Request.HasFormContentType)
        {
            return Back("The sign-in form was not sent as a form.", null);
        }
        IFormCollection form = await context.Request.ReadFormAsync(context.RequestAborted).ConfigureAwait(false);
        string? returnUrl = form["returnUrl"];
        try
        {
            await antiforgery.ValidateRequestAsync(context).ConfigureAwait(false);
        }
        catch (AntiforgeryValidationException)
        {
            return Back("The sign-in form had expired. Please sign in again.", returnUrl);
        }
        bool badge = form.ContainsKey("badge") || form.ContainsKey("pin");
        SignInOutcome outcome = badge
            ? await accounts.WithBadgeAsync(form["badge"], form["pin"]).ConfigureAwait(false)
            : await accounts.WithPasswordAsync(form["userName"], form["password"]).ConfigureAwait(false);
        return outcome.Succeeded ? TypedResults.Redirect(LocalUrl.OrHome(returnUrl)) : Back(outcome.Error!, returnUrl);
    }

    private static async Task<RedirectHttpResult> SignOutAsync(HttpContext context, IAntiforgery antiforgery, AccountSignIn accounts)
    {
        if (await antiforgery.IsRequestValidAsync(context).ConfigureAwait(false))
        {
            await accounts.SignOutAsync().ConfigureAwait(false);
        }
        return TypedResults.Redirect("/signin");
    }

    private static RedirectHttpResult Back(string error, string? returnUrl)
    {
        string url = "/signin?error=" + Uri.EscapeDataString(error);
        if (LocalUrl.IsLocal(returnUrl))
        {
            url += "&returnUrl=" + Uri.EscapeDataString(returnUrl!);
        }
        return TypedResults.Redirect(url);
    }
}
