using System.Security.Claims;
using FilterQA.Data.Accounts;

namespace FilterQA.Web.Ui.Tests.Services;

public sealed class ActorClaimsTests
{
    private static ClaimsPrincipal User(params Claim[] claims) => new(new ClaimsIdentity(claims, "cookie"));

    [Fact]
    public void Id_name_and_approver_come_from_the_claims()
    {
        var actor = ActorClaims.FromClaims(User(new Claim(ClaimTypes.NameIdentifier, "u-spetrova"), new Claim(ClaimTypes.Name, "S. Petrova"),
            new Claim(ClaimTypes.Role, RoleNames.Approver)));
        Assert.Equal("u-spetrova", actor.Id);
        Assert.Equal("S. Petrova", actor.Name);
        Assert.True(actor.IsApprover);
    }

    [Fact]
    public void An_operator_is_not_an_approver()
    {
        var actor = ActorClaims.FromClaims(User(new Claim(ClaimTypes.NameIdentifier, "u-mokafor"), new Claim(ClaimTypes.Name, "M. Okafor"),
            new Claim(ClaimTypes.Role, RoleNames.Operator)));
        Assert.False(actor.IsApprover);
    }

    [Fact]
    public void A_user_without_an_id_is_refused() =>
        Assert.Throws<InvalidOperationException>(() => ActorClaims.FromClaims(User(new Claim(ClaimTypes.Name, "R. Haldane"))));

    [Fact]
    public void The_display_name_claim_is_the_printed_name_when_present()
    {
        var actor = ActorClaims.FromClaims(User(new Claim(ClaimTypes.NameIdentifier, "u-rhaldane"), new Claim(ClaimTypes.Name, "rhaldane"),
            new Claim(ActorClaims.DisplayName, "R. Haldane")));
        Assert.Equal("R. Haldane", actor.Name);
    }

    [Fact]
    public void Nobody_signed_in_is_refused() =>
        Assert.Throws<InvalidOperationException>(() => ActorClaims.FromClaims(new ClaimsPrincipal(new ClaimsIdentity())));
}
