using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Measurement;

/// <summary>
/// Band edges at a level below the minimum-loss point: the frequencies, on each side of the sampled
/// minimum-loss point, where the loss equals minimum loss + level, interpolated linearly in dB against
/// frequency between the two points that straddle it: fx = f1 + (X − A1)(f2 − f1)/(A2 − A1).
/// </summary>
/// <remarks>
/// An edge the trace does not reach inside the sweep is null and a warning says so; a sweep end point is never
/// reported in its place. See <see cref="EdgeSearch"/> for which crossing is taken when the trace crosses the
/// level more than once.
/// </remarks>
public static class BandEdges
{
    /// <summary>Finds the edges at <paramref name="levelDb"/> below the minimum-loss point.</summary>
    /// <param name="trace">A transmission trace (any trace is accepted).</param>
    /// <param name="levelDb">Relative level, dB, finite and &gt; 0 (3 for the −3 dB band).</param>
    /// <param name="search">Innermost (pass bandwidth, the default) or outermost (stop bandwidth).</param>
    /// <param name="warnings">Optional sink; an <c>edge-not-found</c> warning per missing edge.</param>
    /// <exception cref="ArgumentOutOfRangeException">The level is not finite or not above 0.</exception>
    public static LevelBandwidth Find(ResponseTrace trace, double levelDb, EdgeSearch search = EdgeSearch.Innermost,
        ICollection<MeasurementWarning>? warnings = null)
    {
        ArgumentNullException.ThrowIfNull(trace);
        CheckLevel(levelDb, nameof(levelDb));
        ReadOnlySpan<double> loss = trace.LossDb;
        return Find(trace.Grid.Hz, loss, Loss.MinimumIndex(loss), levelDb, search, warnings);
    }

    internal static void CheckLevel(double levelDb, string name)
    {
        if (!double.IsFinite(levelDb) || levelDb <= 0)
        {
            throw new ArgumentOutOfRangeException(name, levelDb, "a band-edge level must be a finite number of dB above 0");
        }
    }

    internal static LevelBandwidth Find(ReadOnlySpan<double> f, ReadOnlySpan<double> loss, int minIndex, double levelDb, EdgeSearch search,
        ICollection<MeasurementWarning>? warnings)
    {
        double target = loss[minIndex] + levelDb;
        double? lower = search == EdgeSearch.Innermost ? InnerLower(f, loss, minIndex, target) : OuterLower(f, loss, minIndex, target);
        double? upper = search == EdgeSearch.Innermost ? InnerUpper(f, loss, minIndex, target) : OuterUpper(f, loss, minIndex, target);
        if (warnings is not null)
        {
            if (lower is null)
            {
                Missing(warnings, f, loss, minIndex, levelDb, search, "lower", f[0]);
            }
            if (upper is null)
            {
                Missing(warnings, f, loss, minIndex, levelDb, search, "upper", f[^1]);
            }
        }
        return LevelBandwidth.FromEdges(levelDb, lower, upper);
    }

    private static void Missing(ICollection<MeasurementWarning> warnings, ReadOnlySpan<double> f, ReadOnlySpan<double> loss, int minIndex, double levelDb,
        EdgeSearch search, string side, double endHz)
    {
        string what = search == EdgeSearch.Innermost
            ? "is not reached"
            : "is not held to the sweep end";
        warnings.Add(new MeasurementWarning(MeasurementWarningCodes.EdgeNotFound,
            $"{side} edge at {Warnings.N(levelDb)} dB below the minimum loss ({Warnings.N(loss[minIndex])} dB at {Warnings.N(f[minIndex])} Hz): the level {Warnings.N(loss[minIndex] + levelDb)} dB {what} between the minimum and the sweep end at {Warnings.N(endHz)} Hz"));
    }

    // A crossing lies between j (at or above the target) and k (below it); A_j != A_k, so the division is safe.
    private static double Cross(ReadOnlySpan<double> f, ReadOnlySpan<double> loss, int j, int k, double target) =>
        f[j] + (target - loss[j]) * (f[k] - f[j]) / (loss[k] - loss[j]);

    private static double? InnerLower(ReadOnlySpan<double> f, ReadOnlySpan<double> loss, int m, double target)
    {
        for (int j = m - 1; j >= 0; j--)
        {
            if (loss[j] >= target)
            {
                return Cross(f, loss, j, j + 1, target);
            }
        }
        return null;
    }

    private static double? InnerUpper(ReadOnlySpan<double> f, ReadOnlySpan<double> loss, int m, double target)
    {
        for (int j = m + 1; j < loss.Length; j++)
        {
            if (loss[j] >= target)
            {
                return Cross(f, loss, j, j - 1, target);
            }
        }
        return null;
    }

    private static double? OuterLower(ReadOnlySpan<double> f, ReadOnlySpan<double> loss, int m, double target)
    {
        if (m == 0 || loss[0] < target)
        {
            return null;
        }
        int j = 0;
        while (loss[j + 1] >= target)
        {
            j++;
        }
        return Cross(f, loss, j, j + 1, target);
    }

    private static double? OuterUpper(ReadOnlySpan<double> f, ReadOnlySpan<double> loss, int m, double target)
    {
        int last = loss.Length - 1;
        if (m == last || loss[last] < target)
        {
            return null;
        }
        int j = last;
        while (loss[j - 1] >= target)
        {
            j--;
        }
        return Cross(f, loss, j, j - 1, target);
    }
}
