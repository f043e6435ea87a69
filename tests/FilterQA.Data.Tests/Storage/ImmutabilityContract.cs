using System.Data.Common;
using FilterQA.Core.Decisions;
using FilterQA.Core.Statistics;
using FilterQA.Core.Templates;
using FilterQA.Data.Entities;
using FilterQA.Data.Services;
using FilterQA.Data.Tests.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Tests.Storage;

/// <summary>
/// A measurement and its verdict are never edited, only superseded; a released template revision
/// never changes; a lot's template revision is fixed once testing begins. Checked at both gates:
/// SaveChanges, and the database triggers for SQL that bypasses the context.
/// </summary>
public abstract class ImmutabilityContract : ProviderTestBase
{
    [StorageFact]
    public async Task Editing_a_stored_measurement_throws_and_changes_nothing()
    {
        PreparedLot prepared = await Store.PrepareLotAsync(PlanRequest.FullInspection());
        StoredMeasurement stored = await Store.Measurements.StoreAsync(
            Samples.Measurement(prepared.LotNumber, "S-0001", prepared.Template, UnitVerdict.NoGo, prepared.Station, Store.Clock.GetUtcNow(), 1, "loss"));

        await using (FilterQaDbContext context = Store.NewContext())
        {
            MeasurementRecord measurement = await context.Measurements.SingleAsync(m => m.Id == stored.MeasurementId);
            measurement.Verdict = UnitVerdict.Go;
            var problem = await Assert.ThrowsAsync<StorageRuleException>(() => context.SaveChangesAsync());
            Assert.Contains("append-only", problem.Message, StringComparison.Ordinal);
        }
        await using (FilterQaDbContext context = Store.NewContext())
        {
            MeasurementRecord measurement = await context.Measurements.SingleAsync(m => m.Id == stored.MeasurementId);
            measurement.Sweep.RawSha256 = new string('0', 64);
            await Assert.ThrowsAsync<StorageRuleException>(() => context.SaveChangesAsync());
        }
        await using (FilterQaDbContext context = Store.NewContext())
        {
            Assert.Equal(UnitVerdict.NoGo, (await context.Measurements.SingleAsync(m => m.Id == stored.MeasurementId)).Verdict);
        }
    }

    [StorageFact]
    public async Task Deleting_a_rule_result_an_audit_entry_or_a_measurement_throws()
    {
        PreparedLot prepared = await Store.PrepareLotAsync(PlanRequest.FullInspection());
        StoredMeasurement stored = await Store.Measurements.StoreAsync(
            Samples.Measurement(prepared.LotNumber, "S-0001", prepared.Template, UnitVerdict.Go, prepared.Station, Store.Clock.GetUtcNow()));

        await using FilterQaDbContext context = Store.NewContext();
        context.RuleResults.Remove(await context.RuleResults.FirstAsync(r => r.MeasurementId == stored.MeasurementId));
        await Assert.ThrowsAsync<StorageRuleException>(() => context.SaveChangesAsync());
        context.ChangeTracker.Clear();
        context.AuditEntries.Remove(await context.AuditEntries.FirstAsync(a => a.LotId == prepared.Lot.Id));
        await Assert.ThrowsAsync<StorageRuleException>(() => context.SaveChangesAsync());
        context.ChangeTracker.Clear();
        context.Measurements.Remove(await context.Measurements.SingleAsync(m => m.Id == stored.MeasurementId));
        await Assert.ThrowsAsync<StorageRuleException>(() => context.SaveChangesAsync());
    }

    [StorageFact]
    public async Task The_database_refuses_updates_and_deletes_that_bypass_the_context()
    {
        PreparedLot prepared = await Store.PrepareLotAsync(PlanRequest.FullInspection());
        StoredMeasurement stored = await Store.Measurements.StoreAsync(
            Samples.Measurement(prepared.LotNumber, "S-0001", prepared.Template, UnitVerdict.NoGo, prepared.Station, Store.Clock.GetUtcNow(), 0, "loss"));
        long id = stored.MeasurementId;

        await using FilterQaDbContext context = Store.NewContext();
        await Assert.ThrowsAnyAsync<DbException>(() =>
            context.Measurements.Where(m => m.Id == id).ExecuteUpdateAsync(s => s.SetProperty(m => m.Verdict, UnitVerdict.Go)));
        await Assert.ThrowsAnyAsync<DbException>(() => context.Measurements.Where(m => m.Id == id).ExecuteDeleteAsync());
        await Assert.ThrowsAnyAsync<DbException>(() =>
            context.RuleResults.Where(r => r.MeasurementId == id).ExecuteUpdateAsync(s => s.SetProperty(r => r.Outcome, RuleOutcome.Pass)));
        await Assert.ThrowsAnyAsync<DbException>(() => context.RuleResults.Where(r => r.MeasurementId == id).ExecuteDeleteAsync());
        await Assert.ThrowsAnyAsync<DbException>(() =>
            context.AuditEntries.Where(a => a.LotId == prepared.Lot.Id).ExecuteUpdateAsync(s => s.SetProperty(a => a.ActorName, "someone else")));
        await Assert.ThrowsAnyAsync<DbException>(() => context.AuditEntries.Where(a => a.LotId == prepared.Lot.Id).ExecuteDeleteAsync());

        MeasurementRecord kept = await context.Measurements.AsNoTracking().Include(m => m.Rules).SingleAsync(m => m.Id == id);
        Assert.Equal(UnitVerdict.NoGo, kept.Verdict);
        Assert.Equal(prepared.Template.Rules.Count, kept.Rules.Count);
        Assert.Equal(RuleOutcome.Fail, kept.Rules.Single(r => r.RuleId == "loss").Outcome);
    }

    [StorageFact]
    public async Task A_retest_supersedes_the_first_attempt_which_stays_as_stored()
    {
        PreparedLot prepared = await Store.PrepareLotAsync(PlanRequest.FullInspection(), retests: new RetestPolicy(1), retestCounts: true);
        DateTimeOffset first = Store.Clock.GetUtcNow();
        StoredMeasurement attempt1 = await Store.Measurements.StoreAsync(
            Samples.Measurement(prepared.LotNumber, "S-0007", prepared.Template, UnitVerdict.NoGo, prepared.Station, first, 3, "loss"));
        Store.Clock.Advance(TimeSpan.FromMinutes(5));
        StoredMeasurement attempt2 = await Store.Measurements.StoreAsync(
            Samples.Measurement(prepared.LotNumber, "S-0007", prepared.Template, UnitVerdict.Go, prepared.Station, Store.Clock.GetUtcNow(), 4)
            with { RetestReason = "fixture contact re-seated" });

        Assert.Equal(1, attempt1.Attempt);
        Assert.Null(attempt1.SupersedesMeasurementId);
        Assert.Equal(2, attempt2.Attempt);
        Assert.Equal(attempt1.MeasurementId, attempt2.SupersedesMeasurementId);
        Assert.Equal(attempt1.UnitId, attempt2.UnitId);

        await using FilterQaDbContext context = Store.NewContext();
        MeasurementRecord original = await context.Measurements.AsNoTracking().Include(m => m.Rules).SingleAsync(m => m.Id == attempt1.MeasurementId);
        Assert.Equal(UnitVerdict.NoGo, original.Verdict);
        Assert.Equal(first, original.MeasuredAt);
        Assert.Equal(RuleOutcome.Fail, original.Rules.Single(r => r.RuleId == "loss").Outcome);
        UnitRecord unit = await context.Units.AsNoTracking().SingleAsync(u => u.Id == attempt1.UnitId);
        Assert.Equal(attempt2.MeasurementId, unit.LatestMeasurementId);
        Assert.Equal(attempt2.MeasurementId, unit.CountedMeasurementId);
        Assert.Equal((UnitVerdict.NoGo, UnitVerdict.Go, UnitVerdict.Go, 2), (unit.FirstVerdict, unit.LatestVerdict, unit.CountedVerdict, unit.Attempts));
        AuditEntry retest = await context.AuditEntries.AsNoTracking().SingleAsync(a => a.LotId == prepared.Lot.Id && a.Action == AuditAction.UnitRetested);
        Assert.Equal("fixture contact re-seated", retest.Reason);

        // One unit: counted Go after the retest, not a first-pass Go, retested once, two measurements.
        LotSummary summary = attempt2.Lot;
        Assert.Equal((1, 1, 0, 0, 1, 2), (summary.UnitsTested, summary.Go, summary.NoGo, summary.FirstPassGo, summary.UnitsRetested, summary.Measurements));
    }

    [StorageFact]
    public async Task The_template_revision_of_a_lot_is_fixed_once_the_first_unit_is_tested()
    {
        PreparedLot prepared = await Store.PrepareLotAsync(PlanRequest.FullInspection());
        LimitTemplate revision2 = Samples.Released(prepared.PartNumber, 2);
        TemplateRevisionInfo stored2 = await Store.Catalog.RegisterAsync(revision2, Samples.Engineer);

        // Before testing the revision may change (audited) ...
        LotSummary moved = await Store.Lots.ChangeTemplateRevisionAsync(prepared.LotNumber, 2, Samples.Engineer);
        Assert.Equal(2, moved.TemplateRevision);
        LotSummary back = await Store.Lots.ChangeTemplateRevisionAsync(prepared.LotNumber, 1, Samples.Engineer);
        Assert.Equal(1, back.TemplateRevision);

        await Store.Measurements.StoreAsync(
            Samples.Measurement(prepared.LotNumber, "S-0001", prepared.Template, UnitVerdict.Go, prepared.Station, Store.Clock.GetUtcNow()));

        // ... after the first unit it may not: not by the service, not through the context, not by SQL.
        await Assert.ThrowsAsync<StorageRuleException>(() => Store.Lots.ChangeTemplateRevisionAsync(prepared.LotNumber, 2, Samples.Engineer));
        await using FilterQaDbContext context = Store.NewContext();
        LotRecord lot = await context.Lots.SingleAsync(l => l.LotNumber == prepared.LotNumber);
        lot.TemplateRevisionId = stored2.Id;
        await Assert.ThrowsAsync<StorageRuleException>(() => context.SaveChangesAsync());
        context.ChangeTracker.Clear();
        await Assert.ThrowsAnyAsync<DbException>(() => context.Lots.Where(l => l.LotNumber == prepared.LotNumber)
            .ExecuteUpdateAsync(s => s.SetProperty(l => l.TemplateRevisionId, stored2.Id)));
        Assert.Equal(1, (await Store.Lots.GetSummaryAsync(prepared.LotNumber)).TemplateRevision);
        Assert.Equal(2, await context.AuditEntries.CountAsync(a => a.LotId == lot.Id && a.Action == AuditAction.LotTemplateChanged));
    }

    [StorageFact]
    public async Task A_released_revision_cannot_change_but_can_be_withdrawn()
    {
        LimitTemplate released = Samples.Released(Samples.UniquePart());
        TemplateRevisionInfo stored = await Store.Catalog.RegisterAsync(released, Samples.Engineer);
        Assert.Equal(TemplateStatus.Released, stored.Status);

        // The same text again is the same revision; another text under the same number is refused.
        Assert.Equal(stored.Id, (await Store.Catalog.RegisterAsync(released, Samples.Engineer)).Id);
        LimitTemplate other = LimitTemplate.Create(released.PartNumber, 1, "changed description", released.Device, released.NominalHz,
            TemplateStatus.Released, released.Author, released.ReleaseDate, released.Sweep, released.DecisionRule, released.Rules);
        await Assert.ThrowsAsync<StorageRuleException>(() => Store.Catalog.RegisterAsync(other, Samples.Engineer));

        await using (FilterQaDbContext context = Store.NewContext())
        {
            TemplateRevisionRecord row = await context.TemplateRevisions.SingleAsync(r => r.Id == stored.Id);
            row.Text += "\n# edited";
            await Assert.ThrowsAsync<StorageRuleException>(() => context.SaveChangesAsync());
            context.ChangeTracker.Clear();
            row = await context.TemplateRevisions.SingleAsync(r => r.Id == stored.Id);
            row.Status = TemplateStatus.Draft;
            await Assert.ThrowsAsync<StorageRuleException>(() => context.SaveChangesAsync());
            context.ChangeTracker.Clear();
            context.TemplateRevisions.Remove(await context.TemplateRevisions.SingleAsync(r => r.Id == stored.Id));
            await Assert.ThrowsAsync<StorageRuleException>(() => context.SaveChangesAsync());
            context.ChangeTracker.Clear();
            await Assert.ThrowsAnyAsync<DbException>(() => context.TemplateRevisions.Where(r => r.Id == stored.Id)
                .ExecuteUpdateAsync(s => s.SetProperty(r => r.ContentHash, "sha256:0")));
            await Assert.ThrowsAnyAsync<DbException>(() => context.TemplateRevisions.Where(r => r.Id == stored.Id).ExecuteDeleteAsync());
        }

        TemplateRevisionInfo withdrawn = await Store.Catalog.WithdrawAsync(released.PartNumber, 1, "superseded by revision 2", Samples.Engineer);
        Assert.Equal(TemplateStatus.Withdrawn, withdrawn.Status);
        Assert.Equal(released.ContentHash, withdrawn.ContentHash);
        LimitTemplate loaded = await Store.Catalog.LoadAsync(released.PartNumber, 1);
        Assert.Equal(released.CanonicalText, loaded.CanonicalText);
        await Assert.ThrowsAsync<StorageRuleException>(() => Store.Lots.CreateLotAsync(
            new NewLot(Samples.UniqueLot(), released.PartNumber, 1, Samples.Supplier, 10, PlanRequest.FullInspection()), Samples.Engineer));
    }

    [StorageFact]
    public async Task A_draft_can_be_replaced_then_is_released_once_with_an_audit_entry()
    {
        // A draft is released only against reference units, which are stored measurements: revision 1 is released,
        // a lot is tested under it, and revision 2 is the draft.
        PreparedLot lot = await ReferenceLots.StoreAsync(Store, 2);
        await ReferenceLots.MarkAsync(Store, lot, "S0001");
        string part = lot.PartNumber;
        TemplateRevisionInfo draft = await Store.Catalog.RegisterAsync(Samples.Draft(part, 2), Samples.Engineer);
        TemplateRevisionInfo redrafted = await Store.Catalog.RegisterAsync(Samples.Draft(part, 2, "455 kHz ceramic IF filter, second draft"), Samples.Engineer);
        Assert.Equal(draft.Id, redrafted.Id);
        Assert.NotEqual(draft.ContentHash, redrafted.ContentHash);
        await Assert.ThrowsAsync<StorageRuleException>(() => Store.Lots.CreateLotAsync(
            new NewLot(Samples.UniqueLot(), part, 2, Samples.Supplier, 10, PlanRequest.FullInspection()), Samples.Engineer));

        TemplateRevisionInfo released = await Store.Catalog.ReleaseAsync(part, 2, "description corrected", Samples.Engineer);

        // The released text is the draft released by the engineer on the clock's date (2026-11-03 UTC).
        LimitTemplate expected = Samples.Draft(part, 2, "455 kHz ceramic IF filter, second draft").Release(Samples.Engineer.Name, new DateOnly(2026, 11, 3));
        Assert.Equal(TemplateStatus.Released, released.Status);
        Assert.Equal(expected.ContentHash, released.ContentHash);
        Assert.Equal(Store.Clock.GetUtcNow(), released.ReleasedAt);
        await Assert.ThrowsAsync<StorageRuleException>(() => Store.Catalog.ReleaseAsync(part, 2, "again", Samples.Engineer));
        await Assert.ThrowsAsync<StorageRuleException>(() => Store.Catalog.RegisterAsync(Samples.Draft(part, 2, "late change"), Samples.Engineer));

        await using FilterQaDbContext context = Store.NewContext();
        string key = $"{part} revision 2";
        AuditAction[] actions = await context.AuditEntries.AsNoTracking().Where(a => a.SubjectKey == key).OrderBy(a => a.Id).Select(a => a.Action).ToArrayAsync();
        Assert.Equal([AuditAction.TemplateRegistered, AuditAction.TemplateRegistered, AuditAction.TemplateReleased], actions);
    }
}
