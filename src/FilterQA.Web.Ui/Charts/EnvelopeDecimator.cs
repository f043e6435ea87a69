using System.Collections.Immutable;
using FilterQA.Core.Sweeps;

namespace FilterQA.Web.Ui.Charts;

/// <summary>
/// Reduces the sweeps of a whole lot to a min/max envelope the browser can draw: N traces on possibly
/// different grids become K equal-width frequency bins over the union of their spans, each holding the
/// smallest and largest loss of any point that falls in it. One pass over every point: O(total points),
/// no sorting, no resampling, so the envelope never invents a value between measured points.
/// </summary>
public static class EnvelopeDecimator
{
    /// <summary>Bins a chart needs to look continuous on a wide screen without sending every point.</summary>
    public const int DefaultBinCount = 800;

    /// <summary>
    /// The envelope of <paramref name="traces"/> in <paramref name="binCount"/> bins. Bin b covers
    /// [start + b·w, start + (b+1)·w) with w = (stop − start) / K; the last bin also holds the stop
    /// frequency. When every trace has the same single frequency, there is one bin of zero width.
    /// </summary>
    /// <exception cref="ArgumentNullException"><paramref name="traces"/> or one of them is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="binCount"/> below 1.</exception>
    public static LossEnvelope Decimate(IReadOnlyList<ResponseTrace> traces, int binCount = DefaultBinCount)
    {
        ArgumentNullException.ThrowIfNull(traces);
        ArgumentOutOfRangeException.ThrowIfLessThan(binCount, 1);
        if (traces.Count == 0)
        {
            return LossEnvelope.Empty;
        }
        double startHz = double.PositiveInfinity, stopHz = double.NegativeInfinity;
        for (int t = 0; t < traces.Count; t++)
        {
            ResponseTrace trace = traces[t] ?? throw new ArgumentNullException(nameof(traces), $"trace {t} is null");
            startHz = Math.Min(startHz, trace.Grid.StartHz);
            stopHz = Math.Max(stopHz, trace.Grid.StopHz);
        }
        double spanHz = stopHz - startHz;
        int bins = spanHz > 0 ? binCount : 1;
        var min = new double[bins];
        var max = new double[bins];
        var counts = new int[bins];
        Array.Fill(min, double.PositiveInfinity);
        Array.Fill(max, double.NegativeInfinity);
        double binsPerHz = spanHz > 0 ? bins / spanHz : 0;
        foreach (ResponseTrace trace in traces)
        {
            ReadOnlySpan<double> hz = trace.Grid.Hz;
            ReadOnlySpan<double> loss = trace.LossDb;
            for (int i = 0; i < hz.Length; i++)
            {
                int b = (int)((hz[i] - startHz) * binsPerHz);
                if (b >= bins)
                {
                    b = bins - 1; // the stop frequency itself belongs to the last bin
                }
                double value = loss[i];
                if (value < min[b])
                {
                    min[b] = value;
                }
                if (value > max[b])
                {
                    max[b] = value;
                }
                counts[b]++;
            }
        }
        var centres = new double[bins];
        double widthHz = spanHz / bins;
        for (int b = 0; b < bins; b++)
        {
            centres[b] = startHz + (b + 0.5) * widthHz;
            if (counts[b] == 0)
            {
                min[b] = double.NaN;
                max[b] = double.NaN;
            }
        }
        return new LossEnvelope(startHz, stopHz, ImmutableArray.Create(centres), ImmutableArray.Create(min), ImmutableArray.Create(max),
            ImmutableArray.Create(counts), traces.Count);
    }
}
