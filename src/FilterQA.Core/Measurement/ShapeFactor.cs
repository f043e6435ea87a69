using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Measurement;

/// <summary>Shape factor: the ratio of a wide-level bandwidth to a narrow-level bandwidth, BW(A2)/BW(A1), A2 &gt; A1.</summary>
public static class ShapeFactor
{
    /// <summary>
    /// BW(<paramref name="wideLevelDb"/>)/BW(<paramref name="narrowLevelDb"/>), e.g. 60/6 dB. The narrow band uses the innermost
    /// crossings (pass bandwidth), the wide band the outermost (stop bandwidth), so the ratio is conservative for a
    /// maximum shape-factor limit. Null (inconclusive) when either band lacks an edge, typically because the wide level
    /// is never reached, or not held to the sweep end, on a side; the <c>edge-not-found</c> warnings say which.
    /// </summary>
    /// <param name="trace">A transmission trace.</param>
    /// <param name="narrowLevelDb">A1, dB below the minimum loss, finite, &gt; 0.</param>
    /// <param name="wideLevelDb">A2, dB below the minimum loss, finite, &gt; A1.</param>
    /// <param name="warnings">Optional sink for warnings.</param>
    /// <exception cref="ArgumentOutOfRangeException">A level is not finite or not above 0, or A2 is not above A1.</exception>
    public static double? Of(ResponseTrace trace, double narrowLevelDb, double wideLevelDb, ICollection<MeasurementWarning>? warnings = null)
    {
        ArgumentNullException.ThrowIfNull(trace);
        BandEdges.CheckLevel(narrowLevelDb, nameof(narrowLevelDb));
        BandEdges.CheckLevel(wideLevelDb, nameof(wideLevelDb));
        if (wideLevelDb <= narrowLevelDb)
        {
            throw new ArgumentOutOfRangeException(nameof(wideLevelDb), wideLevelDb,
                $"the wide level must be above the narrow level ({Warnings.N(narrowLevelDb)} dB)");
        }
        ReadOnlySpan<double> f = trace.Grid.Hz;
        ReadOnlySpan<double> loss = trace.LossDb;
        int m = Loss.MinimumIndex(loss);
        LevelBandwidth narrow = BandEdges.Find(f, loss, m, narrowLevelDb, EdgeSearch.Innermost, warnings);
        LevelBandwidth wide = BandEdges.Find(f, loss, m, wideLevelDb, EdgeSearch.Outermost, warnings);
        if (narrow.BandwidthHz is not { } narrowHz || wide.BandwidthHz is not { } wideHz || narrowHz <= 0)
        {
            return null;
        }
        return wideHz / narrowHz;
    }
}
