namespace FilterQA.Core.Measurement;

/// <summary>The half-open index range [First, End) of the grid points inside a band under the band rule.</summary>
internal readonly record struct BandIndexRange(int First, int End)
{
    public int Count => End - First;

    /// <summary>Binary search on the grid, so a band costs O(log n) to locate.</summary>
    public static BandIndexRange Of(ReadOnlySpan<double> hz, FrequencyBand band)
    {
        double low = band.StartHz * (1 - FrequencyBand.RelativeEdgeTolerance);
        double high = band.StopHz * (1 + FrequencyBand.RelativeEdgeTolerance);
        int first = FirstAtOrAbove(hz, low);
        int end = FirstAbove(hz, high);
        return new BandIndexRange(first, Math.Max(first, end));
    }

    internal static int FirstAtOrAbove(ReadOnlySpan<double> hz, double value)
    {
        int lo = 0, hi = hz.Length;
        while (lo < hi)
        {
            int mid = (lo + hi) >>> 1;
            if (hz[mid] < value)
            {
                lo = mid + 1;
            }
            else
            {
                hi = mid;
            }
        }
        return lo;
    }

    internal static int FirstAbove(ReadOnlySpan<double> hz, double value)
    {
        int lo = 0, hi = hz.Length;
        while (lo < hi)
        {
            int mid = (lo + hi) >>> 1;
            if (hz[mid] <= value)
            {
                lo = mid + 1;
            }
            else
            {
                hi = mid;
            }
        }
        return lo;
    }
}
