using System.Globalization;

namespace FilterQA.Core.Templates.Text;

/// <summary>One problem found while reading a template text.</summary>
/// <param name="Line">1-based line; 0 when the problem concerns the whole text (e.g. the file cannot be opened).</param>
/// <param name="Column">1-based column; 0 when not at one place on the line.</param>
/// <param name="Message">What was wrong and what was expected, in plain words.</param>
public sealed record TemplateProblem(int Line, int Column, string Message)
{
    /// <summary>"line L, column C: message" (or just the message when there is no line).</summary>
    public override string ToString() => Line <= 0
        ? Message
        : string.Create(CultureInfo.InvariantCulture, $"line {Line}, column {Column}: {Message}");
}
