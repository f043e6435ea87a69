using System.Numerics;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Measurement;

/// <summary>Loss readings of a trace: the minimum-loss point and the loss at a stated frequency.</summary>
public static class Loss
{
    /// <summary>
    /// The sampled point of least loss (for a transmission trace, the insertion loss at maximum transmission).
    /// No interpolation between points: the value is the point's own. The first such point wins a tie.
    /// </summary>
    /// <param name="trace">Any trace; at least one point.</param>
    public static LossPoint Minimum(ResponseTrace trace)
    {
        ArgumentNullException.ThrowIfNull(trace);
        ReadOnlySpan<double> loss = trace.LossDb;
        int index = MinimumIndex(loss);
        return new LossPoint(index, trace.Grid[index], loss[index]);
    }

    /// <summary>
    /// Loss at <paramref name="hz"/>, dB (positive = attenuation), interpolated linearly in dB between the two
    /// neighbouring points (a grid point gives its own value). Null, with an <c>outside-sweep</c> warning, when
    /// the frequency lies outside the sweep.
    /// </summary>
    /// <param name="trace">Any trace.</param>
    /// <param name="hz">Frequency, Hz; NaN or infinity is outside every sweep.</param>
    /// <param name="warnings">Optional sink for warnings.</param>
    public static double? At(ResponseTrace trace, double hz, ICollection<MeasurementWarning>? warnings = null)
    {
        ArgumentNullException.ThrowIfNull(trace);
        ReadOnlySpan<double> f = trace.Grid.Hz;
        if (!(hz >= f[0] && hz <= f[^1]))
        {
            Warnings.Add(warnings, MeasurementWarningCodes.OutsideSweep,
                $"loss asked for at {Warnings.N(hz)} Hz, outside the sweep {Warnings.N(f[0])}–{Warnings.N(f[^1])} Hz");
            return null;
        }
        return Interpolate(f, trace.LossDb, hz);
    }

    /// <summary>Index of the first point of least loss. The values are finite (a trace guarantees it), so a vector minimum is exact.</summary>
    internal static int MinimumIndex(ReadOnlySpan<double> loss)
    {
        double least = MinimumValue(loss);
        int width = Vector<double>.Count;
        int i = 0;
        if (Vector.IsHardwareAccelerated)
        {
            var target = new Vector<double>(least);
            for (; i <= loss.Length - width; i += width)
            {
                if (Vector.EqualsAny(new Vector<double>(loss[i..]), target))
                {
                    break;
                }
            }
        }
        for (; i < loss.Length; i++)
        {
            if (loss[i] == least)
            {
                return i;
            }
        }
        return 0;
    }

    private static double MinimumValue(ReadOnlySpan<double> values)
    {
        int width = Vector<double>.Count;
        int i = 0;
        double least = values[0];
        if (Vector.IsHardwareAccelerated && values.Length >= 2 * width)
        {
            var lanes = new Vector<double>(values);
            for (i = width; i <= values.Length - width; i += width)
            {
                lanes = Vector.Min(lanes, new Vector<double>(values[i..]));
            }
            for (int k = 0; k < width; k++)
            {
                least = Math.Min(least, lanes[k]);
            }
        }
        for (; i < values.Length; i++)
        {
            least = Math.Min(least, values[i]);
        }
        return least;
    }

    /// <summary>Linear interpolation of <paramref name="y"/> at <paramref name="x"/> inside [f[0], f[^1]].</summary>
    internal static double Interpolate(ReadOnlySpan<double> f, ReadOnlySpan<double> y, double x)
    {
        int hi = f.BinarySearch(x);
        if (hi >= 0)
        {
            return y[hi];
        }
        hi = ~hi;
        int lo = hi - 1;
        return y[lo] + (x - f[lo]) * (y[hi] - y[lo]) / (f[hi] - f[lo]);
    }
}
