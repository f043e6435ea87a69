using System.Globalization;

namespace FilterQA.Core.Statistics;

/// <summary>Count, mean, sample standard deviation (n − 1), minimum and maximum of finite values.</summary>
/// <param name="Count">Number of values.</param>
/// <param name="Mean">Arithmetic mean, value unit.</param>
/// <param name="StandardDeviation">Sample standard deviation with n − 1, value unit; NaN for a single value.</param>
/// <param name="Minimum">Smallest value.</param>
/// <param name="Maximum">Largest value.</param>
public readonly record struct SampleMoments(int Count, double Mean, double StandardDeviation, double Minimum, double Maximum)
{
    /// <summary>
    /// Computes the moments in two passes (mean, then deviations with the rounding-error
    /// correction term), which keeps small spreads on large offsets (kHz on MHz) accurate.
    /// </summary>
    /// <exception cref="ArgumentException">Empty, or a value NaN or infinite (index named).</exception>
    public static SampleMoments Of(ReadOnlySpan<double> values)
    {
        CheckValues(values, 1);
        double sum = 0, min = double.PositiveInfinity, max = double.NegativeInfinity;
        foreach (double v in values)
        {
            sum += v;
            min = Math.Min(min, v);
            max = Math.Max(max, v);
        }
        int n = values.Length;
        double mean = sum / n;
        double squares = 0, deviations = 0;
        foreach (double v in values)
        {
            double d = v - mean;
            squares += d * d;
            deviations += d;
        }
        double sd = n < 2 ? double.NaN : Math.Sqrt(Math.Max(0, (squares - deviations * deviations / n) / (n - 1)));
        return new SampleMoments(n, mean, sd, min, max);
    }

    internal static void CheckValues(ReadOnlySpan<double> values, int minimumCount)
    {
        if (values.Length < minimumCount)
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                $"needs at least {minimumCount} value(s); got {values.Length}"), nameof(values));
        }
        for (int i = 0; i < values.Length; i++)
        {
            if (!double.IsFinite(values[i]))
            {
                throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                    $"value at index {i} is {values[i]}; leave out units without a valid measurement and count them separately"), nameof(values));
            }
        }
    }
}
