using System.Security.Claims;
using Bunit;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Web.Ui.Pages;
using FilterQA.Web.Ui.Tests.Infrastructure;
using Microsoft.Extensions.DependencyInjection;

namespace FilterQA.Web.Ui.Tests.Components;

/// <summary>Station API keys on the stations page: made and shown once, listed, revoked, for administrators only.</summary>
public sealed class StationKeysTests : SeededStore
{
    public StationKeysTests() => Services.AddScoped<StationApiKeys>();

    private void SignInAdministrator()
    {
        var auth = AddAuthorization();
        auth.SetAuthorized("Administrator");
        auth.SetRoles(RoleNames.Administrator);
        auth.SetClaims(new Claim(ClaimTypes.NameIdentifier, "u-admin"));
    }

    [Fact]
    public async Task An_administrator_makes_a_key_that_is_shown_once_and_works_until_revoked()
    {
        SignInAdministrator();
        await SeedAsync();
        var cut = Render<Stations>();
        cut.WaitForElement("tr[data-station]", TimeSpan.FromSeconds(10));
        Assert.Single(cut.FindAll("section.station-keys"));

        cut.Find("#k-label").Change("analyser script");
        cut.Find("button.make-key").Click();
        cut.WaitForElement("code.key-text", TimeSpan.FromSeconds(10));
        string key = cut.Find("code.key-text").TextContent.Trim();
        Assert.Contains("shown this once", cut.Find("div.new-key").TextContent, StringComparison.Ordinal);
        Assert.Contains("stored hashed", cut.Find("div.new-key").TextContent, StringComparison.Ordinal);

        StationApiKeys keys = Services.GetRequiredService<StationApiKeys>();
        StationApiKeyInfo? live = await keys.FindLiveAsync(key);
        Assert.NotNull(live);
        Assert.Equal(Station, live.Station);
        Assert.Equal("analyser script", live.Label);
        // The list shows the label and only the key's first characters, never the key.
        var row = cut.Find($"tr[data-key='{live.Id}']");
        Assert.Contains("analyser script", row.TextContent, StringComparison.Ordinal);
        Assert.DoesNotContain(key, row.TextContent, StringComparison.Ordinal);

        cut.Find("button.forget").Click();
        Assert.Empty(cut.FindAll("code.key-text"));
        Assert.DoesNotContain(key, cut.Markup, StringComparison.Ordinal);

        cut.Find($"tr[data-key='{live.Id}'] button.revoke").Click();
        cut.WaitForAssertion(() => Assert.Empty(cut.FindAll($"tr[data-key='{live.Id}'] button.revoke")), TimeSpan.FromSeconds(10));
        Assert.Null(await keys.FindLiveAsync(key));
        Assert.DoesNotContain(">no<", cut.Find($"tr[data-key='{live.Id}']").InnerHtml, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_key_without_a_label_is_refused_with_a_reason()
    {
        SignInAdministrator();
        await SeedAsync();
        var cut = Render<Stations>();
        cut.WaitForElement("tr[data-station]", TimeSpan.FromSeconds(10));
        Assert.Single(cut.FindAll("section.station-keys"));
        cut.Find("button.make-key").Click();
        cut.WaitForElement("section.station-keys p.problem", TimeSpan.FromSeconds(10));
        Assert.Contains("What the key is for", cut.Find("section.station-keys p.problem").TextContent, StringComparison.Ordinal);
        Assert.Empty(await Services.GetRequiredService<StationApiKeys>().ListAsync(Station));
    }

    [Fact]
    public async Task An_operator_sees_no_key_section()
    {
        await SeedAsync();
        var cut = Render<Stations>();
        cut.WaitForElement("tr[data-station]", TimeSpan.FromSeconds(10));
        Assert.Empty(cut.FindAll("section.station-keys"));
    }
}
