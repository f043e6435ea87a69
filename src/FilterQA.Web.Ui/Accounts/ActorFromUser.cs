using System.Security.Claims;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;

namespace FilterQA.Web.Ui.Accounts;

/// <summary>The <see cref="Actor"/> for a signed-in user: account id from NameIdentifier, printed name from Name, approver by role.</summary>
internal static class ActorFromUser
{
    /// <exception cref="InvalidOperationException">The user is not signed in or lacks the id or name claim.</exception>
    public static Actor From(ClaimsPrincipal user)
    {
        ArgumentNullException.ThrowIfNull(user);
        if (user.Identity?.IsAuthenticated != true)
        {
            throw new InvalidOperationException("nobody is signed in; sign in before testing or changing records");
        }
        string id = user.FindFirst(ClaimTypes.NameIdentifier)?.Value is { Length: > 0 } i
            ? i
            : throw new InvalidOperationException("the signed-in account has no id (NameIdentifier claim)");
        string name = user.FindFirst(ClaimTypes.Name)?.Value is { Length: > 0 } n
            ? n
            : throw new InvalidOperationException($"the signed-in account {id} has no name (Name claim)");
        return new Actor(id, name, user.IsInRole(RoleNames.Approver));
    }
}
