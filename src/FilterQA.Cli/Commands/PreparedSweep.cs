using FilterQA.Core.Formats;
using FilterQA.Core.Normalisation;
using FilterQA.Core.Sweeps;

namespace FilterQA.Cli.Commands;

/// <summary>
/// A sweep read from its file, normalised by a thru when one is given, with a noise-floor trace
/// (normalised the same way) resampled onto its grid. Every failure is a <see cref="SweepReadException"/>
/// naming the file that cannot be read or used.
/// </summary>
internal sealed class PreparedSweep
{
    private PreparedSweep(Sweep sweep, ResponseTrace primary, NormalisedResponse? normalised, double[]? floorLossDb, IReadOnlyList<string> warnings)
    {
        Sweep = sweep;
        Primary = primary;
        Normalised = normalised;
        FloorLossDb = floorLossDb;
        Warnings = warnings;
    }

    /// <summary>The sweep as read.</summary>
    public Sweep Sweep { get; }

    /// <summary>The main path (S21, S11 of a one-port, or the scalar trace), after the thru when one was given.</summary>
    public ResponseTrace Primary { get; }

    /// <summary>The normalisation, when a thru was given.</summary>
    public NormalisedResponse? Normalised { get; }

    /// <summary>Loss of the noise-floor trace on the sweep's grid, dB; null without a floor file.</summary>
    public double[]? FloorLossDb { get; }

    /// <summary>Reader and normalisation warnings, in plain words.</summary>
    public IReadOnlyList<string> Warnings { get; }

    /// <summary>Reads and prepares <paramref name="sweepPath"/>.</summary>
    /// <exception cref="SweepReadException">A file cannot be read, or the thru or floor does not cover the sweep.</exception>
    public static PreparedSweep Load(string sweepPath, Sweep? thru, string? floorPath)
    {
        Sweep sweep = SweepFileReader.ReadFile(sweepPath);
        var warnings = new List<string>(sweep.Source.Warnings.Select(w => $"{sweep.Source.FileName}: {w}"));
        NormalisedResponse? normalised = null;
        ResponseTrace primary;
        if (thru is not null)
        {
            normalised = Normalise(sweep, thru);
            primary = normalised.Response;
            warnings.Add(string.Create(System.Globalization.CultureInfo.InvariantCulture,
                $"normalised by thru {thru.Source.FileName}; thru flatness over the sweep {normalised.ThruFlatnessDb:0.###} dB"));
        }
        else
        {
            primary = ResponseTrace.Primary(sweep);
            if (sweep.Scalar?.Quantity == ScalarQuantity.PowerDbm)
            {
                warnings.Add("the sweep is a power trace in dBm and no --thru was given: losses are read as dB below 1 mW, not relative to a thru");
            }
        }
        double[]? floorLossDb = floorPath is null ? null : LoadFloor(floorPath, thru, primary.Grid);
        return new PreparedSweep(sweep, primary, normalised, floorLossDb, warnings);
    }

    /// <summary>Reads a thru reference file.</summary>
    public static Sweep LoadThru(string path) => SweepFileReader.ReadFile(path);

    private static NormalisedResponse Normalise(Sweep sweep, Sweep thru)
    {
        if (sweep.Network is { PortCount: 1 })
        {
            throw new SweepReadException(sweep.Source.FileName, 0, 0,
                "a one-port (reflection) sweep cannot be normalised by a thru; measure it without --thru");
        }
        try
        {
            return ThruNormaliser.Normalise(sweep, thru);
        }
        catch (ArgumentException e)
        {
            throw new SweepReadException(thru.Source.FileName, 0, 0, $"the thru cannot be applied: {e.Message}", e);
        }
    }

    private static double[] LoadFloor(string floorPath, Sweep? thru, FrequencyGrid target)
    {
        Sweep floor = SweepFileReader.ReadFile(floorPath);
        ResponseTrace floorTrace = thru is null ? ResponseTrace.Primary(floor) : Normalise(floor, thru).Response;
        if (!LinearResampler.Covers(floorTrace.Grid, target))
        {
            throw new SweepReadException(floor.Source.FileName, 0, 0, string.Create(System.Globalization.CultureInfo.InvariantCulture,
                $"the noise-floor trace covers {floorTrace.Grid.StartHz:R}–{floorTrace.Grid.StopHz:R} Hz but the sweep needs {target.StartHz:R}–{target.StopHz:R} Hz"));
        }
        return LinearResampler.Resample(floorTrace.Grid, floorTrace.LossDb, target);
    }
}
