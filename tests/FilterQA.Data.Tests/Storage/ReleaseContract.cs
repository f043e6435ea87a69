using System.Data.Common;
using FilterQA.Core.Decisions;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;
using FilterQA.Core.Templates.Text;
using FilterQA.Data.Entities;
using FilterQA.Data.Services;
using FilterQA.Data.Tests.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Tests.Storage;

/// <summary>
/// Releasing a draft needs a reason and a passing check against the part's reference (known-good) units; a refused
/// release stores nothing; marking and removing reference units is audited.
/// </summary>
public abstract class ReleaseContract : ProviderTestBase
{
    private const string Reason = "rejection limits per supplier data sheet revision C";

    [StorageFact]
    public async Task A_release_without_a_reason_is_refused_and_stores_nothing()
    {
        PreparedLot lot = await ReferenceLots.StoreAsync(Store);
        await ReferenceLots.MarkAsync(Store, lot, "S0001");
        await Store.Catalog.RegisterAsync(Samples.Draft(lot.PartNumber, 2), Samples.Engineer);
        string before = await SnapshotAsync(lot.PartNumber);

        foreach (string reason in new[] { "", "   " })
        {
            var refused = await Assert.ThrowsAsync<ReleaseRefusedException>(() => Store.Catalog.ReleaseAsync(lot.PartNumber, 2, reason, Samples.Engineer));
            Assert.Contains("needs a reason", refused.Message, StringComparison.Ordinal);
            Assert.Null(refused.Check);
        }
        Assert.Equal(before, await SnapshotAsync(lot.PartNumber));
    }

    [StorageFact]
    public async Task A_release_with_no_reference_units_is_refused_and_stores_nothing()
    {
        PreparedLot lot = await ReferenceLots.StoreAsync(Store);
        await Store.Catalog.RegisterAsync(Samples.Draft(lot.PartNumber, 2), Samples.Engineer);
        string before = await SnapshotAsync(lot.PartNumber);

        var refused = await Assert.ThrowsAsync<ReleaseRefusedException>(() => Store.Catalog.ReleaseAsync(lot.PartNumber, 2, Reason, Samples.Engineer));

        Assert.Contains("no reference units", refused.Message, StringComparison.Ordinal);
        Assert.NotNull(refused.Check);
        Assert.Empty(refused.Check.Units);
        Assert.False(refused.Check.Passed);
        Assert.Equal(before, await SnapshotAsync(lot.PartNumber));
    }

    [StorageFact]
    public async Task A_draft_whose_loss_limit_is_below_the_reference_units_measured_loss_is_refused_naming_them_and_the_loss_rule()
    {
        PreparedLot lot = await ReferenceLots.StoreAsync(Store);
        await ReferenceLots.MarkAsync(Store, lot, "S0001", "S0002");
        // The demo 455 kHz filter is built with a minimum insertion loss of 4.0 dB, spread 0.3 dB, the spread's normal
        // draw cut at 4 sigma (DemoParts design note; DeterministicRandom.NextTruncatedNormal), so every good unit has
        // at least 4.0 - 4 x 0.3 = 2.8 dB; its Chebyshev passband ripple and the noise 95 dB down only add loss.
        // A limit of 2 dB is therefore broken outright by every unit: a fail, whatever the guard band.
        const double TightLimitDb = 2.0, LeastBuiltLossDb = 2.8;
        LimitTemplate tight = WithLossLimit(Samples.Draft(lot.PartNumber, 2), TightLimitDb);
        await Store.Catalog.RegisterAsync(tight, Samples.Engineer);
        string before = await SnapshotAsync(lot.PartNumber);

        var refused = await Assert.ThrowsAsync<ReleaseRefusedException>(() => Store.Catalog.ReleaseAsync(lot.PartNumber, 2, Reason, Samples.Engineer));

        Assert.NotNull(refused.Check);
        Assert.False(refused.Check.Passed);
        Assert.Equal(["S0001", "S0002"], refused.Check.Failing.Select(u => u.Serial));
        foreach (ReferenceCheckUnit unit in refused.Check.Units)
        {
            Assert.Equal(UnitVerdict.NoGo, unit.Verdict);
            Assert.Equal(lot.LotNumber, unit.LotNumber);
            RuleResult loss = Assert.Single(unit.FailingRules);
            // The limit is the draft's own 2 dB handed back, so it compares exactly.
            Assert.Equal(("loss", RuleOutcome.Fail, TightLimitDb), (loss.RuleId, loss.Outcome, loss.LimitValue));
            // 0.01 dB below the built floor allows for the float32 compact trace and the 2001-point grid missing the
            // exact loss minimum (both far smaller than 0.01 dB).
            Assert.True(loss.MeasuredValue >= LeastBuiltLossDb - 0.01, $"{unit.Serial}: measured loss {loss.MeasuredValue} dB, built at least {LeastBuiltLossDb} dB");
        }
        Assert.Contains("S0001", refused.Message, StringComparison.Ordinal);
        Assert.Contains("S0002", refused.Message, StringComparison.Ordinal);
        Assert.Contains("loss", refused.Message, StringComparison.Ordinal);
        Assert.Equal(before, await SnapshotAsync(lot.PartNumber));
    }

    [StorageFact]
    public async Task A_release_of_a_draft_changed_after_its_check_is_refused_and_stores_nothing()
    {
        PreparedLot lot = await ReferenceLots.StoreAsync(Store);
        await ReferenceLots.MarkAsync(Store, lot, "S0001");
        LimitTemplate checkedDraft = Samples.Draft(lot.PartNumber, 2);
        await Store.Catalog.RegisterAsync(checkedDraft, Samples.Engineer);
        // Someone replaces the draft's text (a looser loss limit) after the engineer's check was shown.
        await Store.Catalog.RegisterAsync(WithLossLimit(checkedDraft, 7.0), Samples.Engineer);
        string before = await SnapshotAsync(lot.PartNumber);

        var refused = await Assert.ThrowsAsync<ReleaseRefusedException>(
            () => Store.Catalog.ReleaseAsync(lot.PartNumber, 2, Reason, checkedDraft.ContentHash, Samples.Engineer));

        Assert.Contains("changed", refused.Message, StringComparison.Ordinal);
        Assert.Contains(checkedDraft.ContentHash, refused.Message, StringComparison.Ordinal);
        Assert.Equal(before, await SnapshotAsync(lot.PartNumber));
    }

    [StorageFact]
    public async Task A_draft_that_passes_every_reference_unit_is_released_with_its_reason_and_audited()
    {
        PreparedLot lot = await ReferenceLots.StoreAsync(Store);
        await ReferenceLots.MarkAsync(Store, lot, "S0001", "S0002", "S0003");
        LimitTemplate draft = Samples.Draft(lot.PartNumber, 2);
        await Store.Catalog.RegisterAsync(draft, Samples.Engineer);

        ReferenceCheck check = await Store.ReferenceUnits.CheckAsync(lot.PartNumber, 2);
        TemplateRevisionInfo released = await Store.Catalog.ReleaseAsync(lot.PartNumber, 2, Reason, Samples.Engineer);

        // Revision 2 has the rules of the released revision 1 that judged these units go at the intake.
        Assert.True(check.Passed, check.Summary);
        Assert.Equal(3, check.Units.Count);
        // The released text is the draft released by the engineer on the clock's date (2026-11-03 UTC), sealed by its hash.
        LimitTemplate expected = draft.Release(Samples.Engineer.Name, new DateOnly(2026, 11, 3));
        Assert.Equal((TemplateStatus.Released, expected.ContentHash, Reason), (released.Status, released.ContentHash, released.ReleaseReason));
        LimitTemplate loaded = await Store.Catalog.LoadAsync(lot.PartNumber, 2);
        Assert.Equal(expected.CanonicalText, loaded.CanonicalText);

        await using FilterQaDbContext context = Store.NewContext();
        TemplateRevisionRecord stored = await context.TemplateRevisions.AsNoTracking().SingleAsync(r => r.Id == released.Id);
        Assert.Equal(LimitTemplateWriter.Write(expected), stored.Text);
        Assert.Equal(Reason, stored.ReleaseReason);
        AuditEntry audit = await context.AuditEntries.AsNoTracking()
            .Where(a => a.SubjectKey == $"{lot.PartNumber} revision 2" && a.Action == AuditAction.TemplateReleased).SingleAsync();
        Assert.Equal((Reason, Samples.Engineer.Id), (audit.Reason, audit.ActorId));
        Assert.Contains(expected.ContentHash, audit.Detail, StringComparison.Ordinal);
        Assert.Contains("3 reference unit", audit.Detail, StringComparison.Ordinal);
        await Assert.ThrowsAsync<StorageRuleException>(() => Store.Catalog.ReleaseAsync(lot.PartNumber, 2, Reason, Samples.Engineer));
    }

    [StorageFact]
    public async Task The_release_reason_is_fixed_once_released_at_both_gates()
    {
        PreparedLot lot = await ReferenceLots.StoreAsync(Store);
        await ReferenceLots.MarkAsync(Store, lot, "S0001");
        await Store.Catalog.RegisterAsync(Samples.Draft(lot.PartNumber, 2), Samples.Engineer);
        TemplateRevisionInfo released = await Store.Catalog.ReleaseAsync(lot.PartNumber, 2, Reason, Samples.Engineer);

        await using (FilterQaDbContext context = Store.NewContext())
        {
            TemplateRevisionRecord stored = await context.TemplateRevisions.SingleAsync(r => r.Id == released.Id);
            stored.ReleaseReason = "another reason";
            await Assert.ThrowsAsync<StorageRuleException>(() => context.SaveChangesAsync());
        }
        await using (FilterQaDbContext context = Store.NewContext())
        {
            await Assert.ThrowsAnyAsync<DbException>(() => context.TemplateRevisions.Where(r => r.Id == released.Id)
                .ExecuteUpdateAsync(u => u.SetProperty(r => r.ReleaseReason, "another reason")));
            Assert.Equal(Reason, (await context.TemplateRevisions.AsNoTracking().SingleAsync(r => r.Id == released.Id)).ReleaseReason);
        }
    }

    [StorageFact]
    public async Task Reference_units_are_marked_and_removed_with_notes_and_audited_and_a_removed_one_no_longer_counts()
    {
        PreparedLot lot = await ReferenceLots.StoreAsync(Store);
        ReferenceUnitInfo marked = Assert.Single(await ReferenceLots.MarkAsync(Store, lot, "S0002"));
        Assert.Equal(("S0002", lot.LotNumber, UnitVerdict.Go, Samples.Engineer.Name), (marked.Serial, marked.LotNumber, marked.RecordedVerdict, marked.MarkedBy));
        Assert.Equal([marked.Id], (await Store.ReferenceUnits.ListAsync(lot.PartNumber)).Select(r => r.Id));
        Assert.Contains((await Store.ReferenceUnits.CandidatesAsync(lot.PartNumber, lot.LotNumber)), c => c.Serial == "S0002" && c.IsReference);

        await Assert.ThrowsAsync<StorageRuleException>(() => Store.ReferenceUnits.AddAsync(lot.PartNumber, marked.MeasurementId, "again", Samples.Engineer));
        await Assert.ThrowsAsync<ArgumentException>(() => Store.ReferenceUnits.RemoveAsync(lot.PartNumber, marked.Id, " ", Samples.Engineer));
        await Store.ReferenceUnits.RemoveAsync(lot.PartNumber, marked.Id, "connector found worn after the measurement", Samples.Engineer);

        Assert.Empty(await Store.ReferenceUnits.ListAsync(lot.PartNumber));
        await Store.Catalog.RegisterAsync(Samples.Draft(lot.PartNumber, 2), Samples.Engineer);
        var refused = await Assert.ThrowsAsync<ReleaseRefusedException>(() => Store.Catalog.ReleaseAsync(lot.PartNumber, 2, Reason, Samples.Engineer));
        Assert.Empty(refused.Check!.Units);
        // Marked again after the removal: the removed row stays as history beside the new one.
        await ReferenceLots.MarkAsync(Store, lot, "S0002");

        await using FilterQaDbContext context = Store.NewContext();
        string key = $"{lot.PartNumber} lot {lot.LotNumber} unit S0002 attempt 1";
        var audit = await context.AuditEntries.AsNoTracking().Where(a => a.SubjectKey == key).OrderBy(a => a.Id).Select(a => new { a.Action, a.Reason }).ToListAsync();
        Assert.Equal([AuditAction.ReferenceUnitAdded, AuditAction.ReferenceUnitRemoved, AuditAction.ReferenceUnitAdded], audit.Select(a => a.Action));
        Assert.Equal("connector found worn after the measurement", audit[1].Reason);
        Assert.Equal(2, await context.ReferenceUnits.CountAsync(r => r.MeasurementId == marked.MeasurementId));
    }

    [StorageFact]
    public async Task Only_a_go_measurement_of_the_same_part_can_be_a_reference_unit()
    {
        PreparedLot lot = await ReferenceLots.StoreAsync(Store, 4, highLoss: 3);
        PreparedLot other = await ReferenceLots.StoreAsync(Store, 1);
        IReadOnlyList<ReferenceCandidate> candidates = await Store.ReferenceUnits.CandidatesAsync(lot.PartNumber, lot.LotNumber);
        // The high-loss defect is built at 8.0 dB (DemoParts), above the 6 dB limit of revision 1: recorded no-go.
        ReferenceCandidate bad = candidates.Single(c => c.Serial == "S0003");
        Assert.Equal(UnitVerdict.NoGo, bad.Verdict);
        long otherMeasurement = (await Store.ReferenceUnits.CandidatesAsync(other.PartNumber, other.LotNumber))[0].MeasurementId;

        var notGood = await Assert.ThrowsAsync<StorageRuleException>(() => Store.ReferenceUnits.AddAsync(lot.PartNumber, bad.MeasurementId, "looks fine", Samples.Engineer));
        Assert.Contains("only a go measurement", notGood.Message, StringComparison.Ordinal);
        await Assert.ThrowsAsync<RecordNotFoundException>(() => Store.ReferenceUnits.AddAsync(lot.PartNumber, otherMeasurement, "wrong part", Samples.Engineer));
        await Assert.ThrowsAsync<RecordNotFoundException>(() => Store.ReferenceUnits.CandidatesAsync(lot.PartNumber, other.LotNumber));
        Assert.Empty(await Store.ReferenceUnits.ListAsync(lot.PartNumber));
    }

    private static LimitTemplate WithLossLimit(LimitTemplate template, double maximumDb) =>
        LimitTemplate.Create(template.PartNumber, template.Revision, template.Description, template.Device, template.NominalHz, template.Status,
            template.Author, template.ReleaseDate, template.Sweep, template.DecisionRule,
            template.Rules.Select(r => r is InsertionLossRule loss
                ? new InsertionLossRule(loss.Id, loss.Title, maximumDb, loss.Measure, loss.At, loss.Uncertainty)
                : r).ToArray());

    /// <summary>Everything a release could change for the part: its revisions' state and text, its audit entries.</summary>
    private async Task<string> SnapshotAsync(string partNumber)
    {
        await using FilterQaDbContext context = Store.NewContext();
        var revisions = await context.TemplateRevisions.AsNoTracking().Where(r => r.Part!.PartNumber == partNumber).OrderBy(r => r.Revision)
            .Select(r => new { r.Revision, r.Status, r.ContentHash, r.Text, r.ReleaseReason, r.ReleasedBy }).ToListAsync();
        int audit = await context.AuditEntries.CountAsync();
        return string.Join("\n", revisions.Select(r => $"{r.Revision} {r.Status} {r.ContentHash} {r.ReleaseReason} {r.ReleasedBy} {r.Text.Length}")) + $"\naudit {audit}";
    }
}
