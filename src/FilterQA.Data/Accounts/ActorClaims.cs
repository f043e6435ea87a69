using System.Security.Claims;
using FilterQA.Data.Services;

namespace FilterQA.Data.Accounts;

/// <summary>
/// The claims a signed-in person carries, and the one way to turn them into the <see cref="Actor"/>
/// every service records. Pages, endpoints and background work all use <see cref="FromClaims"/>.
/// </summary>
public static class ActorClaims
{
    /// <summary>The name printed on records (the account's display name).</summary>
    public const string DisplayName = "filterqa:display-name";

    /// <summary>The person's badge number, when they have one.</summary>
    public const string Badge = "filterqa:badge";

    /// <summary>On a station API key's principal: the station the key belongs to.</summary>
    public const string Station = "filterqa:station";

    /// <summary>
    /// The actor for a signed-in principal: Id = the name-identifier claim (the account id),
    /// Name = the display name (the user name when no display name is set), IsApprover = in the approver role.
    /// </summary>
    /// <exception cref="ArgumentNullException"><paramref name="user"/> is null.</exception>
    /// <exception cref="InvalidOperationException">The principal is not signed in or has no account id.</exception>
    public static Actor FromClaims(ClaimsPrincipal user)
    {
        ArgumentNullException.ThrowIfNull(user);
        return TryFromClaims(user) ?? throw new InvalidOperationException("nobody is signed in: an action needs a signed-in person to record it under");
    }

    /// <summary>As <see cref="FromClaims"/>, or null when the principal is not signed in or has no account id.</summary>
    public static Actor? TryFromClaims(ClaimsPrincipal? user)
    {
        if (user?.Identity is not { IsAuthenticated: true })
        {
            return null;
        }
        string? id = user.FindFirst(ClaimTypes.NameIdentifier)?.Value;
        if (string.IsNullOrWhiteSpace(id))
        {
            return null;
        }
        string? name = user.FindFirst(DisplayName)?.Value;
        if (string.IsNullOrWhiteSpace(name))
        {
            name = user.Identity.Name;
        }
        return new Actor(id, string.IsNullOrWhiteSpace(name) ? id : name, user.IsInRole(RoleNames.Approver));
    }
}
