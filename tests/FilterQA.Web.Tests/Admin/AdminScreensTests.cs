using System.Net;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Web.Tests.Infrastructure;
using FilterQA.Web.Ui.Services;
using Microsoft.Extensions.DependencyInjection;

namespace FilterQA.Web.Tests.Admin;

/// <summary>
/// The administrator's screens against the whole host: accounts made with the page's service sign in
/// through the real sign-in endpoint, the page is closed to other roles, and keys made and revoked with
/// the service the stations page calls open and then close the API.
/// </summary>
public sealed class AdminScreensTests : IDisposable
{
    private static readonly Actor Administrator = new("u-boss", "Test boss");

    private readonly TempFolder _data = new();
    private readonly WebFactory _factory;

    public AdminScreensTests() => _factory = new WebFactory(_data.Path);

    public void Dispose()
    {
        _factory.Dispose();
        _data.Dispose();
    }

    [Fact]
    public async Task An_account_made_by_the_administrator_signs_in_with_its_one_time_password_and_its_pin()
    {
        CreatedAccount made;
        await using (AsyncServiceScope scope = _factory.Services.CreateAsyncScope())
        {
            made = await scope.ServiceProvider.GetRequiredService<AccountDirectory>()
                .CreateAsync(new NewAccount("tnakamura", "T. Nakamura", RoleNames.Operator, "1077"), Administrator);
        }
        Assert.True(made.Account.MustChangePassword);
        Assert.Equal([RoleNames.Operator], made.Account.Roles);
        Assert.NotNull(made.Pin);

        HttpClient byPassword = Bench.Client(_factory);
        HttpResponseMessage answer = await Bench.PostSignInAsync(byPassword,
            new() { ["userName"] = "tnakamura", ["password"] = made.OneTimePassword, ["returnUrl"] = "/lots" });
        Assert.Equal(HttpStatusCode.Redirect, answer.StatusCode);
        // A one-time password is replaced first: the sign-in leads to the change form, then to /lots.
        Assert.Equal("/password?returnUrl=%2Flots", answer.Headers.Location?.OriginalString);
        Assert.Contains("T. Nakamura", await byPassword.GetStringAsync("/lots"), StringComparison.Ordinal);

        HttpClient byBadge = Bench.Client(_factory);
        answer = await Bench.PostSignInAsync(byBadge, new() { ["badge"] = "1077", ["pin"] = made.Pin!, ["returnUrl"] = "/bench" });
        Assert.Equal("/bench", answer.Headers.Location?.OriginalString);
    }

    [Fact]
    public async Task A_reset_pin_replaces_the_old_one()
    {
        CreatedAccount made;
        string newPin;
        await using (AsyncServiceScope scope = _factory.Services.CreateAsyncScope())
        {
            AccountDirectory accounts = scope.ServiceProvider.GetRequiredService<AccountDirectory>();
            made = await accounts.CreateAsync(new NewAccount("tnakamura", "T. Nakamura", RoleNames.Operator, "1077"), Administrator);
            newPin = await accounts.ResetPinAsync(made.Account.Id, Administrator);
        }
        // Two random six-digit PINs are equal one time in a million; skip the old-PIN check then rather than fail.
        if (newPin != made.Pin)
        {
            HttpResponseMessage old = await Bench.PostSignInAsync(Bench.Client(_factory), new() { ["badge"] = "1077", ["pin"] = made.Pin!, ["returnUrl"] = "/bench" });
            Assert.StartsWith("/signin?error=", old.Headers.Location?.OriginalString, StringComparison.Ordinal);
        }
        HttpResponseMessage fresh = await Bench.PostSignInAsync(Bench.Client(_factory), new() { ["badge"] = "1077", ["pin"] = newPin, ["returnUrl"] = "/bench" });
        Assert.Equal("/bench", fresh.Headers.Location?.OriginalString);
    }

    [Fact]
    public async Task The_accounts_page_lists_accounts_for_an_administrator()
    {
        await Bench.CreatePersonAsync(_factory, "boss", RoleNames.Administrator);
        await Bench.CreatePersonAsync(_factory, "rhaldane", RoleNames.Operator, badge: "1001", pin: "482913");
        HttpClient client = await Bench.SignedInAsync(_factory, "boss");
        HttpResponseMessage page = await client.GetAsync("/admin/accounts");
        Assert.Equal(HttpStatusCode.OK, page.StatusCode);
        string html = await page.Content.ReadAsStringAsync();
        Assert.Contains("data-account=\"rhaldane\"", html, StringComparison.Ordinal);
        Assert.Contains("Test rhaldane", html, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(RoleNames.Operator)]
    [InlineData(RoleNames.QualityEngineer)]
    [InlineData(RoleNames.Approver)]
    public async Task The_accounts_page_is_closed_to_other_roles(string role)
    {
        await Bench.CreatePersonAsync(_factory, "someone", role);
        HttpClient client = await Bench.SignedInAsync(_factory, "someone");
        HttpResponseMessage page = await client.GetAsync("/admin/accounts");
        Assert.Equal(HttpStatusCode.Redirect, page.StatusCode);
        Assert.StartsWith("/signin?error=", page.Headers.Location?.OriginalString, StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_accounts_page_sends_someone_not_signed_in_to_sign_in()
    {
        HttpResponseMessage page = await Bench.Client(_factory).GetAsync("/admin/accounts");
        Assert.Equal(HttpStatusCode.Redirect, page.StatusCode);
        Assert.StartsWith("http://localhost/signin", page.Headers.Location?.OriginalString, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_station_key_reads_a_lot_until_it_is_revoked()
    {
        string lot = await Bench.PrepareLotAsync(_factory);
        NewStationApiKey made;
        await using (AsyncServiceScope scope = _factory.Services.CreateAsyncScope())
        {
            made = await scope.ServiceProvider.GetRequiredService<StationApiKeys>().CreateAsync(Bench.Station, "analyser script", Administrator);
        }
        HttpClient client = Bench.Client(_factory);
        Assert.Equal(HttpStatusCode.OK, (await client.SendAsync(LotRequest(lot, made.Key))).StatusCode);

        await using (AsyncServiceScope scope = _factory.Services.CreateAsyncScope())
        {
            await scope.ServiceProvider.GetRequiredService<StationApiKeys>().RevokeAsync(Bench.Station, made.Info.Id, Administrator);
        }
        Assert.Equal(HttpStatusCode.Unauthorized, (await client.SendAsync(LotRequest(lot, made.Key))).StatusCode);
    }

    private static HttpRequestMessage LotRequest(string lot, string key)
    {
        var request = new HttpRequestMessage(HttpMethod.Get, $"/api/v1/lots/{lot}");
        request.Headers.Add("X-Api-Key", key);
        return request;
    }
}
