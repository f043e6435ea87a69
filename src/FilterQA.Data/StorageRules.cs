using FilterQA.Core.Templates;
using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.ChangeTracking;

namespace FilterQA.Data;

/// <summary>
/// The rules SaveChanges enforces before anything reaches the database, so that no screen or
/// service can break them by accident. The database triggers enforce the same rules for SQL that
/// bypasses the change tracker.
/// </summary>
internal static class StorageRules
{
    private static readonly HashSet<string> WithdrawalProperties =
        [nameof(TemplateRevisionRecord.Status), nameof(TemplateRevisionRecord.WithdrawnAt), nameof(TemplateRevisionRecord.WithdrawnBy)];

    internal static void Check(ChangeTracker tracker)
    {
        foreach (EntityEntry entry in tracker.Entries())
        {
            switch (entry.Entity)
            {
                case IAppendOnly when entry.State is EntityState.Modified or EntityState.Deleted:
                    throw new StorageRuleException(
                        $"{entry.Metadata.GetTableName()} row {Key(entry)} is append-only: it cannot be {(entry.State == EntityState.Deleted ? "deleted" : "edited")}; store a new record that supersedes it");
                case TemplateRevisionRecord revision:
                    CheckRevision(entry, revision);
                    break;
                case LotRecord lot when entry.State == EntityState.Modified:
                    CheckLot(entry, lot);
                    break;
            }
        }
    }

    private static void CheckRevision(EntityEntry entry, TemplateRevisionRecord revision)
    {
        if (entry.State is not (EntityState.Modified or EntityState.Deleted))
        {
            return;
        }
        var original = (TemplateStatus)entry.Property(nameof(TemplateRevisionRecord.Status)).OriginalValue!;
        if (original == TemplateStatus.Draft)
        {
            return;
        }
        string name = $"template revision {revision.Revision} (id {revision.Id})";
        if (entry.State == EntityState.Deleted)
        {
            throw new StorageRuleException($"{name} is {original}; a released template revision cannot be deleted");
        }
        string[] changed = entry.Properties.Where(p => p.IsModified).Select(p => p.Metadata.Name)
            .Concat(entry.ComplexProperties.SelectMany(c => c.Properties).Where(p => p.IsModified).Select(p => p.Metadata.Name))
            .ToArray();
        string[] forbidden = changed.Where(p => !WithdrawalProperties.Contains(p)).ToArray();
        if (forbidden.Length > 0)
        {
            throw new StorageRuleException($"{name} is {original}; its {string.Join(", ", forbidden)} cannot change (release a new revision instead)");
        }
        if (changed.Contains(nameof(TemplateRevisionRecord.Status))
            && !(original == TemplateStatus.Released && revision.Status == TemplateStatus.Withdrawn))
        {
            throw new StorageRuleException($"{name} is {original}; the only status change allowed is Released → Withdrawn, not → {revision.Status}");
        }
    }

    private static void CheckLot(EntityEntry entry, LotRecord lot)
    {
        PropertyEntry templateRevision = entry.Property(nameof(LotRecord.TemplateRevisionId));
        if (!templateRevision.IsModified || Equals(templateRevision.OriginalValue, templateRevision.CurrentValue))
        {
            return;
        }
        int tested = (int)entry.ComplexProperty(nameof(LotRecord.Counters)).Property(nameof(LotCounters.UnitsTested)).OriginalValue!;
        if (tested > 0)
        {
            throw new StorageRuleException(
                $"lot {lot.LotNumber}: the template revision is fixed once the first unit is tested ({tested} tested)");
        }
    }

    private static string Key(EntityEntry entry) =>
        string.Join("/", entry.Metadata.FindPrimaryKey()!.Properties.Select(p => entry.Property(p.Name).OriginalValue));
}
