using FilterQA.Core.Statistics;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Text;
using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Services;

/// <summary>Parts, their limit-template revisions and retest policies.</summary>
public sealed partial class TemplateCatalog(IDbContextFactory<FilterQaDbContext> contexts, TimeProvider clock)
{
    /// <summary>
    /// Stores a draft or released template revision (and its part, the first time). Registering
    /// the same text again returns the stored revision; a draft may be replaced by a new draft text;
    /// a released revision never changes. Registering a released template is audited as a release.
    /// </summary>
    public async Task<TemplateRevisionInfo> RegisterAsync(LimitTemplate template, Actor actor, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(template);
        ArgumentNullException.ThrowIfNull(actor);
        if (template.Status == TemplateStatus.Withdrawn)
        {
            throw new ArgumentException($"{template.PartNumber} revision {template.Revision} is withdrawn; register a draft or a released revision", nameof(template));
        }
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        await using var transaction = await context.Database.BeginTransactionAsync(cancellationToken).ConfigureAwait(false);
        DateTimeOffset now = clock.GetUtcNow();
        PartRecord? part = await context.Parts.SingleOrDefaultAsync(p => p.PartNumber == template.PartNumber, cancellationToken).ConfigureAwait(false);
        if (part is null)
        {
            part = new PartRecord
            {
                PartNumber = template.PartNumber,
                Description = template.Description,
                DeviceKind = template.Device.ToString(),
                CreatedAt = now,
            };
            context.Parts.Add(part);
            Audit.Add(context, clock, actor, AuditAction.PartRegistered, "part", part.PartNumber, $"device {part.DeviceKind}: {part.Description}");
        }
        else if (part.DeviceKind != template.Device.ToString())
        {
            throw new StorageRuleException($"part {part.PartNumber} is a {part.DeviceKind}; a template for a {template.Device} cannot be registered for it");
        }

        TemplateRevisionRecord? stored = part.Id == 0 ? null : await context.TemplateRevisions
            .SingleOrDefaultAsync(r => r.PartId == part.Id && r.Revision == template.Revision, cancellationToken).ConfigureAwait(false);
        string key = Key(template.PartNumber, template.Revision);
        if (stored is not null && stored.ContentHash == template.ContentHash)
        {
            return Info(stored, part.PartNumber);
        }
        if (stored is not null && stored.Status != TemplateStatus.Draft)
        {
            throw new StorageRuleException($"{key} is {stored.Status} with hash {stored.ContentHash}; a released revision cannot change (register revision {template.Revision + 1})");
        }
        bool released = template.Status == TemplateStatus.Released;
        if (stored is null)
        {
            stored = new TemplateRevisionRecord
            {
                Part = part,
                Revision = template.Revision,
                Text = LimitTemplateWriter.Write(template),
                ContentHash = template.ContentHash,
                RegisteredAt = now,
                RegisteredBy = actor.Name,
            };
            context.TemplateRevisions.Add(stored);
        }
        else
        {
            // Replacing a draft's text is a save like the editor's: later saves from the old version are refused.
            stored.DraftVersion++;
            stored.DraftSavedAt = now;
            stored.DraftSavedBy = actor.Name;
        }
        stored.Text = LimitTemplateWriter.Write(template);
        stored.ContentHash = template.ContentHash;
        stored.Status = template.Status;
        stored.DecisionRule = template.DecisionRule;
        stored.Author = template.Author;
        stored.ReleaseDate = template.ReleaseDate;
        if (released)
        {
            stored.ReleasedAt = now;
            stored.ReleasedBy = actor.Name;
        }
        Audit.Add(context, clock, actor, released ? AuditAction.TemplateReleased : AuditAction.TemplateRegistered, "template", key,
            $"{template.Status} {template.ContentHash}");
        await context.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        await transaction.CommitAsync(cancellationToken).ConfigureAwait(false);
        return Info(stored, part.PartNumber);
    }

    /// <summary>
    /// Releases a stored draft, in one transaction: the draft is judged again against every current reference unit of
    /// the part (as <see cref="ReferenceUnitService.CheckAsync(string, int, CancellationToken)"/> does); when there is at
    /// least one and every one is go, its text becomes the released text (author = the actor, date = today UTC), sealed
    /// by its content hash, and never changes again; the reason is stored on the revision and in the audit entry.
    /// A refused release stores nothing.
    /// </summary>
    /// <param name="partNumber">The part.</param>
    /// <param name="revision">The draft's revision.</param>
    /// <param name="reason">Why the revision is released (e.g. "loss limit per supplier data sheet rev C"); required.</param>
    /// <param name="actor">The quality engineer who releases it.</param>
    /// <param name="cancellationToken">Stops the work; nothing is stored.</param>
    /// <exception cref="ReleaseRefusedException">No reason, no reference units, or a reference unit fails the draft;
    /// <see cref="ReleaseRefusedException.Check"/> names the failing units and their failing rules.</exception>
    /// <exception cref="RecordNotFoundException">The revision is not registered.</exception>
    /// <exception cref="StorageRuleException">The revision is not a draft.</exception>
    public async Task<TemplateRevisionInfo> ReleaseAsync(string partNumber, int revision, string reason, Actor actor, CancellationToken cancellationToken = default)
        => await ReleaseAsync(partNumber, revision, reason, expectedContentHash: null, actor, cancellationToken).ConfigureAwait(false);

    /// <summary>
    /// Releases the draft only if its stored text still has <paramref name="expectedContentHash"/> (the hash of the
    /// text the engineer saw checked): a draft saved by someone else in between is refused, not released unseen.
    /// A null hash releases whatever the draft holds now.
    /// </summary>
    /// <exception cref="ReleaseRefusedException">No reason, the draft changed since it was shown, or the reference-unit check failed.</exception>
    public async Task<TemplateRevisionInfo> ReleaseAsync(string partNumber, int revision, string reason, string? expectedContentHash, Actor actor,
        CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(actor);
        if (string.IsNullOrWhiteSpace(reason))
        {
            throw new ReleaseRefusedException($"{Key(partNumber, revision)} is not released: a release needs a reason");
        }
        reason = reason.Trim();
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        await using var transaction = await context.Database.BeginTransactionAsync(cancellationToken).ConfigureAwait(false);
        TemplateRevisionRecord stored = await FindAsync(context, partNumber, revision, cancellationToken).ConfigureAwait(false);
        if (stored.Status != TemplateStatus.Draft)
        {
            throw new StorageRuleException($"{Key(partNumber, revision)} is {stored.Status}; only a draft can be released");
        }
        if (expectedContentHash is not null && !string.Equals(expectedContentHash, stored.ContentHash, StringComparison.Ordinal))
        {
            string by = stored.DraftSavedBy ?? stored.RegisteredBy;
            throw new ReleaseRefusedException($"{Key(partNumber, revision)} is not released: the draft was changed by {by} after it was checked "
                + $"(checked hash {expectedContentHash}, stored hash {stored.ContentHash}); check it again before releasing");
        }
        LimitTemplate draft = Parse(stored, partNumber);
        ReferenceCheck check = await ReferenceChecker.CheckAsync(context, stored.PartId, draft, cancellationToken).ConfigureAwait(false);
        if (!check.Passed)
        {
            throw new ReleaseRefusedException($"{Key(partNumber, revision)} is not released: {check.Summary}", check);
        }
        DateTimeOffset now = clock.GetUtcNow();
        LimitTemplate released = draft.Release(actor.Name, DateOnly.FromDateTime(now.UtcDateTime));
        stored.Text = LimitTemplateWriter.Write(released);
        stored.ContentHash = released.ContentHash;
        stored.Status = TemplateStatus.Released;
        stored.Author = released.Author;
        stored.ReleaseDate = released.ReleaseDate;
        stored.ReleasedAt = now;
        stored.ReleasedBy = actor.Name;
        stored.ReleaseReason = reason;
        Audit.Add(context, clock, actor, AuditAction.TemplateReleased, "template", Key(partNumber, revision),
            $"Released {released.ContentHash}; {check.Summary}", reason: reason);
        await context.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        await transaction.CommitAsync(cancellationToken).ConfigureAwait(false);
        return Info(stored, partNumber);
    }

    /// <summary>Withdraws a released revision (no new lot may use it); its released text and hash stay as they were.</summary>
    public async Task<TemplateRevisionInfo> WithdrawAsync(string partNumber, int revision, string reason, Actor actor, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(actor);
        ArgumentException.ThrowIfNullOrWhiteSpace(reason);
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        TemplateRevisionRecord stored = await FindAsync(context, partNumber, revision, cancellationToken).ConfigureAwait(false);
        if (stored.Status != TemplateStatus.Released)
        {
            throw new StorageRuleException($"{Key(partNumber, revision)} is {stored.Status}; only a released revision can be withdrawn");
        }
        stored.Status = TemplateStatus.Withdrawn;
        stored.WithdrawnAt = clock.GetUtcNow();
        stored.WithdrawnBy = actor.Name;
        Audit.Add(context, clock, actor, AuditAction.TemplateWithdrawn, "template", Key(partNumber, revision), "Withdrawn", reason: reason);
        await context.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        return Info(stored, partNumber);
    }

    /// <summary>Sets how many retests a unit of the part may have and whether a retest decides the unit.</summary>
    public async Task SetRetestPolicyAsync(string partNumber, RetestPolicy policy, bool retestCounts, Actor actor, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(policy);
        ArgumentNullException.ThrowIfNull(actor);
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        PartRecord part = await context.Parts.SingleOrDefaultAsync(p => p.PartNumber == partNumber, cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException($"part {partNumber} is not registered");
        part.MaxRetests = policy.MaxRetests;
        part.RetestCounts = retestCounts;
        Audit.Add(context, clock, actor, AuditAction.RetestPolicyChanged, "part", partNumber,
            FormattableString.Invariant($"max retests {policy.MaxRetests}, retest {(retestCounts ? "decides the unit" : "is for information only")}"));
        await context.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
    }

    /// <summary>Reads a stored revision back as a template, checking that its text still hashes to the stored hash.</summary>
    public async Task<LimitTemplate> LoadAsync(string partNumber, int revision, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        TemplateRevisionRecord stored = await FindAsync(context, partNumber, revision, cancellationToken).ConfigureAwait(false);
        return Parse(stored, partNumber);
    }

    internal static LimitTemplate Parse(TemplateRevisionRecord stored, string partNumber)
    {
        TemplateReadResult read = LimitTemplateReader.Read(stored.Text);
        if (read.Template is not { } template)
        {
            throw new InvalidDataException($"{Key(partNumber, stored.Revision)}: the stored text does not read back: "
                + string.Join("; ", read.Problems.Select(p => p.ToString())));
        }
        if (template.ContentHash != stored.ContentHash)
        {
            throw new InvalidDataException($"{Key(partNumber, stored.Revision)}: the stored text hashes to {template.ContentHash}, not the stored {stored.ContentHash}");
        }
        return template;
    }

    private static async Task<TemplateRevisionRecord> FindAsync(FilterQaDbContext context, string partNumber, int revision, CancellationToken cancellationToken) =>
        await context.TemplateRevisions.SingleOrDefaultAsync(r => r.Part!.PartNumber == partNumber && r.Revision == revision, cancellationToken).ConfigureAwait(false)
        ?? throw new RecordNotFoundException($"{Key(partNumber, revision)} is not registered");

    internal static string Key(string partNumber, int revision) => FormattableString.Invariant($"{partNumber} revision {revision}");

    private static TemplateRevisionInfo Info(TemplateRevisionRecord r, string partNumber) =>
        new(r.Id, partNumber, r.Revision, r.Status, r.ContentHash, r.Author, r.ReleaseDate, r.ReleasedBy, r.ReleasedAt, r.ReleaseReason);
}
