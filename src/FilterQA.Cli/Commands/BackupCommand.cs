using System.Globalization;
using FilterQA.Cli.Arguments;
using FilterQA.Cli.Storage;
using FilterQA.Data.Services;
using Microsoft.Data.Sqlite;

namespace FilterQA.Cli.Commands;

/// <summary><c>backup</c>: an online copy of the SQLite database, consistent while the application goes on writing.</summary>
internal sealed class BackupCommand : ICommand
{
    public string Summary => "backup <destination-file>   online copy of the SQLite database (consistent while the app writes)";

    public string Usage => $"""
        usage: filterqa backup <destination-file> [--data <folder>] [--database <text>]

        Copies the SQLite database to a new file with SQLite's online backup (one consistent snapshot: every
        transaction committed before the copy began, none after), then checks the copy with integrity_check.
        The application may keep writing meanwhile. A PostgreSQL site backs up with the server's own tools.
        {CliStorage.Usage}
        Exit codes: 0 copied and sound; 1 a usage error; 2 the database cannot be opened, the destination exists
        or cannot be written, the database is not SQLite, or the copy fails its integrity check.
        """;

    public int InternalErrorExitCode => ExitCodes.BadInput;

    public int Run(IReadOnlyList<string> args, TextWriter stdout, TextWriter stderr)
    {
        ParsedArguments parsed = ParsedArguments.Parse(args, CliStorage.Options, []);
        if (parsed.Positionals.Count != 1)
        {
            throw new UsageException("give one destination file");
        }
        var storageOptions = CliStorage.OptionsFrom(parsed);
        using CliStorage? storage = CliStorage.Open(storageOptions, "backup", stderr);
        if (storage is null)
        {
            return ExitCodes.BadInput;
        }
        try
        {
            BackupResult result = storage.Backup.BackupSqliteAsync(parsed.Positionals[0]).GetAwaiter().GetResult();
            if (!result.IsSound)
            {
                stderr.WriteLine($"filterqa backup: the copy {result.Path} fails its integrity check: {result.IntegrityCheck}");
                return ExitCodes.BadInput;
            }
            stdout.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{result.Path}: {result.Bytes} bytes, integrity ok"));
            return ExitCodes.Success;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or NotSupportedException or SqliteException)
        {
            stderr.WriteLine($"filterqa backup: {e.Message}");
            return ExitCodes.BadInput;
        }
    }
}
