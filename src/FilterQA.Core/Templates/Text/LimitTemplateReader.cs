namespace FilterQA.Core.Templates.Text;

/// <summary>
/// Reads a template from the text format of the limit-templates folder. User errors never throw: the
/// result lists every problem found, each with its line, column and what was expected.
/// </summary>
public static class LimitTemplateReader
{
    /// <summary>Reads a template from its text.</summary>
    /// <param name="text">The YAML text; any line endings.</param>
    public static TemplateReadResult Read(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        return new TemplateTextSession().Run(text);
    }

    /// <summary>Reads a template file (UTF-8); a file that cannot be opened is reported as a problem at line 0.</summary>
    /// <param name="path">Path of the file.</param>
    public static TemplateReadResult ReadFile(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        string text;
        try
        {
            text = File.ReadAllText(path);
        }
        catch (Exception problem) when (problem is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            return new TemplateReadResult(null, [new TemplateProblem(0, 0, $"the template file '{Path.GetFileName(path)}' cannot be read: {problem.Message}")]);
        }
        return Read(text);
    }
}
