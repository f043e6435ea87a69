using FilterQA.Core.Templates;

namespace FilterQA.Data.Services;

/// <summary>One stored revision of a part's template with who did what to it and when (UTC).</summary>
/// <param name="Revision">The revision number.</param>
/// <param name="Status">Draft, released or withdrawn.</param>
/// <param name="ContentHash">"sha256:" and the hex hash of the canonical text.</param>
/// <param name="RegisteredAt">When it was first stored.</param>
/// <param name="RegisteredBy">Who stored it.</param>
/// <param name="ReleasedAt">When it was released; null for a draft.</param>
/// <param name="ReleasedBy">Who released it; null for a draft.</param>
/// <param name="WithdrawnAt">When it was withdrawn; null unless withdrawn.</param>
/// <param name="WithdrawnBy">Who withdrew it; null unless withdrawn.</param>
/// <param name="DraftSavedAt">When the draft text was last saved; null when never saved after registering.</param>
/// <param name="DraftSavedBy">Who saved it last; null when never saved after registering.</param>
/// <param name="DraftVersion">The draft's save counter (1 when registered).</param>
public sealed record TemplateRevisionHistory(int Revision, TemplateStatus Status, string ContentHash,
    DateTimeOffset RegisteredAt, string RegisteredBy, DateTimeOffset? ReleasedAt, string? ReleasedBy,
    DateTimeOffset? WithdrawnAt, string? WithdrawnBy, DateTimeOffset? DraftSavedAt, string? DraftSavedBy, int DraftVersion);
