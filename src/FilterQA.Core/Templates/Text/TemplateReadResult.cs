namespace FilterQA.Core.Templates.Text;

/// <summary>
/// The outcome of reading a template text: the template when the text is valid, otherwise every problem
/// found, in the order of the text. Exactly one of the two is present.
/// </summary>
public sealed class TemplateReadResult
{
    internal TemplateReadResult(LimitTemplate? template, IReadOnlyList<TemplateProblem> problems)
    {
        Template = template;
        Problems = problems;
    }

    /// <summary>The template; null when there are problems.</summary>
    public LimitTemplate? Template { get; }

    /// <summary>Every problem found, ordered by line and column; empty when the template was read.</summary>
    public IReadOnlyList<TemplateProblem> Problems { get; }

    /// <summary>True when the text was a valid template.</summary>
    public bool Succeeded => Template is not null;
}
