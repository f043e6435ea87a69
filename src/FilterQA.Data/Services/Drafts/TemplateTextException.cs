using FilterQA.Core.Templates.Text;

namespace FilterQA.Data.Services;

/// <summary>A template text given to the catalog that cannot be stored: every problem with its line. Nothing was stored.</summary>
public sealed class TemplateTextException : Exception
{
    /// <summary>A refusal with the reader's problems (or the catalog's, at line 0).</summary>
    public TemplateTextException(IReadOnlyList<TemplateProblem> problems)
        : base(Describe(problems))
    {
        Problems = problems;
    }

    /// <summary>A refusal for one reason that concerns the whole text.</summary>
    public TemplateTextException(string message)
        : this([new TemplateProblem(0, 0, message)])
    {
    }

    /// <summary>Needed by the analyzers; prefer the constructors with problems.</summary>
    public TemplateTextException()
        : this("the template text cannot be stored")
    {
    }

    /// <summary>Needed by the analyzers; prefer the constructors with problems.</summary>
    public TemplateTextException(string message, Exception innerException)
        : base(message, innerException)
    {
        Problems = [new TemplateProblem(0, 0, message)];
    }

    /// <summary>Every problem, ordered by line.</summary>
    public IReadOnlyList<TemplateProblem> Problems { get; }

    private static string Describe(IReadOnlyList<TemplateProblem> problems)
    {
        ArgumentNullException.ThrowIfNull(problems);
        return "the template text was not stored: " + string.Join("; ", problems.Select(p => p.ToString()));
    }
}
