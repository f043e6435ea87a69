using System.Globalization;
using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Services;

/// <summary>
/// Reads the append-only audit log a page at a time, newest first, filtered in the database (the table is never
/// read whole). Read-only: the log is written only by the services whose changes it records.
/// </summary>
public sealed class AuditLog(IDbContextFactory<FilterQaDbContext> contexts)
{
    /// <summary>The page of entries matching <paramref name="query"/>, newest first (ties: the later entry first).</summary>
    /// <exception cref="ArgumentException">Skip below 0, Take outside 1..<see cref="AuditQuery.MaxTake"/>, or From not before To.</exception>
    public async Task<AuditPage> FindAsync(AuditQuery query, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(query);
        if (query.Skip < 0)
        {
            throw new ArgumentException(Invariant($"skip is {query.Skip}; it must be 0 or more"), nameof(query));
        }
        if (query.Take is < 1 or > AuditQuery.MaxTake)
        {
            throw new ArgumentException(Invariant($"a page holds 1 to {AuditQuery.MaxTake} entries; {query.Take} were asked for"), nameof(query));
        }
        if (query.From is { } from && query.To is { } to && from >= to)
        {
            throw new ArgumentException(Invariant($"the time range starts at {from:u} and ends at {to:u}; the start must be before the end"), nameof(query));
        }

        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var rows = from a in context.AuditEntries.AsNoTracking()
                   join l in context.Lots.AsNoTracking() on a.LotId equals (long?)l.Id into lots
                   from lot in lots.DefaultIfEmpty()
                   select new { Entry = a, LotNumber = lot == null ? null : lot.LotNumber };
        if (query.From is { } start)
        {
            rows = rows.Where(r => r.Entry.At >= start);
        }
        if (query.To is { } end)
        {
            rows = rows.Where(r => r.Entry.At < end);
        }
        if (query.Action is { } action)
        {
            rows = rows.Where(r => r.Entry.Action == action);
        }
        if (Text(query.Actor) is { } actor)
        {
            rows = rows.Where(r => r.Entry.ActorName.ToLower().Contains(actor) || r.Entry.ActorId.ToLower().Contains(actor));
        }
        if (Text(query.Subject) is { } subject)
        {
            rows = rows.Where(r => r.Entry.Subject.ToLower().Contains(subject) || r.Entry.SubjectKey.ToLower().Contains(subject)
                || (r.LotNumber != null && r.LotNumber.ToLower().Contains(subject)));
        }
        // One row beyond the page says whether another page follows, without counting the whole table.
        var page = await rows.OrderByDescending(r => r.Entry.At).ThenByDescending(r => r.Entry.Id)
            .Skip(query.Skip).Take(query.Take + 1)
            .Select(r => new AuditRow(r.Entry.Id, r.Entry.At, r.Entry.ActorId, r.Entry.ActorName, r.Entry.Action, r.Entry.Subject, r.Entry.SubjectKey,
                r.LotNumber, r.Entry.Detail, r.Entry.Reason))
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        bool more = page.Count > query.Take;
        return new AuditPage(more ? page.GetRange(0, query.Take) : page, query.Skip, query.Take, more);
    }

    // Lower-cased in invariant culture, as the database's lower() treats the stored text.
    private static string? Text(string? value) => string.IsNullOrWhiteSpace(value) ? null : value.Trim().ToLowerInvariant();

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
