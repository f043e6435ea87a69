using FilterQA.Core.Templates;

namespace FilterQA.Web.Ui.Services;

/// <summary>A stored revision of a part, as a picker lists it.</summary>
public sealed record RevisionChoice(int Revision, TemplateStatus Status)
{
    /// <summary>"3 (draft)" and so on.</summary>
    public string Label => string.Create(System.Globalization.CultureInfo.InvariantCulture, $"{Revision} ({Status.ToString().ToLowerInvariant()})");
}
