using System.Globalization;

namespace FilterQA.Core.Statistics;

/// <summary>
/// Counts of values in bins [e_i, e_{i+1}) (the last bin also holds its upper edge), plus the values
/// below the first edge and above the last. Edges in the values' unit, increasing.
/// </summary>
public sealed class Histogram
{
    /// <summary>Most bins a rule will make (a far outlier would otherwise ask for millions).</summary>
    public const int MaxBins = 1000;

    private readonly double[] _edges;
    private readonly int[] _counts;

    private Histogram(double[] edges, int[] counts, int below, int above)
    {
        _edges = edges;
        _counts = counts;
        BelowRange = below;
        AboveRange = above;
    }

    /// <summary>Bin edges, one more than the bins.</summary>
    public ReadOnlySpan<double> Edges => _edges;

    /// <summary>Values in each bin.</summary>
    public ReadOnlySpan<int> Counts => _counts;

    /// <summary>Number of bins.</summary>
    public int BinCount => _counts.Length;

    /// <summary>Values below the first edge (given edges only; 0 for a rule).</summary>
    public int BelowRange { get; }

    /// <summary>Values above the last edge (given edges only; 0 for a rule).</summary>
    public int AboveRange { get; }

    /// <summary>
    /// Equal-width bins from the minimum to the maximum chosen by <paramref name="rule"/> (at most
    /// <see cref="MaxBins"/>). All values equal: a single bin of zero width holding them all.
    /// </summary>
    /// <exception cref="ArgumentException">Empty, or a value NaN or infinite (index named).</exception>
    public static Histogram Create(ReadOnlySpan<double> values, HistogramBinRule rule = HistogramBinRule.FreedmanDiaconis)
    {
        SampleMoments moments = SampleMoments.Of(values);
        double min = moments.Minimum, max = moments.Maximum;
        if (min == max)
        {
            return new Histogram([min, max], [values.Length], 0, 0);
        }
        int n = values.Length;
        int bins = SturgesBins(n);
        if (rule == HistogramBinRule.FreedmanDiaconis)
        {
            double iqr = MathNet.Numerics.Statistics.Statistics.InterquartileRange(values.ToArray());
            if (iqr > 0)
            {
                double width = 2 * iqr / Math.Cbrt(n);
                bins = (int)Math.Min(MaxBins, Math.Max(1, Math.Ceiling((max - min) / width)));
            }
        }
        else if (rule != HistogramBinRule.Sturges)
        {
            throw new ArgumentOutOfRangeException(nameof(rule), rule, "not a defined bin rule");
        }
        var edges = new double[bins + 1];
        for (int i = 0; i <= bins; i++)
        {
            edges[i] = min + (max - min) * i / bins;
        }
        edges[^1] = max;
        return Count(values, edges);
    }

    /// <summary>Bins with the caller's edges; values outside go to <see cref="BelowRange"/> / <see cref="AboveRange"/>.</summary>
    /// <exception cref="ArgumentException">Fewer than 2 edges, edges not finite or not strictly increasing, or a value NaN or infinite.</exception>
    public static Histogram FromEdges(ReadOnlySpan<double> values, ReadOnlySpan<double> edges)
    {
        SampleMoments.CheckValues(values, 0);
        if (edges.Length < 2)
        {
            throw new ArgumentException("a histogram needs at least 2 edges", nameof(edges));
        }
        for (int i = 0; i < edges.Length; i++)
        {
            if (!double.IsFinite(edges[i]) || (i > 0 && edges[i] <= edges[i - 1]))
            {
                throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                    $"edge at index {i} ({edges[i]}) must be finite and above the one before it"), nameof(edges));
            }
        }
        return Count(values, edges.ToArray());
    }

    /// <summary>⌈log₂ n⌉ + 1.</summary>
    internal static int SturgesBins(int n) => (int)Math.Ceiling(Math.Log2(n)) + 1;

    private static Histogram Count(ReadOnlySpan<double> values, double[] edges)
    {
        var counts = new int[edges.Length - 1];
        int below = 0, above = 0;
        foreach (double v in values)
        {
            if (v < edges[0])
            {
                below++;
            }
            else if (v > edges[^1])
            {
                above++;
            }
            else
            {
                // Upper-bound search: index of the first edge above v, minus one; the top edge joins the last bin.
                int index = Array.BinarySearch(edges, v);
                int bin = index >= 0 ? index : ~index - 1;
                counts[Math.Min(bin, counts.Length - 1)]++;
            }
        }
        return new Histogram(edges, counts, below, above);
    }
}
