using System.Security.Cryptography;
using System.Text;
using FilterQA.Data;
using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Web.Api.Intake;

/// <summary>
/// Answers kept for requests that carried an Idempotency-Key, per station: the first answer is stored, a
/// retry of the same request gets it back byte for byte.
/// </summary>
public sealed class IdempotentAnswers(IDbContextFactory<FilterQaDbContext> contexts, TimeProvider clock)
{
    /// <summary>Longest Idempotency-Key accepted, characters.</summary>
    public const int MaxKeyLength = 200;

    /// <summary>Lower-case hex SHA-256 of a caller's scope (e.g. the station) and key.</summary>
    public static string ScopedKey(string scope, string key) => Sha256Hex(Encoding.UTF8.GetBytes(scope + "\n" + key));

    /// <summary>Lower-case hex SHA-256 of the parts that identify a request.</summary>
    public static string RequestHash(string route, string fileName, ReadOnlySpan<byte> body)
    {
        using var hash = IncrementalHash.CreateHash(HashAlgorithmName.SHA256);
        hash.AppendData(Encoding.UTF8.GetBytes(route + "\n" + fileName + "\n"));
        hash.AppendData(body);
        return Convert.ToHexStringLower(hash.GetHashAndReset());
    }

    public async Task<IdempotencyRecord?> FindAsync(string scopedKey, CancellationToken cancellationToken)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        return await context.IdempotencyRecords.AsNoTracking().SingleOrDefaultAsync(r => r.KeySha256 == scopedKey, cancellationToken).ConfigureAwait(false);
    }

    /// <summary>Stores the answer; when a concurrent retry stored one first, returns that one instead.</summary>
    public async Task<IdempotencyRecord> SaveAsync(string scopedKey, string requestHash, int statusCode, string body, CancellationToken cancellationToken)
    {
        var record = new IdempotencyRecord
        {
            KeySha256 = scopedKey,
            RequestSha256 = requestHash,
            StatusCode = statusCode,
            ContentType = "application/json",
            Body = body,
            CreatedAt = clock.GetUtcNow(),
        };
        try
        {
            await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
            context.IdempotencyRecords.Add(record);
            await context.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
            return record;
        }
        catch (DbUpdateException)
        {
            return await FindAsync(scopedKey, cancellationToken).ConfigureAwait(false) ?? throw new InvalidOperationException(
                "the idempotent answer could neither be stored nor read back");
        }
    }

    private static string Sha256Hex(byte[] bytes) => Convert.ToHexStringLower(SHA256.HashData(bytes));
}
