using FilterQA.Core.Templates;

namespace FilterQA.Web.Ui.Services;

/// <summary>A stored template revision offered for a what-if.</summary>
public sealed record RevisionChoice(int Revision, TemplateStatus Status, DateTimeOffset RegisteredAt, string RegisteredBy)
{
    /// <summary>"revision 3 (draft, registered 2026-11-03 by J. Lindqvist)".</summary>
    public string Label => $"revision {Revision} ({Status.ToString().ToLowerInvariant()}, registered {Words.Time(RegisteredAt)} by {RegisteredBy})";
}
