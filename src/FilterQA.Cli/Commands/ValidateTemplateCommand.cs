using System.Globalization;
using FilterQA.Cli.Arguments;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Text;

namespace FilterQA.Cli.Commands;

/// <summary><c>validate-template</c>: reads a limit template and lists every problem with its line and column.</summary>
internal sealed class ValidateTemplateCommand : ICommand
{
    public string Summary => "validate-template <file>   check a limit template and list every problem";

    public string Usage => """
        usage: filterqa validate-template <file>

        Reads the limit template and prints every problem as "file:line:column: message" on stderr.
        When there is none it prints "valid: <part> rev <revision> <content hash>".

        Exit codes: 0 valid; 1 usage error; 2 the template has problems or cannot be read.
        """;

    // The template could not be shown to be valid.
    public int InternalErrorExitCode => ExitCodes.BadInput;

    public int Run(IReadOnlyList<string> args, TextWriter stdout, TextWriter stderr)
    {
        ParsedArguments parsed = ParsedArguments.Parse(args, [], []);
        if (parsed.Positionals.Count != 1)
        {
            throw new UsageException("give exactly one template file");
        }
        string path = parsed.Positionals[0];
        TemplateReadResult read = LimitTemplateReader.ReadFile(path);
        if (read.Template is not { } template)
        {
            WriteProblems(path, read.Problems, stderr);
            return ExitCodes.BadInput;
        }
        stdout.WriteLine(string.Create(CultureInfo.InvariantCulture, $"valid: {template.PartNumber} rev {template.Revision} {template.ContentHash}"));
        return ExitCodes.Success;
    }

    /// <summary>Writes each problem as "file:line:column: message" ("file: message" when it is not at one place).</summary>
    internal static void WriteProblems(string path, IReadOnlyList<TemplateProblem> problems, TextWriter stderr)
    {
        foreach (TemplateProblem problem in problems)
        {
            stderr.WriteLine(problem.Line > 0
                ? string.Create(CultureInfo.InvariantCulture, $"{path}:{problem.Line}:{problem.Column}: {problem.Message}")
                : $"{path}: {problem.Message}");
        }
    }
}
