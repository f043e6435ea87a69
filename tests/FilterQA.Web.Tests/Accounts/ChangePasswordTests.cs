using System.Net;
using System.Text.RegularExpressions;
using FilterQA.Data;
using FilterQA.Data.Accounts;
using FilterQA.Web.Tests.Infrastructure;
using Microsoft.AspNetCore.Identity;
using Microsoft.Extensions.DependencyInjection;

namespace FilterQA.Web.Tests.Accounts;

/// <summary>A one-time password is replaced before anything else is done under it.</summary>
public sealed class ChangePasswordTests : IDisposable
{
    private readonly TempFolder _data = new();
    private readonly WebFactory _factory;

    public ChangePasswordTests() => _factory = new WebFactory(_data.Path);

    public void Dispose()
    {
        _factory.Dispose();
        _data.Dispose();
    }

    private async Task MarkOneTimeAsync(string userName)
    {
        await using AsyncServiceScope scope = _factory.Services.CreateAsyncScope();
        UserManager<FilterQaUser> users = scope.ServiceProvider.GetRequiredService<UserManager<FilterQaUser>>();
        FilterQaUser user = (await users.FindByNameAsync(userName))!;
        user.MustChangePassword = true;
        Assert.True((await users.UpdateAsync(user)).Succeeded);
    }

    private static async Task<HttpResponseMessage> PostFormAsync(HttpClient client, string page, string action, Dictionary<string, string> fields)
    {
        string form = await client.GetStringAsync(page);
        string token = Regex.Match(form, "name=\"__RequestVerificationToken\" value=\"([^\"]+)\"").Groups[1].Value;
        fields["__RequestVerificationToken"] = WebUtility.HtmlDecode(token);
        return await client.PostAsync(action, new FormUrlEncodedContent(fields));
    }

    [Fact]
    public async Task A_one_time_password_leads_to_the_change_form_and_the_new_password_then_signs_in()
    {
        await Bench.CreatePersonAsync(_factory, "jlindqvist", RoleNames.QualityEngineer);
        await MarkOneTimeAsync("jlindqvist");
        HttpClient client = Bench.Client(_factory);

        HttpResponseMessage signedIn = await PostFormAsync(client, "/signin?mode=password", "/account/sign-in",
            new() { ["userName"] = "jlindqvist", ["password"] = Bench.Password, ["returnUrl"] = "/lots" });
        Assert.Equal("/password?returnUrl=%2Flots", signedIn.Headers.Location?.OriginalString);

        HttpResponseMessage changed = await PostFormAsync(client, "/password?returnUrl=%2Flots", "/account/password",
            new() { ["currentPassword"] = Bench.Password, ["newPassword"] = "Kelp-Harbour-2611!", ["confirmPassword"] = "Kelp-Harbour-2611!", ["returnUrl"] = "/lots" });
        Assert.Equal("/lots", changed.Headers.Location?.OriginalString);

        await using AsyncServiceScope scope = _factory.Services.CreateAsyncScope();
        FilterQaUser user = (await scope.ServiceProvider.GetRequiredService<UserManager<FilterQaUser>>().FindByNameAsync("jlindqvist"))!;
        Assert.False(user.MustChangePassword);

        HttpClient again = Bench.Client(_factory);
        HttpResponseMessage second = await PostFormAsync(again, "/signin?mode=password", "/account/sign-in",
            new() { ["userName"] = "jlindqvist", ["password"] = "Kelp-Harbour-2611!", ["returnUrl"] = "/lots" });
        Assert.Equal("/lots", second.Headers.Location?.OriginalString);
    }

    [Theory]
    [InlineData("Kelp-Harbour-2611!", "Kelp-Harbour-2612!", "differ")]
    [InlineData("", "", "Give the current password")]
    public async Task A_bad_change_is_refused_with_a_reason_and_the_flag_stays(string replacement, string confirmation, string reason)
    {
        await Bench.CreatePersonAsync(_factory, "spetrova", RoleNames.Approver);
        HttpClient client = await Bench.SignedInAsync(_factory, "spetrova");
        await MarkOneTimeAsync("spetrova");

        HttpResponseMessage answer = await PostFormAsync(client, "/password", "/account/password",
            new() { ["currentPassword"] = replacement.Length == 0 ? "" : Bench.Password, ["newPassword"] = replacement, ["confirmPassword"] = confirmation, ["returnUrl"] = "/lots" });

        string location = WebUtility.UrlDecode(answer.Headers.Location?.OriginalString ?? "");
        Assert.StartsWith("/password?error=", location, StringComparison.Ordinal);
        Assert.Contains(reason, location, StringComparison.Ordinal);
        await using AsyncServiceScope scope = _factory.Services.CreateAsyncScope();
        Assert.True((await scope.ServiceProvider.GetRequiredService<UserManager<FilterQaUser>>().FindByNameAsync("spetrova"))!.MustChangePassword);
    }

    [Fact]
    public async Task Nobody_signed_in_cannot_change_a_password()
    {
        HttpResponseMessage answer = await Bench.Client(_factory).PostAsync("/account/password", new FormUrlEncodedContent(new Dictionary<string, string>()));
        Assert.Equal(HttpStatusCode.Redirect, answer.StatusCode);
        Assert.StartsWith("/signin", answer.Headers.Location?.AbsolutePath ?? answer.Headers.Location?.OriginalString ?? "", StringComparison.Ordinal);
    }
}
