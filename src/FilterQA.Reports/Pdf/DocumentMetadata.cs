namespace FilterQA.Reports.Pdf;

/// <summary>The PDF document information: title, author, subject, creator application, producer and creation time (UTC).</summary>
public sealed record DocumentMetadata(string Title, string Author, string Subject, DateTimeOffset CreatedAt)
{
    /// <summary>The application that made the content.</summary>
    public string Creator { get; init; } = "FilterQA";

    /// <summary>The library that wrote the PDF.</summary>
    public string Producer { get; init; } = "FilterQA Reports (SkiaSharp PDF)";
}
