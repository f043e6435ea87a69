using System.Globalization;
using FilterQA.Cli.Arguments;
using FilterQA.Core.Formats;
using FilterQA.Core.Measurement;
using FilterQA.Core.Resonators;
using FilterQA.Core.Sweeps;

namespace FilterQA.Cli.Commands;

/// <summary>
/// <c>measure</c>: reads one sweep, applies the thru, and prints the filter (and optionally resonator)
/// measurements as a table or as exactly one JSON object. Exit codes: 0 measured; 1 usage error;
/// 2 a sweep, thru or floor file cannot be read or used.
/// </summary>
public sealed class MeasureCommand : ICommand
{
    private static readonly string[] ValueOptions = ["--thru", "--floor", "--levels", "--ripple-band", "--stopband"];
    private static readonly string[] FlagOptions = ["--resonator", "--json"];

    public string Summary => "measure <sweep-file> [options]   measure a filter or resonator sweep";

    public string Usage => """
        usage: filterqa measure <sweep-file> [--thru <file>] [--floor <file>] [--levels 3,6,20]
                                [--ripple-band <startHz>:<stopHz>] [--stopband <startHz>:<stopHz>]...
                                [--resonator] [--json]

          <sweep-file>     Touchstone (.s1p … .sNp, .ts) or delimited text (.csv, .tsv, .txt)
          --thru <file>    thru (response) reference measured the same way; applied before measuring
          --floor <file>   noise-floor trace: the fixture terminated, no part (else estimated from the sweep)
          --levels         levels below the minimum loss for band edges, dB (default 3,6)
          --ripple-band    band for the passband ripple, Hz; points inside the closed interval count
          --stopband       band for stopband rejection, Hz; may be repeated
          --resonator      also fit the Butterworth–Van Dyke model (series fixture or one-port)
          --json           print exactly one JSON object (SI units, null where not measurable)

        exit codes: 0 measured; 1 usage error; 2 a sweep, thru or floor file cannot be read or used
        """;

    public int InternalErrorExitCode => ExitCodes.BadInput;

    public int Run(IReadOnlyList<string> args, TextWriter stdout, TextWriter stderr)
    {
        ParsedArguments parsed = ParsedArguments.Parse(args, ValueOptions, FlagOptions);
        if (parsed.Positionals.Count != 1)
        {
            throw new UsageException(parsed.Positionals.Count == 0 ? "give one sweep file" : "give exactly one sweep file");
        }
        FilterMeasurementRequest request = BuildRequest(parsed);

        MeasureReport report;
        try
        {
            string? thruPath = parsed.Single("--thru");
            Sweep? thru = thruPath is null ? null : PreparedSweep.LoadThru(thruPath);
            PreparedSweep prepared = PreparedSweep.Load(parsed.Positionals[0], thru, parsed.Single("--floor"));
            report = Measure(prepared, request, parsed.Has("--resonator"));
        }
        catch (SweepReadException e)
        {
            stderr.WriteLine(e.Message);
            return ExitCodes.BadInput;
        }
        catch (ArgumentException e)
        {
            // The measurement refused the data (e.g. a one-point sweep): the file cannot be used.
            stderr.WriteLine($"{Path.GetFileName(parsed.Positionals[0])}: the sweep cannot be measured: {e.Message}");
            return ExitCodes.BadInput;
        }

        if (parsed.Has("--json"))
        {
            stdout.WriteLine(MeasureJson.Write(report));
        }
        else
        {
            MeasureTable.Write(report, stdout);
        }
        return ExitCodes.Success;
    }

    private static FilterMeasurementRequest BuildRequest(ParsedArguments parsed)
    {
        IReadOnlyList<double> levels = parsed.Single("--levels") is { } text ? ParsedArguments.PositiveNumberList("--levels", text) : [3, 6];
        FrequencyBand? ripple = parsed.Single("--ripple-band") is { } band ? ToBand("--ripple-band", band) : null;
        FrequencyBand[] stopbands = parsed.All("--stopband").Select(s => ToBand("--stopband", s)).ToArray();
        return new FilterMeasurementRequest { LevelsDb = levels, RippleBand = ripple, Stopbands = stopbands };
    }

    private static FrequencyBand ToBand(string option, string text)
    {
        (double start, double stop) = ParsedArguments.Band(option, text);
        return new FrequencyBand(start, stop);
    }

    private static MeasureReport Measure(PreparedSweep prepared, FilterMeasurementRequest request, bool resonator)
    {
        ResponseTrace primary = prepared.Primary;
        // A one-port carries its information in S11: measure its return loss like a transmission loss.
        ResponseTrace measured = primary.Path == ResponsePath.Transmission
            ? primary
            : ResponseTrace.Create(primary.Grid, ResponsePath.Transmission, primary.LossDb, primary.PhaseRad);
        FilterMeasurement filter = FilterMeasurer.Measure(measured, request, prepared.FloorLossDb);

        var warnings = new List<string>(prepared.Warnings);
        if (primary.Path != ResponsePath.Transmission)
        {
            warnings.Add("one-port sweep: the loss figures are the return loss from |S11|");
        }
        warnings.AddRange(filter.Warnings.Select(w => w.Message));

        ResonatorMeasurement? fit = null;
        if (resonator)
        {
            fit = MeasureResonator(prepared);
            warnings.AddRange(fit.Warnings.Select(w => w.Message));
        }
        return new MeasureReport(primary.Grid, filter, fit, warnings);
    }

    private static ResonatorMeasurement MeasureResonator(PreparedSweep prepared)
    {
        Sweep sweep = prepared.Sweep;
        if (prepared.Normalised is null && sweep.Network is not null)
        {
            return ResonatorAnalyzer.Measure(sweep);
        }
        double referenceOhm = sweep.Network?.ReferenceOhm[0] ?? ResonatorOptions.Default.ScalarReferenceOhm;
        return ResonatorAnalyzer.Measure(prepared.Primary, referenceOhm, ResonatorFixture.SeriesThrough);
    }

    internal static string Number(double value) => value.ToString("R", CultureInfo.InvariantCulture);
}
