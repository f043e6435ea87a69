using FilterQA.Cli.Arguments;
using FilterQA.Cli.Commands;

namespace FilterQA.Cli;

/// <summary>
/// The command-line front door. Each command owns its exit codes; this class only dispatches,
/// turns usage mistakes into exit code 1, and makes sure no exception ever reaches the console.
/// </summary>
public static class CliApplication
{
    private static readonly IReadOnlyDictionary<string, ICommand> Commands = new Dictionary<string, ICommand>(StringComparer.Ordinal)
    {
        ["measure"] = new MeasureCommand(),
        ["check"] = new CheckCommand(),
        ["validate-template"] = new ValidateTemplateCommand(),
        ["demo-sweeps"] = new DemoSweepsCommand(),
        ["import"] = new ImportCommand(),
        ["lot"] = new LotCommand(),
        ["reevaluate"] = new ReevaluateCommand(),
        ["backup"] = new BackupCommand(),
    };

    /// <summary>Runs one command; returns its exit code.</summary>
    public static int Run(IReadOnlyList<string> args, TextWriter stdout, TextWriter stderr)
    {
        ArgumentNullException.ThrowIfNull(args);
        ArgumentNullException.ThrowIfNull(stdout);
        ArgumentNullException.ThrowIfNull(stderr);
        if (args.Count == 0 || args[0] is "--help" or "-h" or "help")
        {
            WriteUsage(args.Count == 0 ? stderr : stdout);
            return args.Count == 0 ? ExitCodes.Usage : ExitCodes.Success;
        }
        if (!Commands.TryGetValue(args[0], out ICommand? command))
        {
            stderr.WriteLine($"filterqa: unknown command '{args[0]}'");
            WriteUsage(stderr);
            return ExitCodes.Usage;
        }
        IReadOnlyList<string> rest = args.Skip(1).ToArray();
        if (rest.Any(a => a is "--help" or "-h"))
        {
            stdout.WriteLine(command.Usage);
            return ExitCodes.Success;
        }
        try
        {
            return command.Run(rest, stdout, stderr);
        }
        catch (UsageException e)
        {
            stderr.WriteLine($"filterqa {args[0]}: {e.Message}");
            stderr.WriteLine(command.Usage);
            return ExitCodes.Usage;
        }
#pragma warning disable CA1031 // The contract promises that no exception reaches the console.
        catch (Exception e)
#pragma warning restore CA1031
        {
            stderr.WriteLine($"filterqa {args[0]}: internal error: {e.GetType().Name}: {e.Message}");
            return command.InternalErrorExitCode;
        }
    }

    private static void WriteUsage(TextWriter writer)
    {
        writer.WriteLine("usage: filterqa <command> [arguments]   (filterqa <command> --help for details)");
        writer.WriteLine();
        foreach (ICommand command in Commands.Values)
        {
            writer.WriteLine("  " + command.Summary);
        }
    }
}
