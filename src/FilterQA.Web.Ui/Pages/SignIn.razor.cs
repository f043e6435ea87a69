using Microsoft.AspNetCore.Components;

namespace FilterQA.Web.Ui.Pages;

/// <summary>
/// The sign-in page (static server rendering). Badge and PIN by default, for the shared bench PC: the badge
/// field has focus, so a badge scanner can type into it. <c>?mode=password</c> offers user name and password.
/// Posts <c>badge</c>+<c>pin</c> or <c>userName</c>+<c>password</c>, <c>returnUrl</c> and the antiforgery token
/// to the host's <c>/account/sign-in</c>, which answers with a redirect (back here with <c>?error=</c> on failure).
/// </summary>
public partial class SignIn
{
    /// <summary>A message from the host's sign-in endpoint, shown as is.</summary>
    [SupplyParameterFromQuery(Name = "error")]
    public string? Error { get; set; }

    /// <summary>Where to go after signing in; only a local path is passed on.</summary>
    [SupplyParameterFromQuery(Name = "returnUrl")]
    public string? ReturnUrl { get; set; }

    /// <summary>"password" for user name and password; anything else for badge and PIN.</summary>
    [SupplyParameterFromQuery(Name = "mode")]
    public string? Mode { get; set; }

    private bool UsesPassword => string.Equals(Mode, "password", StringComparison.OrdinalIgnoreCase);

    // A return address from the query could point anywhere; only a path on this site is kept.
    internal string SafeReturnUrl => IsLocal(ReturnUrl) ? ReturnUrl! : "/";

    private string OtherModeHref => "signin?" + (UsesPassword ? "" : "mode=password&") + "returnUrl=" + Uri.EscapeDataString(SafeReturnUrl);

    internal static bool IsLocal(string? url) =>
        !string.IsNullOrEmpty(url) && url[0] == '/' && (url.Length == 1 || (url[1] != '/' && url[1] != '\\'));
}
