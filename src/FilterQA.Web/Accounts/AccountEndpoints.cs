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
        endpoints.MapPost("/account/password", ChangePasswordAsync).RequireAuthorization().DisableAntiforgery().ExcludeFromDescription();
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
        if (!outcome.Succeeded)
        {
            return Back(outcome.Error!, returnUrl);
        }
        // A one-time password is replaced before anything else is done under it.
        return outcome.MustChangePassword && !badge
            ? TypedResults.Redirect("/password?returnUrl=" + Uri.EscapeDataString(LocalUrl.OrHome(returnUrl)))
            : TypedResults.Redirect(LocalUrl.OrHome(returnUrl));
    }

    private static async Task<RedirectHttpResult> ChangePasswordAsync(HttpContext context, IAntiforgery antiforgery, AccountSignIn accounts)
    {
        if (!context.Request.HasFormContentType)
        {
            return TypedResults.Redirect("/password?error=" + Uri.EscapeDataString("The form was not sent as a form."));
        }
        IFormCollection form = await context.Request.ReadFormAsync(context.RequestAborted).ConfigureAwait(false);
        string returnUrl = LocalUrl.OrHome(form["returnUrl"]);
        if (!await antiforgery.IsRequestValidAsync(context).ConfigureAwait(false))
        {
            return TypedResults.Redirect("/password?error=" + Uri.EscapeDataString("The form had expired. Please try again.")
                + "&returnUrl=" + Uri.EscapeDataString(returnUrl));
        }
        SignInOutcome outcome = await accounts.ChangePasswordAsync(context.User, form["currentPassword"], form["newPassword"], form["confirmPassword"])
            .ConfigureAwait(false);
        return outcome.Succeeded
            ? TypedResults.Redirect(returnUrl)
            : TypedResults.Redirect("/password?error=" + Uri.EscapeDataString(outcome.Error!) + "&returnUrl=" + Uri.EscapeDataString(returnUrl));
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
