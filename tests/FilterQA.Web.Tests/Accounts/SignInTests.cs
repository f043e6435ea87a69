using System.Net;
using System.Security.Claims;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Web.Accounts;
using FilterQA.Web.Tests.Infrastructure;

namespace FilterQA.Web.Tests.Accounts;

/// <summary>
/// Sign-in through the host's endpoints, with the antiforgery token taken from the sign-in form the way a
/// browser gets it (the page library's /signin).
/// </summary>
public sealed class SignInTests : IDisposable
{
    private readonly TempFolder _data = new();
    private readonly WebFactory _factory;

    public SignInTests() => _factory = new WebFactory(_data.Path);

    public void Dispose()
    {
        _factory.Dispose();
        _data.Dispose();
    }

    [Fact]
    public async Task User_name_and_password_sign_in_and_reach_a_page()
    {
        await Bench.CreatePersonAsync(_factory, "jlindqvist", RoleNames.QualityEngineer);
        HttpClient client = await Bench.SignedInAsync(_factory, "jlindqvist");
        HttpResponseMessage page = await client.GetAsync("/lots");
        Assert.Equal(HttpStatusCode.OK, page.StatusCode);
        Assert.Contains("Test jlindqvist", await page.Content.ReadAsStringAsync(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Badge_and_pin_sign_in_and_go_to_the_local_return_url()
    {
        await Bench.CreatePersonAsync(_factory, "rhaldane", RoleNames.Operator, badge: "1001", pin: "482913");
        HttpClient client = Bench.Client(_factory);
        HttpResponseMessage answer = await Bench.PostSignInAsync(client, new() { ["badge"] = "1001", ["pin"] = "482913", ["returnUrl"] = "/bench" });
        Assert.Equal(HttpStatusCode.Redirect, answer.StatusCode);
        Assert.Equal("/bench", answer.Headers.Location?.OriginalString);
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/lots")).StatusCode);
    }

    [Theory]
    [InlineData("1001", "000000")]
    [InlineData("9999", "482913")]
    public async Task A_wrong_badge_or_pin_goes_back_to_sign_in_with_a_plain_reason(string badge, string pin)
    {
        await Bench.CreatePersonAsync(_factory, "rhaldane", RoleNames.Operator, badge: "1001", pin: "482913");
        HttpResponseMessage answer = await Bench.PostSignInAsync(Bench.Client(_factory), new() { ["badge"] = badge, ["pin"] = pin, ["returnUrl"] = "/" });
        Assert.Equal(HttpStatusCode.Redirect, answer.StatusCode);
        string location = Uri.UnescapeDataString(answer.Headers.Location!.OriginalString);
        Assert.StartsWith("/signin?error=", location, StringComparison.Ordinal);
        Assert.Contains("badge number or PIN is wrong", location, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Five_wrong_pins_lock_the_account_so_a_pin_cannot_be_guessed()
    {
        await Bench.CreatePersonAsync(_factory, "mokafor", RoleNames.Operator, badge: "1002", pin: "123456");
        HttpClient client = Bench.Client(_factory);
        for (int i = 0; i < 5; i++)
        {
            await Bench.PostSignInAsync(client, new() { ["badge"] = "1002", ["pin"] = "00000" + i });
        }
        HttpResponseMessage right = await Bench.PostSignInAsync(client, new() { ["badge"] = "1002", ["pin"] = "123456" });
        Assert.Contains("locked", Uri.UnescapeDataString(right.Headers.Location!.OriginalString), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("https://example.invalid/steal")]
    [InlineData("//example.invalid/steal")]
    [InlineData("/\\example.invalid")]
    public async Task A_return_url_off_the_site_is_replaced_by_home(string returnUrl)
    {
        await Bench.CreatePersonAsync(_factory, "spetrova", RoleNames.Approver);
        HttpResponseMessage answer = await Bench.PostSignInAsync(Bench.Client(_factory),
            new() { ["userName"] = "spetrova", ["password"] = Bench.Password, ["returnUrl"] = returnUrl });
        Assert.Equal("/", answer.Headers.Location?.OriginalString);
    }

    [Fact]
    public async Task A_sign_in_without_the_antiforgery_token_is_refused()
    {
        await Bench.CreatePersonAsync(_factory, "spetrova", RoleNames.Approver);
        HttpClient client = Bench.Client(_factory);
        HttpResponseMessage answer = await client.PostAsync("/account/sign-in",
            new FormUrlEncodedContent(new Dictionary<string, string> { ["userName"] = "spetrova", ["password"] = Bench.Password }));
        Assert.StartsWith("/signin?error=", answer.Headers.Location!.OriginalString, StringComparison.Ordinal);
        Assert.Equal(HttpStatusCode.Redirect, (await client.GetAsync("/lots")).StatusCode);
    }

    [Fact]
    public async Task Sign_out_ends_the_session()
    {
        await Bench.CreatePersonAsync(_factory, "rhaldane", RoleNames.Operator);
        HttpClient client = await Bench.SignedInAsync(_factory, "rhaldane");
        string home = await client.GetStringAsync("/lots");
        string token = System.Text.RegularExpressions.Regex.Match(home, "name=\"__RequestVerificationToken\" value=\"([^\"]+)\"").Groups[1].Value;
        HttpResponseMessage answer = await client.PostAsync("/account/sign-out",
            new FormUrlEncodedContent(new Dictionary<string, string> { ["__RequestVerificationToken"] = WebUtility.HtmlDecode(token) }));
        Assert.Equal("/signin", answer.Headers.Location?.OriginalString);
        Assert.Equal(HttpStatusCode.Redirect, (await client.GetAsync("/lots")).StatusCode);
    }

    [Fact]
    public void Actor_from_claims_takes_the_account_id_display_name_and_approver_role()
    {
        var identity = new ClaimsIdentity(
        [
            new Claim(ClaimTypes.NameIdentifier, "u-42"),
            new Claim(ClaimTypes.Name, "spetrova"),
            new Claim(ActorClaims.DisplayName, "S. Petrova"),
            new Claim(ClaimTypes.Role, RoleNames.Approver),
        ], "test");
        Actor actor = ActorClaims.FromClaims(new ClaimsPrincipal(identity));
        Assert.Equal(new Actor("u-42", "S. Petrova", isApprover: true), actor);
        Assert.Null(ActorClaims.TryFromClaims(new ClaimsPrincipal(new ClaimsIdentity())));
        Assert.Throws<InvalidOperationException>(() => ActorClaims.FromClaims(new ClaimsPrincipal(new ClaimsIdentity())));
    }

    [Theory]
    [InlineData("/", true)]
    [InlineData("/lots/VP-2611-0042", true)]
    [InlineData("//evil", false)]
    [InlineData("/\\evil", false)]
    [InlineData("http://evil", false)]
    [InlineData("", false)]
    [InlineData("/a\nb", false)]
    public void Only_paths_on_this_site_are_local(string url, bool local) => Assert.Equal(local, LocalUrl.IsLocal(url));
}
