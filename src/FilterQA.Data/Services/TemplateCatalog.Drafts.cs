using System.Globalization;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Text;
using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Services;

/// <summary>The catalog's reading and draft-editing side: lists for the template pages, new drafts, saves, imports.</summary>
public sealed partial class TemplateCatalog
{
    /// <summary>Every registered part with its latest released and draft revisions, by part number.</summary>
    public async Task<IReadOnlyList<PartTemplateSummary>> ListPartsAsync(CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var rows = await context.Parts.AsNoTracking().OrderBy(p => p.PartNumber)
            .Select(p => new
            {
                p.PartNumber,
                p.Description,
                p.DeviceKind,
                Released = p.Revisions.Where(r => r.Status == TemplateStatus.Released).Max(r => (int?)r.Revision),
                Draft = p.Revisions.Where(r => r.Status == TemplateStatus.Draft).Max(r => (int?)r.Revision),
                Count = p.Revisions.Count,
            })
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        return rows.Select(r => new PartTemplateSummary(r.PartNumber, r.Description, Enum.Parse<DeviceKind>(r.DeviceKind), r.Released, r.Draft, r.Count)).ToArray();
    }

    /// <summary>The part's revisions, newest first, with who registered, saved, released and withdrew each and when.</summary>
    /// <exception cref="RecordNotFoundException">The part is not registered.</exception>
    public async Task<IReadOnlyList<TemplateRevisionHistory>> RevisionHistoryAsync(string partNumber, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        long partId = await PartIdAsync(context, partNumber, cancellationToken).ConfigureAwait(false);
        var rows = await context.TemplateRevisions.AsNoTracking().Where(r => r.PartId == partId).ToListAsync(cancellationToken).ConfigureAwait(false);
        return rows.OrderByDescending(r => r.Revision)
            .Select(r => new TemplateRevisionHistory(r.Revision, r.Status, r.ContentHash, r.RegisteredAt, r.RegisteredBy, r.ReleasedAt, r.ReleasedBy,
                r.WithdrawnAt, r.WithdrawnBy, r.DraftSavedAt, r.DraftSavedBy, r.DraftVersion))
            .ToArray();
    }

    /// <summary>A stored revision's text with the draft version a save must name.</summary>
    /// <exception cref="RecordNotFoundException">The revision is not registered.</exception>
    public async Task<StoredTemplateText> LoadTextAsync(string partNumber, int revision, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        TemplateRevisionRecord stored = await FindAsync(context, partNumber, revision, cancellationToken).ConfigureAwait(false);
        return TextOf(stored, partNumber);
    }

    /// <summary>
    /// Starts a new draft from any stored revision: a copy of its rules as the next free revision number (one above the
    /// part's highest), status draft, no author or release date. Audited as a registration.
    /// </summary>
    /// <exception cref="RecordNotFoundException">The source revision is not registered.</exception>
    public async Task<StoredTemplateText> StartDraftAsync(string partNumber, int fromRevision, Actor actor, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(actor);
        int next;
        LimitTemplate source;
        await using (FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false))
        {
            TemplateRevisionRecord stored = await FindAsync(context, partNumber, fromRevision, cancellationToken).ConfigureAwait(false);
            source = Parse(stored, partNumber);
            next = await context.TemplateRevisions.Where(r => r.PartId == stored.PartId).MaxAsync(r => r.Revision, cancellationToken).ConfigureAwait(false) + 1;
        }
        LimitTemplate draft = LimitTemplate.Create(source.PartNumber, next, source.Description, source.Device, source.NominalHz, TemplateStatus.Draft,
            null, null, source.Sweep, source.DecisionRule, source.Rules);
        // A unique index on (part, revision) refuses a second draft of the same number started at the same moment.
        await RegisterAsync(draft, actor, cancellationToken).ConfigureAwait(false);
        return await LoadTextAsync(partNumber, next, cancellationToken).ConfigureAwait(false);
    }

    /// <summary>
    /// Saves a new text of a stored draft, provided nobody saved it since the editor loaded <paramref name="loadedVersion"/>.
    /// The text must read as a valid draft of the same part and revision; it is stored as the canonical text. Saving the
    /// same content again stores nothing and returns the stored version.
    /// </summary>
    /// <exception cref="TemplateTextException">The text has problems (each with its line) or is not a draft of this revision; nothing stored.</exception>
    /// <exception cref="DraftConflictException">The draft was saved by someone else after <paramref name="loadedVersion"/>; nothing stored.</exception>
    /// <exception cref="StorageRuleException">The revision is no longer a draft.</exception>
    /// <exception cref="RecordNotFoundException">The revision is not registered.</exception>
    public async Task<StoredTemplateText> SaveDraftTextAsync(string partNumber, int revision, string text, int loadedVersion, Actor actor,
        CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(actor);
        LimitTemplate template = ReadDraft(text, partNumber, revision);
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        TemplateRevisionRecord stored = await FindAsync(context, partNumber, revision, cancellationToken).ConfigureAwait(false);
        if (stored.Status != TemplateStatus.Draft)
        {
            throw new StorageRuleException($"{Key(partNumber, revision)} is {stored.Status}; only a draft can be edited (start a new draft from it)");
        }
        if (stored.DraftVersion != loadedVersion)
        {
            throw Conflict(stored, partNumber, loadedVersion);
        }
        if (stored.ContentHash == template.ContentHash)
        {
            return TextOf(stored, partNumber);
        }
        PartRecord part = await context.Parts.SingleAsync(p => p.Id == stored.PartId, cancellationToken).ConfigureAwait(false);
        if (part.DeviceKind != template.Device.ToString())
        {
            throw new TemplateTextException($"part {partNumber} is a {Words(part.DeviceKind)}; a draft of it cannot be for a {Words(template.Device.ToString())}");
        }
        DateTimeOffset now = clock.GetUtcNow();
        stored.Text = LimitTemplateWriter.Write(template);
        stored.ContentHash = template.ContentHash;
        stored.DecisionRule = template.DecisionRule;
        stored.Author = template.Author;
        stored.DraftVersion = loadedVersion + 1;
        stored.DraftSavedAt = now;
        stored.DraftSavedBy = actor.Name;
        Audit.Add(context, clock, actor, AuditAction.TemplateDraftSaved, "template", Key(partNumber, revision),
            string.Create(CultureInfo.InvariantCulture, $"Draft version {stored.DraftVersion} {template.ContentHash}"));
        try
        {
            await context.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        }
        catch (DbUpdateConcurrencyException)
        {
            // Someone saved between our read and our write: report their save, not ours.
            await using FilterQaDbContext fresh = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
            TemplateRevisionRecord now2 = await FindAsync(fresh, partNumber, revision, cancellationToken).ConfigureAwait(false);
            throw Conflict(now2, partNumber, loadedVersion);
        }
        return TextOf(stored, partNumber);
    }

    /// <summary>
    /// Registers an uploaded template file as a new draft of <paramref name="partNumber"/>, after reading it: the file
    /// must be a valid draft (status draft) of that part whose revision is not yet stored. Nothing is stored on any problem.
    /// </summary>
    /// <exception cref="TemplateTextException">Every problem with its line, or why the file cannot be a new draft here.</exception>
    public async Task<StoredTemplateText> ImportDraftAsync(string partNumber, string text, Actor actor, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(actor);
        TemplateReadResult read = LimitTemplateReader.Read(text);
        if (read.Template is not { } template)
        {
            throw new TemplateTextException(read.Problems);
        }
        if (!string.Equals(template.PartNumber, partNumber, StringComparison.Ordinal))
        {
            throw new TemplateTextException($"the file is a template of {template.PartNumber}, not of {partNumber}; import it on that part's page");
        }
        if (template.Status != TemplateStatus.Draft)
        {
            throw new TemplateTextException($"the file is a {Words(template.Status.ToString())} revision; only a draft can be imported (set 'status: draft' and remove 'release-date' and 'content-hash')");
        }
        await using (FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false))
        {
            bool taken = await context.TemplateRevisions.AnyAsync(r => r.Part!.PartNumber == partNumber && r.Revision == template.Revision, cancellationToken).ConfigureAwait(false);
            if (taken)
            {
                int highest = await context.TemplateRevisions.Where(r => r.Part!.PartNumber == partNumber).MaxAsync(r => r.Revision, cancellationToken).ConfigureAwait(false);
                throw new TemplateTextException(string.Create(CultureInfo.InvariantCulture,
                    $"revision {template.Revision} of {partNumber} is already stored; give the file revision {highest + 1} to import it as a new draft"));
            }
        }
        try
        {
            await RegisterAsync(template, actor, cancellationToken).ConfigureAwait(false);
        }
        catch (StorageRuleException refused)
        {
            throw new TemplateTextException(refused.Message);
        }
        return await LoadTextAsync(partNumber, template.Revision, cancellationToken).ConfigureAwait(false);
    }

    private static LimitTemplate ReadDraft(string text, string partNumber, int revision)
    {
        TemplateReadResult read = LimitTemplateReader.Read(text);
        if (read.Template is not { } template)
        {
            throw new TemplateTextException(read.Problems);
        }
        if (!string.Equals(template.PartNumber, partNumber, StringComparison.Ordinal) || template.Revision != revision)
        {
            throw new TemplateTextException(string.Create(CultureInfo.InvariantCulture,
                $"the text is {template.PartNumber} revision {template.Revision}; this draft is {partNumber} revision {revision} (part and revision cannot change here)"));
        }
        if (template.Status != TemplateStatus.Draft)
        {
            throw new TemplateTextException("the text must keep 'status: draft'; a draft is released on its release page, not by editing its status");
        }
        return template;
    }

    private static DraftConflictException Conflict(TemplateRevisionRecord stored, string partNumber, int loadedVersion) =>
        new(partNumber, stored.Revision, loadedVersion, stored.DraftVersion, stored.DraftSavedBy ?? stored.RegisteredBy, stored.DraftSavedAt ?? stored.RegisteredAt);

    private static StoredTemplateText TextOf(TemplateRevisionRecord r, string partNumber) =>
        new(partNumber, r.Revision, r.Status, r.Text, r.DraftVersion, r.DraftSavedAt ?? r.RegisteredAt, r.DraftSavedBy ?? r.RegisteredBy);

    private static async Task<long> PartIdAsync(FilterQaDbContext context, string partNumber, CancellationToken cancellationToken) =>
        await context.Parts.AsNoTracking().Where(p => p.PartNumber == partNumber).Select(p => (long?)p.Id)
            .SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false)
        ?? throw new RecordNotFoundException($"part {partNumber} is not registered");

    private static string Words(string enumName) => string.Concat(enumName.Select((c, i) => char.IsUpper(c) && i > 0 ? " " + char.ToLowerInvariant(c) : char.ToLowerInvariant(c).ToString()));
}
