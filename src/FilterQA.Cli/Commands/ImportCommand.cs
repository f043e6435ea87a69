using System.Globalization;
using System.IO.Compression;
using System.Security.Cryptography;
using System.Text;
using System.Text.RegularExpressions;
using FilterQA.Cli.Arguments;
using FilterQA.Cli.Storage;
using FilterQA.Core.Decisions;
using FilterQA.Core.Formats;
using FilterQA.Data;
using FilterQA.Data.Services;

namespace FilterQA.Cli.Commands;

/// <summary>
/// <c>import</c>: stores every sweep file of a folder or zip archive into a lot through the intake, one unit per file,
/// each in its own transaction, so a bad file is reported and the others are still stored.
/// </summary>
internal sealed class ImportCommand : ICommand
{
    private const string LotOption = "--lot", PatternOption = "--serial-pattern", StationOption = "--station", OperatorOption = "--operator";

    public string Summary => "import <folder-or-zip> --lot <lot> --station <name> --operator <name>   store sweep files as units of a lot";

    public string Usage => $"""
        usage: filterqa import <folder-or-zip> --lot <lotNumber> --station <name> --operator <name>
                               [--serial-pattern <regex>] [--data <folder>] [--database <text>] [--provider sqlite|postgres]

        Stores every file of the folder (not its sub-folders; hidden files are skipped) or of the zip archive as one
        unit of the lot: read, normalised by the station's latest thru (a power trace needs one), judged against the
        lot's template revision and stored with its verdict. Files are taken in name order. Each unit is its own
        transaction: a file that cannot be read or stored is reported with the reason and the others are still stored.
        Importing the same files into the same lot again stores nothing new ("already stored").

          --lot <lotNumber>          the lot (it must exist and be open or in test)
          --station <name>           the test station (registered if new); its latest thru is applied
          --operator <name>          who measured the units
          --serial-pattern <regex>   takes the serial from the file name by the named group 'serial', e.g.
                                     '_(?<serial>S\d+)\.'; default: the file name without its extension
        {CliStorage.Usage}
        One line per file (the stored verdict, or the error), then the totals.
        Exit codes: 0 every file stored; 1 some file failed, or a usage error; 2 the folder, the zip or the
        database cannot be opened.
        """;

    public int InternalErrorExitCode => ExitCodes.BadInput;

    public int Run(IReadOnlyList<string> args, TextWriter stdout, TextWriter stderr)
    {
        ParsedArguments parsed = ParsedArguments.Parse(args, [LotOption, PatternOption, StationOption, OperatorOption, .. CliStorage.Options], []);
        if (parsed.Positionals.Count != 1)
        {
            throw new UsageException("give one folder or zip file to import");
        }
        string source = parsed.Positionals[0];
        string lotNumber = Required(parsed, LotOption);
        string station = Required(parsed, StationOption);
        string operatorName = Required(parsed, OperatorOption);
        Regex? pattern = Pattern(parsed.Single(PatternOption));
        var storageOptions = CliStorage.OptionsFrom(parsed);

        List<(string Name, byte[] Bytes)>? files = ReadSource(source, stderr);
        if (files is null)
        {
            return ExitCodes.BadInput;
        }
        using CliStorage? storage = CliStorage.Open(storageOptions, "import", stderr);
        if (storage is null)
        {
            return ExitCodes.BadInput;
        }
        var actor = new Actor("cli:" + operatorName, operatorName);
        try
        {
            storage.Lots.GetSummaryAsync(lotNumber).GetAwaiter().GetResult();
        }
        catch (RecordNotFoundException e)
        {
            stderr.WriteLine($"filterqa import: {e.Message}");
            return ExitCodes.Usage;
        }
        storage.Stations.RegisterStationAsync(station, "registered by import", actor).GetAwaiter().GetResult();

        int stored = 0, already = 0, failed = 0;
        var verdicts = new Dictionary<UnitVerdict, int>();
        foreach ((string name, byte[] bytes) in files)
        {
            string? serial = Serial(name, pattern, out string? why);
            if (serial is null)
            {
                stdout.WriteLine($"{name}: error: {why}");
                failed++;
                continue;
            }
            try
            {
                var submission = new SweepSubmission(lotNumber, serial, station, actor, bytes, name) { IdempotencyKey = Key(lotNumber, serial, bytes) };
                IntakeResult result = storage.Intake.SubmitAsync(submission).GetAwaiter().GetResult();
                StoredMeasurement m = result.Stored;
                verdicts[m.Verdict] = verdicts.GetValueOrDefault(m.Verdict) + 1;
                stored += m.WasAlreadyStored ? 0 : 1;
                already += m.WasAlreadyStored ? 1 : 0;
                stdout.WriteLine(string.Create(CultureInfo.InvariantCulture,
                    $"{name}: {serial}: {Words.Verdict(m.Verdict)} (measurement {m.MeasurementId}, attempt {m.Attempt}{(m.WasAlreadyStored ? ", already stored" : "")})"));
            }
            catch (Exception e) when (e is SweepReadException or IntakeRefusedException or StorageRuleException or RecordNotFoundException or InvalidDataException)
            {
                stdout.WriteLine($"{name}: error: {e.Message}");
                failed++;
            }
        }
        stdout.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"{files.Count} files: {stored} stored, {already} already stored, {failed} failed; go {verdicts.GetValueOrDefault(UnitVerdict.Go)}, no-go {verdicts.GetValueOrDefault(UnitVerdict.NoGo)}, not verifiable {verdicts.GetValueOrDefault(UnitVerdict.NotVerifiable)}"));
        return failed == 0 ? ExitCodes.Success : ExitCodes.Rejected;
    }

    private static string Required(ParsedArguments parsed, string option) =>
        parsed.Single(option) is { Length: > 0 } value && !string.IsNullOrWhiteSpace(value) ? value : throw new UsageException($"{option} is required");

    private static Regex? Pattern(string? text)
    {
        if (text is null)
        {
            return null;
        }
        Regex regex;
        try
        {
            regex = new Regex(text, RegexOptions.CultureInvariant, TimeSpan.FromSeconds(1));
        }
        catch (ArgumentException e)
        {
            throw new UsageException($"--serial-pattern: '{text}' is not a regular expression: {e.Message}");
        }
        return regex.GetGroupNames().Contains("serial", StringComparer.Ordinal)
            ? regex
            : throw new UsageException($"--serial-pattern: '{text}' has no group named 'serial'; write e.g. '_(?<serial>S\\d+)\\.'");
    }

    private static string? Serial(string name, Regex? pattern, out string? why)
    {
        why = null;
        if (pattern is null)
        {
            string plain = Path.GetFileNameWithoutExtension(name);
            why = plain.Length == 0 ? "the file name gives no serial" : null;
            return plain.Length == 0 ? null : plain;
        }
        Match match = pattern.Match(name);
        if (!match.Success || match.Groups["serial"] is not { Success: true, Length: > 0 } group)
        {
            why = $"the file name does not match --serial-pattern '{pattern}', so it gives no serial";
            return null;
        }
        return group.Value;
    }

    /// <summary>The same file for the same unit of the same lot always gives the same key, so importing again stores nothing new.</summary>
    private static string Key(string lotNumber, string serial, byte[] bytes)
    {
        string text = lotNumber + "\n" + serial + "\n" + Convert.ToHexStringLower(SHA256.HashData(bytes));
        return "import-" + Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(text)));
    }

    private static List<(string Name, byte[] Bytes)>? ReadSource(string source, TextWriter stderr)
    {
        try
        {
            if (Directory.Exists(source))
            {
                return Directory.EnumerateFiles(source)
                    .Where(f => !Path.GetFileName(f).StartsWith('.'))
                    .Order(StringComparer.Ordinal)
                    .Select(f => (Path.GetFileName(f), File.ReadAllBytes(f)))
                    .ToList();
            }
            if (!File.Exists(source))
            {
                stderr.WriteLine($"filterqa import: {source}: no such folder or file");
                return null;
            }
            using ZipArchive zip = ZipFile.OpenRead(source);
            var files = new List<(string, byte[])>();
            foreach (ZipArchiveEntry entry in zip.Entries.Where(e => e.Name.Length > 0 && !e.Name.StartsWith('.')).OrderBy(e => e.FullName, StringComparer.Ordinal))
            {
                using Stream stream = entry.Open();
                using var copy = new MemoryStream();
                stream.CopyTo(copy);
                files.Add((entry.Name, copy.ToArray()));
            }
            return files;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or InvalidDataException)
        {
            stderr.WriteLine($"filterqa import: {source}: cannot be opened as a folder or zip archive: {e.Message}");
            return null;
        }
    }
}
