using System.Security.Claims;
using FilterQA.Data.Accounts;
using FilterQA.Web.Ui.Accounts;

namespace FilterQA.Web.Ui.Tests.Services;

public sealed class ActorFromUserTests
{
    private static ClaimsPrincipal User(params Claim[] claims) => new(new ClaimsIdentity(claims, "cookie"));

    [Fact]
    public void Id_name_and_approver_come_from_the_claims()
    {
        var actor = ActorFromUser.From(User(new Claim(ClaimTypes.NameIdentifier, "u-spetrova"), new Claim(ClaimTypes.Name, "S. Petrova"),
            new Claim(ClaimTypes.Role, RoleNames.Approver)));
        Assert.Equal("u-spetrova", actor.Id);
        Assert.Equal("S. Petrova", actor.Name);
        Assert.True(actor.IsApprover);
    }

    [Fact]
    public void An_operator_is_not_an_approver()
    {
        var actor = ActorFromUser.From(User(new Claim(ClaimTypes.NameIdentifier, "u-mokafor"), new Claim(ClaimTypes.Name, "M. Okafor"),
            new Claim(ClaimTypes.Role, RoleNames.Operator)));
        Assert.False(actor.IsApprover);
    }

    [Fact]
    public void A_user_without_an_id_is_refused_with_a_message_naming_the_claim()
    {
        var e = Assert.Throws<InvalidOperationException>(() => ActorFromUser.From(User(new Claim(ClaimTypes.Name, "R. Haldane"))));
        Assert.Contains("NameIdentifier", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Nobody_signed_in_is_refused() =>
        Assert.Throws<InvalidOperationException>(() => ActorFromUser.From(new ClaimsPrincipal(new ClaimsIdentity())));
}
