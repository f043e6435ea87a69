using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Measurement;

/// <summary>Passband ripple: the largest minus the smallest loss over a band, read on the sweep's own points.</summary>
public static class PassbandRipple
{
    /// <summary>
    /// Ripple over <paramref name="band"/>, dB (≥ 0): max − min of the loss at the points inside the band under the
    /// band rule of <see cref="FrequencyBand"/>; nothing is interpolated at the band edges. Null, with a
    /// <c>band-empty</c> warning, when no point is inside; a <c>band-not-covered</c> warning when the band reaches
    /// beyond the sweep (the points inside are still used).
    /// </summary>
    public static double? Over(ResponseTrace trace, FrequencyBand band, ICollection<MeasurementWarning>? warnings = null)
    {
        ArgumentNullException.ThrowIfNull(trace);
        ArgumentNullException.ThrowIfNull(band);
        ReadOnlySpan<double> f = trace.Grid.Hz;
        BandIndexRange range = BandIndexRange.Of(f, band);
        Warnings.BandCoverage(warnings, f, band, range, "ripple band");
        return Over(trace.LossDb, range);
    }

    internal static double? Over(ReadOnlySpan<double> loss, BandIndexRange range)
    {
        if (range.Count == 0)
        {
            return null;
        }
        double max = double.NegativeInfinity, min = double.PositiveInfinity;
        for (int i = range.First; i < range.End; i++)
        {
            double value = loss[i];
            max = Math.Max(max, value);
            min = Math.Min(min, value);
        }
        return max - min;
    }
}
