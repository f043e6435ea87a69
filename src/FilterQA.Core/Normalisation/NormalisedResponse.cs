using System.Globalization;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Normalisation;

/// <summary>
/// A device response with the thru divided out, and what the thru looked like over the device's span.
/// Immutable; validated when made.
/// </summary>
public sealed class NormalisedResponse
{
    private readonly double[] _thruLossDb;

    /// <summary>Makes the result (normally done by <see cref="ThruNormaliser"/>).</summary>
    /// <param name="response">The normalised transmission trace on the device's grid.</param>
    /// <param name="thruLossDb">The thru's loss interpolated onto the device's grid, dB (copied).</param>
    /// <param name="thruStartHz">First frequency of the thru measurement, Hz.</param>
    /// <param name="thruStopHz">Last frequency of the thru measurement, Hz.</param>
    /// <param name="thruFileName">Name of the thru file; may be empty.</param>
    /// <exception cref="ArgumentException">Lengths differ, a value is not finite, or the span is not 0 ≤ start ≤ stop.</exception>
    public NormalisedResponse(ResponseTrace response, ReadOnlySpan<double> thruLossDb, double thruStartHz, double thruStopHz, string thruFileName)
    {
        ArgumentNullException.ThrowIfNull(response);
        ArgumentNullException.ThrowIfNull(thruFileName);
        if (thruLossDb.Length != response.Grid.Count)
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                $"{thruLossDb.Length} thru losses for {response.Grid.Count} frequencies"), nameof(thruLossDb));
        }
        if (!double.IsFinite(thruStartHz) || !double.IsFinite(thruStopHz) || thruStartHz < 0 || thruStopHz < thruStartHz)
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                $"the thru span must be 0 <= start <= stop, finite; got {thruStartHz} to {thruStopHz} Hz"), nameof(thruStartHz));
        }
        double min = double.PositiveInfinity, max = double.NegativeInfinity;
        foreach (double loss in thruLossDb)
        {
            if (!double.IsFinite(loss))
            {
                throw new ArgumentException("thru losses must be finite", nameof(thruLossDb));
            }
            min = Math.Min(min, loss);
            max = Math.Max(max, loss);
        }
        Response = response;
        _thruLossDb = thruLossDb.ToArray();
        ThruFlatnessDb = max - min;
        ThruStartHz = thruStartHz;
        ThruStopHz = thruStopHz;
        ThruFileName = thruFileName;
    }

    /// <summary>
    /// The normalised transmission: loss = device loss − thru loss, dB (positive = the device attenuates
    /// more than the thru); phase (when both had phase) = device phase − thru phase, radians, wrapped into (−π, π].
    /// </summary>
    public ResponseTrace Response { get; }

    /// <summary>
    /// The thru's loss on the device's grid, dB, positive for attenuation (for a dBm power trace it is
    /// −P<sub>thru</sub>, i.e. minus the reference level in dBm).
    /// </summary>
    public ReadOnlySpan<double> ThruLossDb => _thruLossDb;

    /// <summary>
    /// Flatness of the thru over the device's span: max − min of <see cref="ThruLossDb"/>, dB, ≥ 0.
    /// A large value means the reference itself ripples (a bad cable or fixture).
    /// </summary>
    public double ThruFlatnessDb { get; }

    /// <summary>First frequency of the thru measurement, Hz.</summary>
    public double ThruStartHz { get; }

    /// <summary>Last frequency of the thru measurement, Hz.</summary>
    public double ThruStopHz { get; }

    /// <summary>Name of the thru file the reference came from; may be empty.</summary>
    public string ThruFileName { get; }
}
