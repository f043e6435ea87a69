using System.Globalization;

namespace FilterQA.Core.Statistics;

/// <summary>Per-lot summaries of one parameter over time, oldest first (ties by lot id, ordinal).</summary>
public sealed class LotTrend
{
    private LotTrend(string parameter, LotTrendPoint[] points)
    {
        Parameter = parameter;
        Points = points;
    }

    /// <summary>Parameter the trend follows.</summary>
    public string Parameter { get; }

    /// <summary>Lots in time order.</summary>
    public IReadOnlyList<LotTrendPoint> Points { get; }

    /// <summary>Builds a trend; the points are put in time order.</summary>
    /// <exception cref="ArgumentException">Empty parameter name, a null point, an empty or repeated lot id, a non-finite mean or Cpk, or a yield outside 0..1.</exception>
    public static LotTrend Create(string parameter, IEnumerable<LotTrendPoint> points)
    {
        ArgumentException.ThrowIfNullOrEmpty(parameter);
        ArgumentNullException.ThrowIfNull(points);
        LotTrendPoint[] all = points.ToArray();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        for (int i = 0; i < all.Length; i++)
        {
            LotTrendPoint p = all[i] ?? throw new ArgumentException(Invariant($"point {i} is null"), nameof(points));
            if (string.IsNullOrEmpty(p.LotId) || !seen.Add(p.LotId))
            {
                throw new ArgumentException(Invariant($"point {i}: lot id '{p.LotId}' is empty or repeated"), nameof(points));
            }
            if (!double.IsFinite(p.Mean) || (p.Cpk is { } c && !double.IsFinite(c)))
            {
                throw new ArgumentException(Invariant($"lot '{p.LotId}': mean {p.Mean} and Cpk {p.Cpk} must be finite"), nameof(points));
            }
            if (!(p.FirstPassYield is >= 0 and <= 1) || !(p.FinalYield is >= 0 and <= 1))
            {
                throw new ArgumentException(Invariant($"lot '{p.LotId}': yields {p.FirstPassYield} and {p.FinalYield} must be fractions 0..1"), nameof(points));
            }
        }
        LotTrendPoint[] ordered = all.OrderBy(p => p.TestedAt).ThenBy(p => p.LotId, StringComparer.Ordinal).ToArray();
        return new LotTrend(parameter, ordered);
    }

    /// <summary>Means in time order, parameter unit.</summary>
    public double[] Means() => Points.Select(p => p.Mean).ToArray();

    /// <summary>Cpk in time order; NaN where a lot has none.</summary>
    public double[] Cpks() => Points.Select(p => p.Cpk ?? double.NaN).ToArray();

    /// <summary>First-pass yields in time order, 0..1.</summary>
    public double[] FirstPassYields() => Points.Select(p => p.FirstPassYield).ToArray();

    /// <summary>Final yields in time order, 0..1.</summary>
    public double[] FinalYields() => Points.Select(p => p.FinalYield).ToArray();

    /// <summary>
    /// Least-squares slope of a series against lot number (0, 1, 2, ... in time order), in the
    /// series' unit per lot; NaN entries (lots without Cpk) are skipped; NaN with fewer than 2 usable lots.
    /// </summary>
    public static double SlopePerLot(ReadOnlySpan<double> series)
    {
        double n = 0, sx = 0, sy = 0;
        for (int i = 0; i < series.Length; i++)
        {
            if (!double.IsNaN(series[i]))
            {
                n++;
                sx += i;
                sy += series[i];
            }
        }
        if (n < 2)
        {
            return double.NaN;
        }
        double mx = sx / n, my = sy / n, sxy = 0, sxx = 0;
        for (int i = 0; i < series.Length; i++)
        {
            if (!double.IsNaN(series[i]))
            {
                sxy += (i - mx) * (series[i] - my);
                sxx += (i - mx) * (i - mx);
            }
        }
        return sxy / sxx;
    }

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
