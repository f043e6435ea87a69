namespace FilterQA.Data.Entities;

/// <summary>
/// The answer given to a request that carried an idempotency key, kept so that a retry of the same
/// request gets the same status and body without doing the work again.
/// </summary>
public sealed class IdempotencyRecord
{
    public long Id { get; set; }

    /// <summary>Lower-case hex SHA-256 of the caller's scope and key (the key itself may be any text).</summary>
    public required string KeySha256 { get; set; }

    /// <summary>Lower-case hex SHA-256 of what identifies the request (route, file name, body).</summary>
    public required string RequestSha256 { get; set; }

    public int StatusCode { get; set; }

    public required string ContentType { get; set; }

    public required string Body { get; set; }

    public DateTimeOffset CreatedAt { get; set; }
}
