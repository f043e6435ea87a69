using System.Security.Claims;
using Bunit;
using FilterQA.Data.Accounts;
using FilterQA.Web.Ui.Layout;
using Microsoft.AspNetCore.Components;

namespace FilterQA.Web.Ui.Tests.Components;

public sealed class MainLayoutTests : BunitContext
{
    private IRenderedComponent<MainLayout> RenderAs(string name, params string[] roles)
    {
        var auth = AddAuthorization();
        auth.SetAuthorized(name);
        auth.SetRoles(roles);
        auth.SetClaims(new Claim(ClaimTypes.NameIdentifier, "u-" + name));
        return Render<MainLayout>(p => p.Add(x => x.Body, (RenderFragment)(b => b.AddContent(0, "page"))));
    }

    [Fact]
    public void The_top_bar_shows_the_person_their_role_and_a_switch_operator_post()
    {
        var cut = RenderAs("S. Petrova", RoleNames.Approver);
        Assert.Equal("S. Petrova", cut.Find(".who-name").TextContent.Trim());
        Assert.Equal("approver", cut.Find(".who-role").TextContent.Trim());
        var form = cut.Find("form.switch-form");
        Assert.Equal("post", form.GetAttribute("method"));
        Assert.Equal("account/sign-out", form.GetAttribute("action"));
        Assert.Equal("Switch operator", cut.Find("form.switch-form button").TextContent.Trim());
    }

    [Fact]
    public void An_operator_sees_bench_lots_and_stations_but_not_new_lot()
    {
        var cut = RenderAs("R. Haldane", RoleNames.Operator);
        string[] links = cut.FindAll("nav a").Select(a => a.TextContent.Trim()).ToArray();
        Assert.Equal(["Bench", "Lots", "Stations"], links);
    }

    [Fact]
    public void A_quality_engineer_sees_lots_new_lot_and_the_analysis_pages_but_not_the_bench_or_stations()
    {
        var cut = RenderAs("J. Lindqvist", RoleNames.QualityEngineer);
        string[] links = cut.FindAll("nav a").Select(a => a.TextContent.Trim()).ToArray();
        Assert.Equal(["Lots", "New lot", "Templates", "What-if", "Trends", "Audit log"], links);
    }

    [Fact]
    public void An_approver_sees_lots_new_lot_and_the_analysis_pages()
    {
        var cut = RenderAs("S. Petrova", RoleNames.Approver);
        string[] links = cut.FindAll("nav a").Select(a => a.TextContent.Trim()).ToArray();
        Assert.Equal(["Lots", "New lot", "Templates", "What-if", "Trends", "Audit log"], links);
    }

    [Fact]
    public void An_administrator_sees_lots_stations_trends_audit_and_accounts_but_not_the_what_if()
    {
        var cut = RenderAs("Administrator", RoleNames.Administrator);
        string[] links = cut.FindAll("nav a").Select(a => a.TextContent.Trim()).ToArray();
        Assert.Equal(["Lots", "Templates", "Stations", "Trends", "Audit log", "Accounts"], links);
        Assert.Equal("admin/accounts", cut.FindAll("nav a")[5].GetAttribute("href"));
    }
}
