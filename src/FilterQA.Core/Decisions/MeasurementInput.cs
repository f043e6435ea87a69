using System.Globalization;
using FilterQA.Core.Normalisation;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Decisions;

/// <summary>
/// Everything <see cref="TemplateEvaluator.Evaluate"/> judges for one unit: the main trace (the thru-normalised
/// transmission, or the reflection of a one-port), the reflections S11 and S22 where the sweep has them, the sweep
/// itself (the resonator fit needs the complex data), and what is known about the bench: the noise floor, the
/// thru's age and flatness, and the analyser's resolution bandwidth. Immutable; validated when made.
/// </summary>
public sealed class MeasurementInput
{
    private readonly double[]? _floorLossDb;

    private MeasurementInput(Sweep sweep, ResponseTrace primary, ResponseTrace? inputReflection, ResponseTrace? outputReflection,
        double[]? floorLossDb, TimeSpan? thruAge, double? thruFlatnessDb, double? resolutionBandwidthHz, bool normalised)
    {
        Sweep = sweep;
        Primary = primary;
        InputReflection = inputReflection;
        OutputReflection = outputReflection;
        _floorLossDb = floorLossDb;
        ThruAge = thruAge;
        ThruFlatnessDb = thruFlatnessDb;
        ResolutionBandwidthHz = resolutionBandwidthHz;
        IsNormalisedByThru = normalised;
    }

    /// <summary>The sweep as read (not normalised); its grid is the grid of every trace here.</summary>
    public Sweep Sweep { get; }

    /// <summary>
    /// The main trace: the transmission (loss in dB, positive = attenuation), normalised by the thru when one was used;
    /// for a one-port sweep the input reflection (return loss, dB).
    /// </summary>
    public ResponseTrace Primary { get; }

    /// <summary>S11 as a reflection trace (return loss, dB); null when the sweep has none (a scalar trace).</summary>
    public ResponseTrace? InputReflection { get; }

    /// <summary>S22 as a reflection trace (return loss, dB); null when the sweep has none (a scalar trace or a one-port).</summary>
    public ResponseTrace? OutputReflection { get; }

    /// <summary>
    /// The noise floor as a loss, dB (positive; e.g. 95 for a floor 95 dB below the thru), one value per point of
    /// <see cref="Primary"/>'s grid; empty when no floor trace was measured (the floor is then estimated from the sweep).
    /// </summary>
    public ReadOnlySpan<double> FloorLossDb => _floorLossDb;

    /// <summary>True when a floor trace was given.</summary>
    public bool HasFloor => _floorLossDb is not null;

    /// <summary>How old the thru reference was when the unit was measured (zero or more); null when unknown or no thru was used.</summary>
    public TimeSpan? ThruAge { get; }

    /// <summary>Flatness (max − min loss) of the thru over the sweep, dB, zero or more; null when no thru was used.</summary>
    public double? ThruFlatnessDb { get; }

    /// <summary>Resolution bandwidth of the analyser for a stepped-generator sweep, Hz (above zero); null for a network analyser.</summary>
    public double? ResolutionBandwidthHz { get; }

    /// <summary>True when <see cref="Primary"/> was normalised by a thru here (see <see cref="FromSweep"/>).</summary>
    public bool IsNormalisedByThru { get; }

    /// <summary>
    /// Builds the input from a sweep: the main trace is <paramref name="normalised"/>'s response when given, else the
    /// sweep's primary path (<see cref="ResponseTrace.Primary"/>); S11 and S22 come from the sweep
    /// (<see cref="ResponseTrace.Reflection"/>); the thru flatness from <paramref name="normalised"/>.
    /// </summary>
    /// <param name="sweep">The unit's sweep.</param>
    /// <param name="normalised">The sweep's transmission normalised by a thru; null when the sweep is already normalised (a calibrated network analyser).</param>
    /// <param name="thruAge">Age of the thru when the unit was measured, zero or more; null when unknown or none was used (then the template's maximum thru age is not checked and a warning says so).</param>
    /// <param name="floorLossDb">Noise floor as loss, dB, one finite value per sweep point; null when none was measured.</param>
    /// <param name="resolutionBandwidthHz">Analyser resolution bandwidth, Hz, finite and above zero; null for a network analyser.</param>
    /// <exception cref="ArgumentException">
    /// The normalised response is not on the sweep's grid; the floor has the wrong length or a value that is not finite;
    /// the thru age is negative; the bandwidth is not finite and above zero; or the sweep is a power trace in dBm without a
    /// thru (its loss would be a level, not a loss).
    /// </exception>
    public static MeasurementInput FromSweep(Sweep sweep, NormalisedResponse? normalised = null, TimeSpan? thruAge = null,
        IReadOnlyList<double>? floorLossDb = null, double? resolutionBandwidthHz = null)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        ResponseTrace primary;
        if (normalised is not null)
        {
            primary = normalised.Response;
            if (!SameGrid(primary.Grid, sweep.Grid))
            {
                throw new ArgumentException("the normalised response is not on the sweep's frequency grid; normalise this sweep, not another", nameof(normalised));
            }
        }
        else
        {
            if (sweep.Scalar is { Quantity: ScalarQuantity.PowerDbm })
            {
                throw new ArgumentException(
                    $"'{sweep.Source.FileName}' is a power trace in dBm; it must be normalised by a thru before it can be judged", nameof(normalised));
            }
            primary = ResponseTrace.Primary(sweep);
        }
        if (thruAge is { } age && age < TimeSpan.Zero)
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture, $"the thru age cannot be negative; got {age}"), nameof(thruAge));
        }
        if (resolutionBandwidthHz is { } rbw && (!double.IsFinite(rbw) || rbw <= 0))
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                $"the resolution bandwidth must be a finite number of Hz above 0; got {rbw}"), nameof(resolutionBandwidthHz));
        }
        double[]? floor = null;
        if (floorLossDb is not null)
        {
            if (floorLossDb.Count != primary.Grid.Count)
            {
                throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                    $"the floor trace has {floorLossDb.Count} values for a sweep of {primary.Grid.Count} points; resample it onto the sweep's grid"), nameof(floorLossDb));
            }
            floor = new double[floorLossDb.Count];
            for (int i = 0; i < floor.Length; i++)
            {
                floor[i] = double.IsFinite(floorLossDb[i]) ? floorLossDb[i] : throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                    $"the floor trace value at index {i} is {floorLossDb[i]}; it must be finite"), nameof(floorLossDb));
            }
        }
        ResponseTrace? s11 = sweep.Network is { PortCount: 1 } ? primary : ResponseTrace.Reflection(sweep, 1);
        ResponseTrace? s22 = ResponseTrace.Reflection(sweep, 2);
        return new MeasurementInput(sweep, primary, s11, s22, floor, thruAge, normalised?.ThruFlatnessDb, resolutionBandwidthHz, normalised is not null);
    }

    private static bool SameGrid(FrequencyGrid a, FrequencyGrid b) =>
        ReferenceEquals(a, b) || a.Hz.SequenceEqual(b.Hz);
}
