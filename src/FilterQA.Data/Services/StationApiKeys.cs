using System.Security.Cryptography;
using System.Text;
using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Services;

/// <summary>
/// API keys of stations: made from 32 random bytes, shown once, kept as SHA-256 (a key is random and
/// long, so a fast hash is enough: there is no dictionary to try), tied to one station, revocable. Audited.
/// </summary>
public sealed class StationApiKeys(IDbContextFactory<FilterQaDbContext> contexts, TimeProvider clock)
{
    /// <summary>Every key starts with this, so a leaked key is easy to recognise in logs and scans.</summary>
    public const string KeyStart = "fqa_";

    private const int PrefixLength = 12;

    /// <summary>Makes a key for <paramref name="station"/>.</summary>
    /// <exception cref="RecordNotFoundException">The station is not registered.</exception>
    public async Task<NewStationApiKey> CreateAsync(string station, string label, Actor actor, CancellationToken cancellationToken = default)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(station);
        ArgumentException.ThrowIfNullOrWhiteSpace(label);
        ArgumentNullException.ThrowIfNull(actor);
        if (label.Length > 200)
        {
            throw new ArgumentException("the key's label must be at most 200 characters", nameof(label));
        }
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        StationRecord record = await context.Stations.SingleOrDefaultAsync(s => s.Name == station, cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException($"station {station} is not registered");
        string key = KeyStart + Convert.ToBase64String(RandomNumberGenerator.GetBytes(32)).TrimEnd('=').Replace('+', '-').Replace('/', '_');
        var row = new StationApiKeyRecord
        {
            StationId = record.Id,
            Label = label.Trim(),
            KeySha256 = Hash(key),
            KeyPrefix = key[..PrefixLength],
            CreatedAt = clock.GetUtcNow(),
            CreatedBy = actor.Name,
        };
        context.StationApiKeys.Add(row);
        Audit.Add(context, clock, actor, AuditAction.ApiKeyCreated, "station", station, $"API key {row.KeyPrefix}… '{row.Label}'");
        await context.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        return new NewStationApiKey(Info(row, station), key);
    }

    /// <summary>Revokes a key of <paramref name="station"/>; revoking a revoked key changes nothing.</summary>
    /// <exception cref="RecordNotFoundException">The station has no key with that id.</exception>
    public async Task<StationApiKeyInfo> RevokeAsync(string station, long keyId, Actor actor, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(actor);
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        StationApiKeyRecord row = await context.StationApiKeys.SingleOrDefaultAsync(k => k.Id == keyId && k.Station!.Name == station, cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException(FormattableString.Invariant($"station {station} has no API key {keyId}"));
        if (row.RevokedAt is null)
        {
            row.RevokedAt = clock.GetUtcNow();
            row.RevokedBy = actor.Name;
            Audit.Add(context, clock, actor, AuditAction.ApiKeyRevoked, "station", station, $"API key {row.KeyPrefix}… '{row.Label}'");
            await context.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        }
        return Info(row, station);
    }

    /// <summary>The keys of a station, newest first (revoked ones too).</summary>
    public async Task<IReadOnlyList<StationApiKeyInfo>> ListAsync(string station, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        List<StationApiKeyRecord> rows = await context.StationApiKeys.AsNoTracking().Where(k => k.Station!.Name == station)
            .OrderByDescending(k => k.Id).ToListAsync(cancellationToken).ConfigureAwait(false);
        return [.. rows.Select(r => Info(r, station))];
    }

    /// <summary>The key's record when <paramref name="key"/> is a live (not revoked) key, else null.</summary>
    public async Task<StationApiKeyInfo?> FindLiveAsync(string key, CancellationToken cancellationToken = default)
    {
        if (string.IsNullOrEmpty(key) || key.Length > 200 || !key.StartsWith(KeyStart, StringComparison.Ordinal))
        {
            return null;
        }
        string hash = Hash(key);
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var row = await context.StationApiKeys.AsNoTracking().Where(k => k.KeySha256 == hash && k.RevokedAt == null)
            .Select(k => new { Key = k, StationName = k.Station!.Name }).SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false);
        return row is null ? null : Info(row.Key, row.StationName);
    }

    private static string Hash(string key) => Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(key)));

    private static StationApiKeyInfo Info(StationApiKeyRecord r, string station) =>
        new(r.Id, station, r.Label, r.KeyPrefix, r.CreatedAt, r.CreatedBy, r.RevokedAt, r.RevokedBy);
}
