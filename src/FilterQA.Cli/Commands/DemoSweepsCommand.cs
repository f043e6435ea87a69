using System.Globalization;
using FilterQA.Cli.Arguments;
using FilterQA.Core.Formats.Delimited;
using FilterQA.Core.Formats.Touchstone;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Synthesis;

namespace FilterQA.Cli.Commands;

/// <summary>
/// <c>demo-sweeps</c>: writes synthetic sweeps of the invented demo parts into a folder, for trying the
/// tool without an instrument. Synthetic data for demos only; never reference data.
/// Exit codes: 0 written; 1 usage error; 2 the folder cannot be written.
/// </summary>
public sealed class DemoSweepsCommand : ICommand
{
    private static readonly string[] ValueOptions = ["--part", "--units", "--seed", "--defect"];

    public string Summary => "demo-sweeps <folder> [options]   write synthetic sweeps of the demo parts (demo data only)";

    public string Usage => """
        usage: filterqa demo-sweeps <folder> [--part <part-number>] [--units <n>] [--seed <n>] [--defect <kind>]

          writes, per demo part: <part>_S0001.s2p … (network-analyser units, Touchstone),
          <part>_thru_IQC-1.csv and <part>_floor_IQC-1.csv (stepped-generator power traces, dBm)
          and <part>_S0001_power.csv (the first unit measured the same way).
          --part     one demo part (default: all six)
          --units    units per part (default 3)
          --seed     random seed (default 2611)
          --defect   none, centre-drift, low-rejection, strong-unwanted-mode or high-loss (default none)

        The data are synthetic, for demonstrations only.
        exit codes: 0 written; 1 usage error; 2 the folder cannot be written
        """;

    public int InternalErrorExitCode => ExitCodes.BadInput;

    public int Run(IReadOnlyList<string> args, TextWriter stdout, TextWriter stderr)
    {
        ParsedArguments parsed = ParsedArguments.Parse(args, ValueOptions, []);
        if (parsed.Positionals.Count != 1)
        {
            throw new UsageException("give one output folder");
        }
        IReadOnlyList<DemoPart> parts = parsed.Single("--part") is { } partNumber ? [FindPart(partNumber)] : DemoParts.All;
        int units = PositiveInt(parsed.Single("--units") ?? "3", "--units");
        ulong seed = ulong.TryParse(parsed.Single("--seed") ?? "2611", NumberStyles.None, CultureInfo.InvariantCulture, out ulong s)
            ? s : throw new UsageException("--seed must be a whole number >= 0");
        DefectKind defect = ParseDefect(parsed.Single("--defect") ?? "none");
        string folder = parsed.Positionals[0];

        var synthesiser = new UnitSynthesiser(seed);
        try
        {
            Directory.CreateDirectory(folder);
            int written = 0;
            foreach (DemoPart part in parts)
            {
                if (defect != DefectKind.None && !part.Defects.Contains(defect))
                {
                    stderr.WriteLine($"{part.PartNumber}: skipped, it has no '{parsed.Single("--defect")}' defect");
                    continue;
                }
                for (int i = 1; i <= units; i++)
                {
                    Sweep unit = synthesiser.Unit(part, i, defect);
                    Write(folder, unit.Source.FileName, w => TouchstoneWriter.Write(unit, w, new TouchstoneWriteOptions
                    {
                        FrequencyUnit = FrequencyUnit.Hz,
                        DataFormat = TouchstoneDataFormat.DecibelAngle,
                        Comments = [$"synthetic demo unit of {part.PartNumber} ({part.Description}); demo data only"],
                    }));
                    written++;
                }
                const string station = "IQC-1";
                Write(folder, $"{part.PartNumber}_thru_{station}.csv", w => DelimitedTextWriter.Write(synthesiser.PowerThru(part, station), w));
                Write(folder, $"{part.PartNumber}_floor_{station}.csv", w => DelimitedTextWriter.Write(synthesiser.NoiseFloor(part, station), w));
                Write(folder, $"{part.PartNumber}_S0001_power.csv", w => DelimitedTextWriter.Write(synthesiser.PowerUnit(part, 1, station, defect), w));
                written += 3;
            }
            stdout.WriteLine($"wrote {written} files to {folder}");
            return ExitCodes.Success;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            stderr.WriteLine($"{folder}: cannot write the demo sweeps: {e.Message}");
            return ExitCodes.BadInput;
        }
    }

    private static void Write(string folder, string fileName, Action<TextWriter> write)
    {
        using var writer = new StreamWriter(Path.Combine(folder, fileName), append: false, new System.Text.UTF8Encoding(false));
        write(writer);
    }

    private static DemoPart FindPart(string partNumber)
    {
        DemoPart? part = DemoParts.All.FirstOrDefault(p => p.PartNumber.Equals(partNumber, StringComparison.OrdinalIgnoreCase));
        return part ?? throw new UsageException($"--part: '{partNumber}' is not a demo part; known: {string.Join(", ", DemoParts.All.Select(p => p.PartNumber))}");
    }

    private static int PositiveInt(string text, string option) =>
        int.TryParse(text, NumberStyles.None, CultureInfo.InvariantCulture, out int n) && n is >= 1 and <= 10_000
            ? n : throw new UsageException($"{option} must be a whole number from 1 to 10000");

    private static DefectKind ParseDefect(string text) => text switch
    {
        "none" => DefectKind.None,
        "centre-drift" => DefectKind.CentreDrift,
        "low-rejection" => DefectKind.LowRejection,
        "strong-unwanted-mode" => DefectKind.StrongUnwantedMode,
        "high-loss" => DefectKind.HighLoss,
        _ => throw new UsageException($"--defect: '{text}' is not one of none, centre-drift, low-rejection, strong-unwanted-mode, high-loss"),
    };
}
