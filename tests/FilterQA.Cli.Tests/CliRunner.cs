namespace FilterQA.Cli.Tests;

/// <summary>Runs the CLI in-process and keeps what it printed.</summary>
internal static class CliRunner
{
    public static (int ExitCode, string Stdout, string Stderr) Run(params string[] args)
    {
        using var stdout = new StringWriter();
        using var stderr = new StringWriter();
        int code = CliApplication.Run(args, stdout, stderr);
        return (code, stdout.ToString(), stderr.ToString());
    }

    /// <summary>The repository root: the folder above the test binaries that holds FilterQA.sln.</summary>
    public static string RepositoryRoot()
    {
        var directory = new DirectoryInfo(AppContext.BaseDirectory);
        while (directory is not null && !File.Exists(Path.Combine(directory.FullName, "FilterQA.sln")))
        {
            directory = directory.Parent;
        }
        return directory?.FullName ?? throw new InvalidOperationException("FilterQA.sln not found above the test binaries");
    }
}
