using System.Text.RegularExpressions;
using FilterQA.Data;
using FilterQA.Data.Accounts;
using FilterQA.Data.Entities;
using FilterQA.Data.Services;
using FilterQA.Web.Tests.Infrastructure;
using Microsoft.AspNetCore.Identity;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;

namespace FilterQA.Web.Tests.Setup;

/// <summary>First start: the administrator's one-time password printed once, never again; the demo scenario loaded once.</summary>
public sealed partial class FirstStartTests
{
    [Fact]
    public async Task First_start_creates_the_administrator_prints_its_one_time_password_once_and_not_again()
    {
        using var data = new TempFolder();
        string password;
        using (var first = new WebFactory(data.Path))
        {
            _ = first.Services;
            Match printed = OneTimePassword().Match(first.Console.ToString());
            Assert.True(printed.Success, "no one-time password was printed: " + first.Console);
            password = printed.Groups[1].Value;
            await using AsyncServiceScope scope = first.Services.CreateAsyncScope();
            UserManager<FilterQaUser> users = scope.ServiceProvider.GetRequiredService<UserManager<FilterQaUser>>();
            FilterQaUser admin = (await users.FindByNameAsync("admin"))!;
            Assert.True(await users.CheckPasswordAsync(admin, password));
            Assert.True(await users.IsInRoleAsync(admin, RoleNames.Administrator));
            Assert.True(admin.MustChangePassword);
            foreach (string role in RoleNames.All)
            {
                Assert.True(await scope.ServiceProvider.GetRequiredService<RoleManager<IdentityRole>>().RoleExistsAsync(role));
            }
        }
        using (var second = new WebFactory(data.Path))
        {
            _ = second.Services;
            Assert.DoesNotContain("one-time password", second.Console.ToString(), StringComparison.Ordinal);
            await using AsyncServiceScope scope = second.Services.CreateAsyncScope();
            FilterQaDbContext context = scope.ServiceProvider.GetRequiredService<FilterQaDbContext>();
            Assert.Equal(1, await context.Users.CountAsync());
            UserManager<FilterQaUser> users = scope.ServiceProvider.GetRequiredService<UserManager<FilterQaUser>>();
            Assert.True(await users.CheckPasswordAsync((await users.FindByNameAsync("admin"))!, password));
        }
    }

    [Fact]
    public async Task Demo_seeding_loads_the_scenario_once_with_passing_failing_and_open_lots()
    {
        using var data = new TempFolder();
        var settings = new Dictionary<string, string?> { ["Demo:Seed"] = "true" };
        using (var first = new WebFactory(data.Path, settings))
        {
            _ = first.Services;
            string console = first.Console.ToString();
            Assert.Contains("R. Haldane", console, StringComparison.Ordinal);
            Assert.Contains("1004", console, StringComparison.Ordinal);
            await using AsyncServiceScope scope = first.Services.CreateAsyncScope();
            LotService lots = scope.ServiceProvider.GetRequiredService<LotService>();
            Assert.Equal(LotStatus.Accepted, (await lots.GetSummaryAsync("VP-2611-0042")).Status);
            Assert.Equal(LotStatus.Accepted, (await lots.GetSummaryAsync("OA-2611-0107")).Status);
            Assert.Equal(LotStatus.Rejected, (await lots.GetSummaryAsync("OA-2611-0108")).Status);
            Assert.Equal(LotStatus.Rejected, (await lots.GetSummaryAsync("VP-2611-0043")).Status);
            Assert.Equal(LotStatus.Rejected, (await lots.GetSummaryAsync("QQ-2611-0019")).Status);
            LotSummary open = await lots.GetSummaryAsync("QQ-2611-0020");
            Assert.Equal(LotStatus.InTest, open.Status);
            Assert.True(open.UnitsTested < open.Plan.SampleSize);

            // Each part with a lot gets two reference units from its first lot, and its released revision 1 passes them
            // (the units were judged go under that same revision at the intake), so a draft of it can be checked.
            ReferenceUnitService references = scope.ServiceProvider.GetRequiredService<ReferenceUnitService>();
            foreach (string part in new[] { "TME-CF455-15", "TME-SF70M-1M2", "TME-SF162-AIS", "TME-XR24M-18", "TME-XF21M4-15" })
            {
                IReadOnlyList<ReferenceUnitInfo> marked = await references.ListAsync(part);
                Assert.Equal(2, marked.Count);
                ReferenceCheck check = await references.CheckAsync(part, 1);
                Assert.True(check.Passed, check.Summary);
            }
            Assert.Empty(await references.ListAsync("TME-LC92-TRAP"));
        }
        using (var second = new WebFactory(data.Path, settings))
        {
            _ = second.Services;
            Assert.Equal("", second.Console.ToString().Trim());
            await using AsyncServiceScope scope = second.Services.CreateAsyncScope();
            FilterQaDbContext context = scope.ServiceProvider.GetRequiredService<FilterQaDbContext>();
            Assert.Equal(6, await context.Lots.CountAsync());
            Assert.Equal(5, await context.Users.CountAsync());
        }
    }

    [GeneratedRegex(@"one-time password: (\S+)")]
    private static partial Regex OneTimePassword();
}
