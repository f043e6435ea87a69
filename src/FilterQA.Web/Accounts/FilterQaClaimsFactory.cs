using System.Security.Claims;
using FilterQA.Data;
using FilterQA.Data.Accounts;
using Microsoft.AspNetCore.Identity;
using Microsoft.Extensions.Options;

namespace FilterQA.Web.Accounts;

/// <summary>Identity's claims (id, user name, roles) plus the display name and badge that records print.</summary>
internal sealed class FilterQaClaimsFactory(UserManager<FilterQaUser> users, RoleManager<IdentityRole> roles, IOptions<IdentityOptions> options)
    : UserClaimsPrincipalFactory<FilterQaUser, IdentityRole>(users, roles, options)
{
    protected override async Task<ClaimsIdentity> GenerateClaimsAsync(FilterQaUser user)
    {
        ClaimsIdentity identity = await base.GenerateClaimsAsync(user).ConfigureAwait(false);
        identity.AddClaim(new Claim(ActorClaims.DisplayName, string.IsNullOrWhiteSpace(user.DisplayName) ? user.UserName ?? user.Id : user.DisplayName));
        if (!string.IsNullOrEmpty(user.BadgeNumber))
        {
            identity.AddClaim(new Claim(ActorClaims.Badge, user.BadgeNumber));
        }
        return identity;
    }
}
