using FilterQA.Core.Templates;

namespace FilterQA.Data.Services;

/// <summary>A stored revision's text as an editor loads it, with the version a later save must name.</summary>
/// <param name="PartNumber">The part number.</param>
/// <param name="Revision">The revision number.</param>
/// <param name="Status">Draft, released or withdrawn; only a draft can be saved.</param>
/// <param name="Text">The stored text (as <c>LimitTemplateWriter.Write</c> wrote it).</param>
/// <param name="DraftVersion">The concurrency token: pass it to <see cref="TemplateCatalog.SaveDraftTextAsync"/>.</param>
/// <param name="SavedAt">When the text was last saved or registered (UTC).</param>
/// <param name="SavedBy">Who saved or registered it.</param>
public sealed record StoredTemplateText(string PartNumber, int Revision, TemplateStatus Status, string Text, int DraftVersion,
    DateTimeOffset SavedAt, string SavedBy);
