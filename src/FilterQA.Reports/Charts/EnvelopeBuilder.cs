using FilterQA.Core.Sweeps;

namespace FilterQA.Reports.Charts;

/// <summary>
/// Reduces thousands of sweeps to what a page can show: equal-width frequency bins over the union of
/// their spans, each holding the least and greatest loss of any point inside it. One pass over every
/// point and no resampling, so the envelope never shows a value between measured points.
/// </summary>
public static class EnvelopeBuilder
{
    /// <summary>Bins enough for a chart a page wide (about 500 pt) to look continuous.</summary>
    public const int DefaultBinCount = 500;

    /// <exception cref="ArgumentNullException"><paramref name="traces"/> or one of them is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="binCount"/> below 1.</exception>
    public static LossEnvelope Build(IReadOnlyList<ResponseTrace> traces, int binCount = DefaultBinCount)
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
        double binsPerHz = spanHz > 0 ? bins / spanHz : 0;
        var min = new double[bins];
        var max = new double[bins];
        Array.Fill(min, double.PositiveInfinity);
        Array.Fill(max, double.NegativeInfinity);
        foreach (ResponseTrace trace in traces)
        {
            ReadOnlySpan<double> hz = trace.Grid.Hz;
            ReadOnlySpan<double> loss = trace.LossDb;
            for (int i = 0; i < hz.Length; i++)
            {
                int b = Math.Min((int)((hz[i] - startHz) * binsPerHz), bins - 1); // the stop frequency belongs to the last bin
                double value = loss[i];
                if (value < min[b])
                {
                    min[b] = value;
                }
                if (value > max[b])
                {
                    max[b] = value;
                }
            }
        }
        double widthHz = spanHz / bins;
        var centres = new List<double>(bins);
        var lows = new List<double>(bins);
        var highs = new List<double>(bins);
        for (int b = 0; b < bins; b++)
        {
            if (min[b] <= max[b])
            {
                centres.Add(startHz + (b + 0.5) * widthHz);
                lows.Add(min[b]);
                highs.Add(max[b]);
            }
        }
        return new LossEnvelope([.. centres], [.. lows], [.. highs], traces.Count);
    }
}
