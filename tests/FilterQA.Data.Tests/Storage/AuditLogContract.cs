using FilterQA.Core.Sampling;
using FilterQA.Data.Entities;
using FilterQA.Data.Services;
using FilterQA.Data.Tests.Infrastructure;

namespace FilterQA.Data.Tests.Storage;

/// <summary>
/// The audit log query: filters by time range, actor, action and subject or lot text, newest first, paged in the
/// database. Every test tags its own entries with a unique actor or key, so it sees only them on a shared database.
/// </summary>
public abstract class AuditLogContract : ProviderTestBase
{
    private AuditLog Log => new(Store.Contexts);

    [StorageFact]
    public async Task Entries_come_newest_first_in_pages_that_say_whether_more_follow()
    {
        string tag = Tag();
        DateTimeOffset start = Store.Clock.GetUtcNow();
        // 7 entries one minute apart; the last two at the same instant (the later id comes first).
        for (int i = 0; i < 7; i++)
        {
            await AddAsync(tag, $"J. Lindqvist {tag}", AuditAction.TemplateRegistered, "template", $"TME-CF455-15 revision {i}", start.AddMinutes(Math.Min(i, 5)));
        }
        var query = new AuditQuery { Actor = tag, Take = 3 };

        AuditPage first = await Log.FindAsync(query);
        AuditPage second = await Log.FindAsync(query with { Skip = 3 });
        AuditPage third = await Log.FindAsync(query with { Skip = 6 });

        Assert.Equal(["TME-CF455-15 revision 6", "TME-CF455-15 revision 5", "TME-CF455-15 revision 4"], first.Entries.Select(e => e.SubjectKey));
        Assert.True(first.HasMore);
        Assert.Equal(["TME-CF455-15 revision 3", "TME-CF455-15 revision 2", "TME-CF455-15 revision 1"], second.Entries.Select(e => e.SubjectKey));
        Assert.True(second.HasMore);
        Assert.Equal(["TME-CF455-15 revision 0"], third.Entries.Select(e => e.SubjectKey));
        Assert.False(third.HasMore);
        Assert.Equal(start.AddMinutes(5), first.Entries[0].At);
    }

    [StorageFact]
    public async Task Time_range_is_from_inclusive_to_exclusive()
    {
        string tag = Tag();
        DateTimeOffset t0 = Store.Clock.GetUtcNow();
        for (int i = 0; i < 4; i++)
        {
            await AddAsync(tag, "R. Haldane", AuditAction.ThruRecorded, "station", $"IQC-{i}", t0.AddHours(i));
        }
        AuditPage page = await Log.FindAsync(new AuditQuery { Actor = tag, From = t0.AddHours(1), To = t0.AddHours(3) });
        Assert.Equal(["IQC-2", "IQC-1"], page.Entries.Select(e => e.SubjectKey));
    }

    [StorageFact]
    public async Task Actor_text_matches_the_name_or_the_account_id_in_any_letter_case()
    {
        string tag = Tag();
        DateTimeOffset at = Store.Clock.GetUtcNow();
        await AddAsync("u-" + tag, "S. Petrova", AuditAction.LotDispositioned, "lot", "QQ-2611-0019", at);
        await AddAsync("u-other-" + Tag(), "M. Okafor " + tag, AuditAction.LotHeld, "lot", "QQ-2611-0020", at.AddSeconds(1));
        await AddAsync("u-third-" + Tag(), "R. Haldane", AuditAction.LotHeld, "lot", "QQ-2611-0021", at.AddSeconds(2));

        AuditPage byId = await Log.FindAsync(new AuditQuery { Actor = tag.ToUpperInvariant() });
        Assert.Equal(["QQ-2611-0020", "QQ-2611-0019"], byId.Entries.Select(e => e.SubjectKey));
    }

    [StorageFact]
    public async Task Action_filter_keeps_one_action()
    {
        string tag = Tag();
        DateTimeOffset at = Store.Clock.GetUtcNow();
        await AddAsync(tag, "S. Petrova", AuditAction.LotHeld, "lot", "VP-1", at);
        await AddAsync(tag, "S. Petrova", AuditAction.LotHoldReleased, "lot", "VP-2", at.AddSeconds(1));
        await AddAsync(tag, "S. Petrova", AuditAction.LotHeld, "lot", "VP-3", at.AddSeconds(2));

        AuditPage page = await Log.FindAsync(new AuditQuery { Actor = tag, Action = AuditAction.LotHeld });
        Assert.Equal(["VP-3", "VP-1"], page.Entries.Select(e => e.SubjectKey));
        Assert.All(page.Entries, e => Assert.Equal(AuditAction.LotHeld, e.Action));
    }

    [StorageFact]
    public async Task Subject_text_matches_the_key_the_kind_or_the_lot_the_entry_belongs_to()
    {
        PreparedLot prepared = await Store.PrepareLotAsync(PlanRequest.FullInspection(), quantity: 5);
        string tag = Tag();
        DateTimeOffset at = Store.Clock.GetUtcNow().AddMinutes(1);
        // An entry about a unit of the lot: its key is the serial, the lot only through LotId.
        await AddAsync(tag, "R. Haldane", AuditAction.UnitRetested, "unit", "S0007", at, prepared.Lot.Id);
        await AddAsync(tag, "R. Haldane", AuditAction.StationRegistered, "station", "IQC-9", at.AddSeconds(1));

        AuditPage byLot = await Log.FindAsync(new AuditQuery { Subject = prepared.LotNumber.ToLowerInvariant() });
        // The lot's own creation entry (written by the lot service) and the unit entry tied to it.
        Assert.Equal([AuditAction.UnitRetested, AuditAction.LotCreated], byLot.Entries.Select(e => e.Action));
        Assert.All(byLot.Entries, e => Assert.Equal(prepared.LotNumber, e.LotNumber));

        AuditPage byKind = await Log.FindAsync(new AuditQuery { Actor = tag, Subject = "STATION" });
        Assert.Equal(["IQC-9"], byKind.Entries.Select(e => e.SubjectKey));
        Assert.Null(byKind.Entries[0].LotNumber);
    }

    [StorageFact]
    public async Task Filters_combine()
    {
        string tag = Tag();
        DateTimeOffset at = Store.Clock.GetUtcNow();
        await AddAsync(tag, "S. Petrova", AuditAction.LotHeld, "lot", "OA-2611-0108", at);
        await AddAsync(tag, "S. Petrova", AuditAction.LotHeld, "lot", "VP-2611-0043", at.AddMinutes(1));
        await AddAsync(tag, "S. Petrova", AuditAction.LotDispositioned, "lot", "OA-2611-0108", at.AddMinutes(2));
        await AddAsync(tag, "S. Petrova", AuditAction.LotHeld, "lot", "OA-2611-0108", at.AddMinutes(10));

        AuditPage page = await Log.FindAsync(new AuditQuery { Actor = tag, Action = AuditAction.LotHeld, Subject = "OA-2611", To = at.AddMinutes(5) });
        AuditRow only = Assert.Single(page.Entries);
        Assert.Equal((at, "OA-2611-0108"), (only.At, only.SubjectKey));
    }

    [StorageFact]
    public async Task Bad_queries_are_refused_with_what_was_wrong()
    {
        (string What, AuditQuery Query, string Phrase)[] cases =
        [
            ("negative skip", new AuditQuery { Skip = -1 }, "0 or more"),
            ("empty page", new AuditQuery { Take = 0 }, "1 to 500"),
            ("page too large", new AuditQuery { Take = 501 }, "1 to 500"),
            ("range backwards", new AuditQuery { From = Store.Clock.GetUtcNow(), To = Store.Clock.GetUtcNow().AddDays(-1) }, "start must be before the end"),
        ];
        foreach ((string what, AuditQuery query, string phrase) in cases)
        {
            var e = await Assert.ThrowsAsync<ArgumentException>(() => Log.FindAsync(query));
            Assert.True(e.Message.Contains(phrase, StringComparison.Ordinal), $"{what}: {e.Message}");
        }
    }

    private static string Tag() => "t" + Guid.NewGuid().ToString("N")[..10];

    private async Task AddAsync(string actorId, string actorName, AuditAction action, string subject, string key, DateTimeOffset at, long? lotId = null)
    {
        await using FilterQaDbContext context = Store.NewContext();
        context.AuditEntries.Add(new AuditEntry
        {
            At = at,
            ActorId = actorId,
            ActorName = actorName,
            Action = action,
            Subject = subject,
            SubjectKey = key,
            LotId = lotId,
            Detail = "test entry",
        });
        await context.SaveChangesAsync();
    }
}
