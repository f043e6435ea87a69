using System.Security.Claims;
using Bunit;
using FilterQA.Data;
using FilterQA.Data.Accounts;
using FilterQA.Data.Entities;
using FilterQA.Web.Ui.Pages;
using FilterQA.Web.Ui.Tests.Infrastructure;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;

namespace FilterQA.Web.Ui.Tests.Components;

/// <summary>The audit page: the filters reach the query, pages of 50 newest first, and nothing on it edits.</summary>
public sealed class AuditPageTests : SeededStore
{
    private static readonly TimeSpan Wait = TimeSpan.FromSeconds(20);

    public AuditPageTests()
    {
        var auth = AddAuthorization();
        auth.SetAuthorized("S. Petrova");
        auth.SetRoles(RoleNames.Approver);
        auth.SetClaims(new Claim(ClaimTypes.NameIdentifier, "u-spetrova"));
    }

    /// <summary>The seeding's own entries (part, template, station, lot) and <paramref name="thrus"/> thru entries by R. Haldane, one a minute from 2020-01-02 06:00 UTC (before the seeding, which runs on the real clock).</summary>
    private async Task SeedWithThrusAsync(int thrus)
    {
        await SeedAsync();
        IDbContextFactory<FilterQaDbContext> contexts = Services.GetRequiredService<IDbContextFactory<FilterQaDbContext>>();
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync();
        var start = new DateTimeOffset(2020, 1, 2, 6, 0, 0, TimeSpan.Zero);
        for (int i = 0; i < thrus; i++)
        {
            context.AuditEntries.Add(new AuditEntry
            {
                At = start.AddMinutes(i),
                ActorId = "u-rhaldane",
                ActorName = "R. Haldane",
                Action = AuditAction.ThruRecorded,
                Subject = "station",
                SubjectKey = "IQC-2",
                Detail = $"thru {i}",
            });
        }
        await context.SaveChangesAsync();
    }

    [Fact]
    public async Task Entries_come_in_pages_of_fifty_newest_first_and_the_page_has_no_edit_control()
    {
        await SeedWithThrusAsync(60);
        var cut = Render<Audit>();
        cut.WaitForElement("table.audit-entries tbody tr", Wait);

        // 4 entries of the seeding (today, by the real clock) + 60 thru entries of 2020-01-02: 64, newest first.
        Assert.Equal(50, cut.FindAll("table.audit-entries tbody tr").Count);
        Assert.Contains("Entries 1 to 50, newest first; older entries follow", cut.Find("table.audit-entries caption").TextContent, StringComparison.Ordinal);
        Assert.Equal("lot registered", cut.FindAll("table.audit-entries tbody tr")[0].Children[2].TextContent);
        Assert.True(cut.Find("#a-newer").HasAttribute("disabled"));
        Assert.Empty(cut.FindAll("table.audit-entries input, table.audit-entries select, table.audit-entries button, table.audit-entries textarea"));

        cut.Find("#a-older").Click();
        cut.WaitForAssertion(() => Assert.Equal(14, cut.FindAll("table.audit-entries tbody tr").Count), Wait);
        Assert.Contains("thru 0", cut.FindAll("table.audit-entries tbody tr")[^1].TextContent, StringComparison.Ordinal);
        Assert.True(cut.Find("#a-older").HasAttribute("disabled"));
        Assert.False(cut.Find("#a-newer").HasAttribute("disabled"));
    }

    [Fact]
    public async Task The_filters_select_by_day_person_action_and_record()
    {
        await SeedWithThrusAsync(3);
        var cut = Render<Audit>();
        cut.WaitForElement("table.audit-entries tbody tr", Wait);

        cut.Find("#a-action").Change(nameof(AuditAction.LotCreated));
        cut.Find("form.audit-filters").Submit();
        cut.WaitForAssertion(() => Assert.Single(cut.FindAll("table.audit-entries tbody tr")), Wait);
        Assert.Equal(nameof(AuditAction.LotCreated), cut.Find("table.audit-entries tbody tr").GetAttribute("data-action"));
        Assert.Contains(LotNumber, cut.Find("table.audit-entries tbody tr").TextContent, StringComparison.Ordinal);

        cut.Find("#a-action").Change("");
        cut.Find("#a-actor").Change("haldane");
        cut.Find("#a-from").Change("2020-01-02");
        cut.Find("#a-to").Change("2020-01-02");
        cut.Find("form.audit-filters").Submit();
        cut.WaitForAssertion(() => Assert.Equal(3, cut.FindAll("table.audit-entries tbody tr").Count), Wait);
        Assert.All(cut.FindAll("table.audit-entries tbody tr"), r => Assert.Equal(nameof(AuditAction.ThruRecorded), r.GetAttribute("data-action")));

        cut.Find("#a-subject").Change("no such record");
        cut.Find("form.audit-filters").Submit();
        cut.WaitForAssertion(() => Assert.Equal("No entry matches.", cut.Find("table.audit-entries caption").TextContent), Wait);

        cut.Find("#a-from").Change("2020-01-03");
        cut.Find("form.audit-filters").Submit();
        cut.WaitForAssertion(() => Assert.Contains("before the start day", cut.Find("p.problem").TextContent, StringComparison.Ordinal), Wait);
    }

    [Fact]
    public void The_filter_days_are_utc_and_the_end_day_is_inclusive()
    {
        var query = Audit.Query(new DateOnly(2026, 11, 2), new DateOnly(2026, 11, 4), "  Haldane ", nameof(AuditAction.LotHeld), " ");
        Assert.Equal(new DateTimeOffset(2026, 11, 2, 0, 0, 0, TimeSpan.Zero), query.From);
        Assert.Equal(new DateTimeOffset(2026, 11, 5, 0, 0, 0, TimeSpan.Zero), query.To);
        Assert.Equal(("Haldane", (AuditAction?)AuditAction.LotHeld, (string?)null), (query.Actor, query.Action, query.Subject));
        Assert.Null(Audit.Query(null, null, null, "NotAnAction", null).Action);
    }
}
