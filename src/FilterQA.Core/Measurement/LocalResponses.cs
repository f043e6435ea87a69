namespace FilterQA.Core.Measurement;

/// <summary>
/// Local responses (local minima of loss) inside an index range that stand out by a prominence, the same measure as
/// <see cref="SpuriousResponses"/> uses: walk each way until a point of lower loss or the end of the range;
/// the highest loss met is that side's base; prominence = the lower base − the response's loss. End points of the
/// range are never responses (their other neighbour is outside), so a skirt that falls into the range is not one.
/// </summary>
internal static class LocalResponses
{
    public static List<int> Find(ReadOnlySpan<double> loss, int from, int to, double minProminenceDb)
    {
        var found = new List<int>();
        int i = from + 1;
        while (i < to - 1)
        {
            if (!(loss[i] < loss[i - 1]))
            {
                i++;
                continue;
            }
            int j = i;
            while (j + 1 < to && loss[j + 1] == loss[i])
            {
                j++;
            }
            if (j + 1 < to && loss[j + 1] > loss[i])
            {
                int peak = (i + j) / 2;
                double level = loss[peak];
                double prominence = Math.Min(Base(loss, i - 1, from - 1, -1, level), Base(loss, j + 1, to, +1, level)) - level;
                if (prominence >= minProminenceDb)
                {
                    found.Add(peak);
                }
            }
            i = j + 1;
        }
        return found;
    }

    /// <summary>Prominence of the response at <paramref name="peak"/> found by <see cref="Find"/> in the same range, dB.</summary>
    public static double Prominence(ReadOnlySpan<double> loss, int peak, int from, int to)
    {
        double level = loss[peak];
        int i = peak, j = peak;
        while (i - 1 > from && loss[i - 1] == level)
        {
            i--;
        }
        while (j + 1 < to && loss[j + 1] == level)
        {
            j++;
        }
        return Math.Min(Base(loss, i - 1, from - 1, -1, level), Base(loss, j + 1, to, +1, level)) - level;
    }

    private static double Base(ReadOnlySpan<double> loss, int start, int stop, int step, double level)
    {
        double highest = double.NegativeInfinity;
        for (int k = start; k != stop; k += step)
        {
            if (loss[k] < level)
            {
                break;
            }
            highest = Math.Max(highest, loss[k]);
        }
        return highest;
    }
}
