namespace FilterQA.Core.Resonators;

/// <summary>Local maxima with their prominence, and the three-point parabola between samples.</summary>
internal static class Extrema
{
    /// <summary>A local maximum: its index, its prominence (dB) and the level of its base (dB).</summary>
    internal readonly record struct Peak(int Index, double ProminenceDb, double BaseDb);

    /// <summary>Index of the largest value (the first on ties).</summary>
    internal static int ArgMax(ReadOnlySpan<double> y)
    {
        int best = 0;
        for (int i = 1; i < y.Length; i++)
        {
            if (y[i] > y[best])
            {
                best = i;
            }
        }
        return best;
    }

    /// <summary>
    /// Interior local maxima of <paramref name="levelDb"/> with at least <paramref name="minProminenceDb"/> of
    /// topographic prominence: the height above the higher of the two lowest points met walking left and right until
    /// a higher sample or the end of the trace. A maximum at the first or last point is never returned, because a
    /// skirt rising out of the span is not a mode. Plateaus count once, at their first sample.
    /// </summary>
    internal static List<Peak> ProminentPeaks(ReadOnlySpan<double> levelDb, double minProminenceDb)
    {
        var peaks = new List<Peak>();
        int n = levelDb.Length;
        for (int i = 1; i < n - 1; i++)
        {
            double y = levelDb[i];
            if (!(y > levelDb[i - 1] && y >= levelDb[i + 1]))
            {
                continue;
            }
            double leftMin = y;
            for (int j = i - 1; j >= 0 && levelDb[j] <= y; j--)
            {
                leftMin = Math.Min(leftMin, levelDb[j]);
            }
            double rightMin = y;
            int k = i + 1;
            while (k < n && levelDb[k] <= y)
            {
                rightMin = Math.Min(rightMin, levelDb[k]);
                k++;
            }
            double baseDb = Math.Max(leftMin, rightMin);
            if (y - baseDb >= minProminenceDb)
            {
                peaks.Add(new Peak(i, y - baseDb, baseDb));
            }
        }
        return peaks;
    }

    /// <summary>
    /// Vertex of the parabola through points <paramref name="i"/> − 1, i, i + 1 (frequency, value). On a uniform step h
    /// the offset is δ = h·(y₋₁ − y₊₁)/(2·(y₋₁ − 2y₀ + y₊₁)) (DOMAIN 4); the general three-point form is used so a
    /// non-uniform grid is handled too. The offset is limited to half a step. At the first or last point, or where
    /// the three points are not curved, the sampled point is returned.
    /// </summary>
    internal static (double Hz, double Value) Vertex(ReadOnlySpan<double> hz, ReadOnlySpan<double> y, int i)
    {
        if (i <= 0 || i >= y.Length - 1)
        {
            return (hz[i], y[i]);
        }
        double h1 = hz[i] - hz[i - 1], h2 = hz[i + 1] - hz[i];
        double d1 = (y[i] - y[i - 1]) / h1, d2 = (y[i + 1] - y[i]) / h2;
        double slope = (d1 * h2 + d2 * h1) / (h1 + h2);
        double curvature = (d2 - d1) / (h1 + h2);
        if (curvature == 0 || !double.IsFinite(curvature))
        {
            return (hz[i], y[i]);
        }
        double delta = Math.Clamp(-slope / (2 * curvature), -h1 / 2, h2 / 2);
        return (hz[i] + delta, y[i] + slope * delta + curvature * delta * delta);
    }

    /// <summary>
    /// Frequency where <paramref name="levelDb"/> first falls below <paramref name="targetDb"/> walking from
    /// <paramref name="start"/> in <paramref name="direction"/> (−1 or +1), linearly interpolated in dB between the
    /// two points that bracket it (DOMAIN 4). Null when the end of the trace, or a point above
    /// <paramref name="ceilingDb"/> (another, higher response), comes first.
    /// </summary>
    internal static double? Crossing(ReadOnlySpan<double> hz, ReadOnlySpan<double> levelDb, int start, int direction, double targetDb, double ceilingDb)
    {
        for (int j = start + direction; j >= 0 && j < levelDb.Length; j += direction)
        {
            if (levelDb[j] > ceilingDb)
            {
                return null;
            }
            if (levelDb[j] < targetDb)
            {
                int prev = j - direction;
                double a1 = levelDb[prev], a2 = levelDb[j];
                return hz[prev] + (targetDb - a1) * (hz[j] - hz[prev]) / (a2 - a1);
            }
        }
        return null;
    }
}
