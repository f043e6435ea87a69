namespace FilterQA.Cli.Commands;

/// <summary>One sub-command of the CLI.</summary>
public interface ICommand
{
    /// <summary>One line: the command's name and what it does.</summary>
    string Summary { get; }

    /// <summary>The full usage text.</summary>
    string Usage { get; }

    /// <summary>Exit code when an unexpected exception is caught (each command maps it into its own contract).</summary>
    int InternalErrorExitCode { get; }

    /// <summary>Runs the command on its arguments (the command name removed).</summary>
    int Run(IReadOnlyList<string> args, TextWriter stdout, TextWriter stderr);
}
