using FilterQA.Web.Tests.Infrastructure;
using Microsoft.AspNetCore.Authentication.Cookies;
using Microsoft.AspNetCore.Identity;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Options;

namespace FilterQA.Web.Tests.Accounts;

/// <summary>Auth:IdleMinutes sets a sliding cookie lifetime: a person idle that long is signed out.</summary>
public sealed class IdleSignOutTests
{
    [Theory]
    [InlineData(null, 15)]
    [InlineData("5", 5)]
    public void The_sign_in_cookie_slides_over_the_configured_idle_time(string? configured, int expectedMinutes)
    {
        using var data = new TempFolder();
        var settings = configured is null ? null : new Dictionary<string, string?> { ["Auth:IdleMinutes"] = configured };
        using var factory = new WebFactory(data.Path, settings);
        CookieAuthenticationOptions cookie = factory.Services.GetRequiredService<IOptionsMonitor<CookieAuthenticationOptions>>()
            .Get(IdentityConstants.ApplicationScheme);
        Assert.True(cookie.SlidingExpiration);
        Assert.Equal(TimeSpan.FromMinutes(expectedMinutes), cookie.ExpireTimeSpan);
    }
}
