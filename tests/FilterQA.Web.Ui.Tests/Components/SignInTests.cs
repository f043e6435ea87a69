using Bunit;
using FilterQA.Web.Ui.Pages;

namespace FilterQA.Web.Ui.Tests.Components;

public sealed class SignInTests : BunitContext
{
    [Fact]
    public void Badge_and_pin_is_the_default_with_the_badge_field_focused_and_the_error_shown()
    {
        NavigationManager().NavigateTo("signin?error=Unknown%20badge&returnUrl=%2Flots%2FVP-2611-0042");
        var cut = Render<SignIn>();
        var form = cut.Find("form");
        Assert.Equal("post", form.GetAttribute("method"));
        Assert.Equal("account/sign-in", form.GetAttribute("action"));
        Assert.True(cut.Find("#badge").HasAttribute("autofocus"));
        Assert.Equal("password", cut.Find("#pin").GetAttribute("type"));
        Assert.Empty(cut.FindAll("#userName"));
        Assert.Equal("Unknown badge", cut.Find("[data-error]").TextContent.Trim());
        Assert.Equal("/lots/VP-2611-0042", cut.Find("input[name=returnUrl]").GetAttribute("value"));
    }

    [Fact]
    public void Password_mode_asks_for_user_name_and_password()
    {
        NavigationManager().NavigateTo("signin?mode=password");
        var cut = Render<SignIn>();
        Assert.True(cut.Find("#userName").HasAttribute("autofocus"));
        Assert.Equal("password", cut.Find("#password").GetAttribute("type"));
        Assert.Empty(cut.FindAll("#badge"));
    }

    [Theory]
    [InlineData("https://elsewhere.example/")]
    [InlineData("//elsewhere.example/")]
    [InlineData("/\\elsewhere.example/")]
    public void A_return_address_off_this_site_is_replaced_by_the_start_page(string returnUrl)
    {
        NavigationManager().NavigateTo("signin?returnUrl=" + Uri.EscapeDataString(returnUrl));
        var cut = Render<SignIn>();
        Assert.Equal("/", cut.Find("input[name=returnUrl]").GetAttribute("value"));
    }

    private Microsoft.AspNetCore.Components.NavigationManager NavigationManager() =>
        Services.GetService(typeof(Microsoft.AspNetCore.Components.NavigationManager)) as Microsoft.AspNetCore.Components.NavigationManager
        ?? throw new InvalidOperationException("no navigation manager");
}
