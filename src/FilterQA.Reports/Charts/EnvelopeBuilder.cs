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
        var accumulator = new EnvelopeAccumulator(startHz, stopHz, binCount);
        foreach (ResponseTrace trace in traces)
        {
            accumulator.Add(trace);
        }
        return accumulator.ToEnvelope();
    }
}
