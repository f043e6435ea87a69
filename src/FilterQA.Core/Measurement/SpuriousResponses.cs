using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Measurement;

/// <summary>
/// Spurious responses: local maxima of transmission outside a stated passband that come closer to the passband
/// level than a threshold.
/// </summary>
/// <remarks>
/// Prominence, as for peaks on a map: from the candidate, walk each way until a point of lower loss (stronger transmission)
/// or the end of the searched region; the highest loss met on the way is that side's base. Prominence = the lower of the two
/// bases − the candidate's loss. A response must stand out by at least the prominence asked for, so the point-to-point
/// ripple of noise is not reported as a string of responses. The excluded passband splits the sweep into two regions
/// searched separately; a point at a region's end is never a candidate (its other neighbour is unknown). A flat top
/// counts once, at its middle point.
/// </remarks>
public static class SpuriousResponses
{
    /// <summary>Default prominence, dB: 3 dB, well above the ripple of a clean trace (common practice, no published source).</summary>
    public const double DefaultProminenceDb = 3;

    /// <summary>Finds the spurious responses.</summary>
    /// <param name="trace">A transmission trace.</param>
    /// <param name="passband">Band excluded from the search (band rule of <see cref="FrequencyBand"/>): the passband, or the widest band edges asked for.</param>
    /// <param name="maxRelativeLevelDb">Report responses less than or equal to this many dB below the minimum-loss level (e.g. 60); finite.</param>
    /// <param name="minProminenceDb">Least prominence, dB; finite, &gt; 0.</param>
    /// <returns>The responses in order of frequency; empty when none.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The threshold is not finite, or the prominence is not finite and above 0.</exception>
    public static IReadOnlyList<SpuriousResponse> Find(ResponseTrace trace, FrequencyBand passband, double maxRelativeLevelDb,
        double minProminenceDb = DefaultProminenceDb)
    {
        ArgumentNullException.ThrowIfNull(trace);
        ArgumentNullException.ThrowIfNull(passband);
        if (!double.IsFinite(maxRelativeLevelDb))
        {
            throw new ArgumentOutOfRangeException(nameof(maxRelativeLevelDb), maxRelativeLevelDb, "the spurious threshold must be a finite number of dB");
        }
        if (!double.IsFinite(minProminenceDb) || minProminenceDb <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(minProminenceDb), minProminenceDb, "the prominence must be a finite number of dB above 0");
        }
        ReadOnlySpan<double> f = trace.Grid.Hz;
        ReadOnlySpan<double> loss = trace.LossDb;
        double reference = loss[Loss.MinimumIndex(loss)];
        BandIndexRange excluded = BandIndexRange.Of(f, passband);
        var found = new List<SpuriousResponse>();
        Search(f, loss, 0, excluded.First, reference, maxRelativeLevelDb, minProminenceDb, found);
        Search(f, loss, excluded.End, loss.Length, reference, maxRelativeLevelDb, minProminenceDb, found);
        return found.ToArray();
    }

    private static void Search(ReadOnlySpan<double> f, ReadOnlySpan<double> loss, int from, int to, double reference, double threshold,
        double minProminence, List<SpuriousResponse> found)
    {
        foreach (int peak in LocalResponses.Find(loss, from, to, minProminence))
        {
            double level = loss[peak];
            if (level - reference <= threshold)
            {
                found.Add(new SpuriousResponse(f[peak], level, level - reference, LocalResponses.Prominence(loss, peak, from, to)));
            }
        }
    }
}
