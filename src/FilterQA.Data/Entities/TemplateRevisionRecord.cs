using FilterQA.Core.Templates;

namespace FilterQA.Data.Entities;

/// <summary>
/// One revision of a part's limit template, stored as its canonical text with its hash.
/// Once released, the text, hash and revision number never change; the only later change
/// allowed is Released → Withdrawn (status, who and when).
/// </summary>
public sealed class TemplateRevisionRecord
{
    public long Id { get; set; }

    public long PartId { get; set; }

    public PartRecord? Part { get; set; }

    public int Revision { get; set; }

    public TemplateStatus Status { get; set; }

    /// <summary>
    /// The template text exactly as registered or released (as <c>LimitTemplateWriter.Write</c>
    /// writes it; a released text carries its content-hash line).
    /// </summary>
    public required string Text { get; set; }

    /// <summary>"sha256:" plus the lower-case hex SHA-256 of the template's canonical text.</summary>
    public required string ContentHash { get; set; }

    public DecisionRule DecisionRule { get; set; }

    public string? Author { get; set; }

    public DateOnly? ReleaseDate { get; set; }

    public DateTimeOffset RegisteredAt { get; set; }

    public required string RegisteredBy { get; set; }

    public DateTimeOffset? ReleasedAt { get; set; }

    public string? ReleasedBy { get; set; }

    /// <summary>Why the revision was released, as the releasing quality engineer gave it (null before release and for a revision registered as released).</summary>
    public string? ReleaseReason { get; set; }

    public DateTimeOffset? WithdrawnAt { get; set; }

    public string? WithdrawnBy { get; set; }

    /// <summary>
    /// Optimistic concurrency token of a draft: 1 when registered, one more with every saved change of its text.
    /// A save names the version it was edited from; a save from an older version is refused.
    /// </summary>
    public int DraftVersion { get; set; } = 1;

    /// <summary>When the draft text was last saved (null until the first save after registering).</summary>
    public DateTimeOffset? DraftSavedAt { get; set; }

    /// <summary>Who last saved the draft text (null until the first save after registering).</summary>
    public string? DraftSavedBy { get; set; }
}
