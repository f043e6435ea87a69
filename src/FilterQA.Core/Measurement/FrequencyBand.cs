using System.Globalization;

namespace FilterQA.Core.Measurement;

/// <summary>
/// A closed frequency interval [<see cref="StartHz"/>, <see cref="StopHz"/>], Hz, over which a
/// measurement reads the sweep's own points. Immutable; validated when made.
/// </summary>
/// <remarks>
/// The band rule is a fixed contract: a sweep point at f is inside when
/// StartHz·(1 − <see cref="RelativeEdgeTolerance"/>) ≤ f ≤ StopHz·(1 + <see cref="RelativeEdgeTolerance"/>).
/// The tolerance only absorbs the rounding of frequencies written to files; nothing is ever
/// interpolated at a band edge.
/// </remarks>
public sealed record FrequencyBand
{
    /// <summary>Relative tolerance of the band edges, 1e-9 (a point at 1 GHz may sit 1 Hz outside and still count).</summary>
    public const double RelativeEdgeTolerance = 1e-9;

    /// <summary>Makes a band.</summary>
    /// <param name="startHz">Lower edge, Hz; finite, ≥ 0.</param>
    /// <param name="stopHz">Upper edge, Hz; finite, ≥ <paramref name="startHz"/> (equal makes a one-frequency band).</param>
    /// <exception cref="ArgumentOutOfRangeException">An edge is NaN, infinite or negative, or stop is below start.</exception>
    public FrequencyBand(double startHz, double stopHz)
    {
        if (!double.IsFinite(startHz) || startHz < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(startHz), startHz, "a band's start must be a finite frequency >= 0 Hz");
        }
        if (!double.IsFinite(stopHz) || stopHz < startHz)
        {
            throw new ArgumentOutOfRangeException(nameof(stopHz), stopHz, string.Create(CultureInfo.InvariantCulture,
                $"a band's stop must be a finite frequency >= its start ({startHz:R} Hz)"));
        }
        StartHz = startHz;
        StopHz = stopHz;
    }

    /// <summary>Lower edge, Hz.</summary>
    public double StartHz { get; }

    /// <summary>Upper edge, Hz.</summary>
    public double StopHz { get; }

    /// <summary>Width, Hz (StopHz − StartHz, ≥ 0).</summary>
    public double WidthHz => StopHz - StartHz;

    /// <summary>True when a point at <paramref name="hz"/> is inside under the band rule (false for NaN).</summary>
    public bool Contains(double hz) =>
        hz >= StartHz * (1 - RelativeEdgeTolerance) && hz <= StopHz * (1 + RelativeEdgeTolerance);

    /// <summary>
    /// True when a sweep from <paramref name="sweepStartHz"/> to <paramref name="sweepStopHz"/> reaches both edges
    /// (within the same relative tolerance).
    /// </summary>
    public bool IsCoveredBy(double sweepStartHz, double sweepStopHz) =>
        sweepStartHz <= StartHz * (1 + RelativeEdgeTolerance) && sweepStopHz >= StopHz * (1 - RelativeEdgeTolerance);

    /// <summary>The band as text, e.g. "1000000–2000000 Hz" (invariant culture, to the millihertz).</summary>
    public override string ToString() => string.Create(CultureInfo.InvariantCulture, $"{StartHz:0.###}–{StopHz:0.###} Hz");
}
