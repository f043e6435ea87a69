using System.Globalization;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Normalisation;

/// <summary>
/// Moves values given on one frequency grid onto another by linear interpolation in the value against
/// frequency (for dB values: linear in dB, as band-edge interpolation is done). One merge walk over both
/// grids, O(n + m). It never extrapolates: the source must cover the target's span.
/// </summary>
public static class LinearResampler
{
    /// <summary>
    /// Relative tolerance on coverage, 1e-9: a target end may lie beyond the source end by up to 1e-9 of
    /// the larger of the two frequencies (instruments round frequencies in their exports); such a point
    /// takes the end value.
    /// </summary>
    public const double CoverageRelativeTolerance = 1e-9;

    /// <summary>True when <paramref name="source"/> spans <paramref name="target"/> within <see cref="CoverageRelativeTolerance"/>.</summary>
    public static bool Covers(FrequencyGrid source, FrequencyGrid target)
    {
        ArgumentNullException.ThrowIfNull(source);
        ArgumentNullException.ThrowIfNull(target);
        double startSlack = CoverageRelativeTolerance * Math.Max(source.StartHz, target.StartHz);
        double stopSlack = CoverageRelativeTolerance * Math.Max(source.StopHz, target.StopHz);
        return target.StartHz >= source.StartHz - startSlack && target.StopHz <= source.StopHz + stopSlack;
    }

    /// <summary>
    /// Interpolates <paramref name="values"/> (one per point of <paramref name="source"/>) at every point of
    /// <paramref name="target"/> into <paramref name="result"/>. A target point equal to a source point gets
    /// that value exactly. NaN values spread to the results that use them.
    /// </summary>
    /// <returns>False, with <paramref name="result"/> untouched, when the source does not cover the target.</returns>
    /// <exception cref="ArgumentException"><paramref name="values"/> or <paramref name="result"/> has the wrong length.</exception>
    public static bool TryResample(FrequencyGrid source, ReadOnlySpan<double> values, FrequencyGrid target, Span<double> result)
    {
        ArgumentNullException.ThrowIfNull(source);
        ArgumentNullException.ThrowIfNull(target);
        if (values.Length != source.Count)
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                $"{values.Length} values for a source grid of {source.Count} points"), nameof(values));
        }
        if (result.Length != target.Count)
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                $"result has {result.Length} places for a target grid of {target.Count} points"), nameof(result));
        }
        if (!Covers(source, target))
        {
            return false;
        }
        ReadOnlySpan<double> s = source.Hz;
        ReadOnlySpan<double> t = target.Hz;
        if (s.Length == 1)
        {
            result.Fill(values[0]);
            return true;
        }
        int j = 0;
        for (int k = 0; k < t.Length; k++)
        {
            double f = t[k];
            while (j < s.Length - 2 && s[j + 1] < f)
            {
                j++;
            }
            if (f <= s[j])
            {
                result[k] = values[j];
            }
            else if (f >= s[j + 1])
            {
                result[k] = values[j + 1];
            }
            else
            {
                result[k] = values[j] + (values[j + 1] - values[j]) * ((f - s[j]) / (s[j + 1] - s[j]));
            }
        }
        return true;
    }

    /// <summary>Interpolates like <see cref="TryResample"/> into a new array.</summary>
    /// <exception cref="ArgumentException">The source does not cover the target (the message gives both spans in Hz), or lengths disagree.</exception>
    public static double[] Resample(FrequencyGrid source, ReadOnlySpan<double> values, FrequencyGrid target)
    {
        ArgumentNullException.ThrowIfNull(target);
        var result = new double[target.Count];
        if (!TryResample(source, values, target, result))
        {
            throw new ArgumentException(CoverageProblem("the source", source, target), nameof(target));
        }
        return result;
    }

    /// <summary>"{what} covers A–B Hz but the target needs C–D Hz", for error messages.</summary>
    internal static string CoverageProblem(string what, FrequencyGrid source, FrequencyGrid target) =>
        string.Create(CultureInfo.InvariantCulture,
            $"{what} covers {source.StartHz:R}\u2013{source.StopHz:R} Hz but the sweep needs {target.StartHz:R}\u2013{target.StopHz:R} Hz");
}
