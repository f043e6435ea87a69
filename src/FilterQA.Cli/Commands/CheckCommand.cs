using FilterQA.Cli.Arguments;
using FilterQA.Core.Decisions;
using FilterQA.Core.Formats;
using FilterQA.Core.Normalisation;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Text;

namespace FilterQA.Cli.Commands;

/// <summary>
/// <c>check</c>: judges sweep files against a limit template and prints one line (or one JSON object) per unit.
/// Every input is read before any unit is judged, so a batch with an unreadable file prints no verdict at all.
/// </summary>
internal sealed class CheckCommand : ICommand
{
    private const string TemplateOption = "--template", ThruOption = "--thru", JsonFlag = "--json";

    public string Summary => "check --template <file> <sweep-file>... [--thru <file>] [--json]   judge units against a limit template";

    public string Usage => """
        usage: filterqa check --template <file> <sweep-file>... [--thru <file>] [--json]

        Judges each sweep file (Touchstone or delimited text) against the limit template and prints one
        line per unit: the file, go / no-go / not verifiable, and the rules that keep it from go.

          --template <file>  the limit template (YAML)
          --thru <file>      a thru measured with the same settings; each sweep's transmission is divided
                             by it (it must cover the sweep's span). Without --thru each sweep is taken as
                             already normalised (a calibrated network analyser).
          --json             one JSON object per unit per line instead of text

        The thru's age is not known to this command, so the template's maximum thru age is not checked;
        every unit carries a warning saying so.

        Exit codes: 0 every unit is go; 1 any unit is no-go or not verifiable, or a usage error;
        2 the template, the thru or a sweep cannot be read or used (every problem is written to stderr
        and no unit is judged, because all files are read first).
        """;

    // No verdict was reached, so no unit may be taken as go; 1 is the code for "not every unit is go".
    public int InternalErrorExitCode => ExitCodes.Rejected;

    public int Run(IReadOnlyList<string> args, TextWriter stdout, TextWriter stderr)
    {
        ParsedArguments parsed = ParsedArguments.Parse(args, [TemplateOption, ThruOption], [JsonFlag]);
        string templatePath = parsed.Single(TemplateOption) ?? throw new UsageException("--template <file> is required");
        string? thruPath = parsed.Single(ThruOption);
        if (parsed.Positionals.Count == 0)
        {
            throw new UsageException("give at least one sweep file");
        }

        TemplateReadResult read = LimitTemplateReader.ReadFile(templatePath);
        if (read.Template is not { } template)
        {
            ValidateTemplateCommand.WriteProblems(templatePath, read.Problems, stderr);
            return ExitCodes.BadInput;
        }

        bool bad = false;
        Sweep? thru = null;
        if (thruPath is not null)
        {
            thru = ReadSweep(thruPath, stderr);
            bad |= thru is null;
        }
        var inputs = new List<(string File, MeasurementInput Input)>(parsed.Positionals.Count);
        foreach (string path in parsed.Positionals)
        {
            Sweep? sweep = ReadSweep(path, stderr);
            if (sweep is null)
            {
                bad = true;
                continue;
            }
            if (thruPath is not null && thru is null)
            {
                continue;
            }
            MeasurementInput? input = Prepare(path, sweep, thru, stderr);
            if (input is null)
            {
                bad = true;
                continue;
            }
            inputs.Add((path, input));
        }
        if (bad)
        {
            return ExitCodes.BadInput;
        }

        bool allGo = true;
        bool json = parsed.Has(JsonFlag);
        foreach ((string file, MeasurementInput input) in inputs)
        {
            UnitEvaluation evaluation = TemplateEvaluator.Evaluate(template, input);
            allGo &= evaluation.Verdict == UnitVerdict.Go;
            stdout.WriteLine(json ? EvaluationJson.Line(file, evaluation) : TextLine(file, evaluation));
        }
        return allGo ? ExitCodes.Success : ExitCodes.Rejected;
    }

    private static Sweep? ReadSweep(string path, TextWriter stderr)
    {
        try
        {
            return SweepFileReader.ReadFile(path);
        }
        catch (SweepReadException e)
        {
            stderr.WriteLine(e.Message);
            return null;
        }
    }

    private static MeasurementInput? Prepare(string path, Sweep sweep, Sweep? thru, TextWriter stderr)
    {
        try
        {
            NormalisedResponse? normalised = thru is null ? null : ThruNormaliser.Normalise(sweep, thru);
            return MeasurementInput.FromSweep(sweep, normalised);
        }
        catch (SweepReadException e)
        {
            stderr.WriteLine($"{path}: {e.Message}");
        }
        catch (ArgumentException e)
        {
            stderr.WriteLine($"{path}: {e.Message}");
        }
        return null;
    }

    /// <summary>"file: go", or "file: no-go: id (outcome): message; …" listing the rules that keep the unit from go.</summary>
    internal static string TextLine(string file, UnitEvaluation evaluation)
    {
        if (evaluation.Verdict == UnitVerdict.Go)
        {
            return $"{file}: go";
        }
        string verdict = evaluation.Verdict == UnitVerdict.NoGo ? "no-go" : "not verifiable";
        IEnumerable<string> rules = evaluation.BlockingRules.Select(r => $"{r.RuleId} ({EvaluationJson.Outcome(r.Outcome)}): {r.Message}");
        return $"{file}: {verdict}: {string.Join("; ", rules)}";
    }
}
