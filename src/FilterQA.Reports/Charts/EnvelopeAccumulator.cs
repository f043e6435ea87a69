using FilterQA.Core.Sweeps;

namespace FilterQA.Reports.Charts;

/// <summary>
/// Builds a <see cref="LossEnvelope"/> one sweep at a time over a span known in advance, so sweeps read from storage
/// can be folded in as they arrive and dropped. Bin b covers [start + b·w, start + (b+1)·w) with w = span / bins; the
/// last bin also holds the stop frequency; points outside the span are ignored.
/// </summary>
public sealed class EnvelopeAccumulator
{
    private readonly double _startHz;
    private readonly double _spanHz;
    private readonly double _binsPerHz;
    private readonly double[] _min;
    private readonly double[] _max;

    /// <exception cref="ArgumentOutOfRangeException">A frequency is not finite, stop is below start, or fewer than 1 bin.</exception>
    public EnvelopeAccumulator(double startHz, double stopHz, int binCount)
    {
        if (!double.IsFinite(startHz) || !double.IsFinite(stopHz) || stopHz < startHz)
        {
            throw new ArgumentOutOfRangeException(nameof(stopHz), stopHz, FormattableString.Invariant($"the span must be finite with stop ≥ start ({startHz} Hz)"));
        }
        ArgumentOutOfRangeException.ThrowIfLessThan(binCount, 1);
        _startHz = startHz;
        _spanHz = stopHz - startHz;
        int bins = _spanHz > 0 ? binCount : 1;
        _binsPerHz = _spanHz > 0 ? bins / _spanHz : 0;
        _min = new double[bins];
        _max = new double[bins];
        Array.Fill(_min, double.PositiveInfinity);
        Array.Fill(_max, double.NegativeInfinity);
    }

    /// <summary>Sweeps folded in so far.</summary>
    public int Count { get; private set; }

    public void Add(ResponseTrace trace)
    {
        ArgumentNullException.ThrowIfNull(trace);
        ReadOnlySpan<double> hz = trace.Grid.Hz;
        ReadOnlySpan<double> loss = trace.LossDb;
        int bins = _min.Length;
        for (int i = 0; i < hz.Length; i++)
        {
            double offset = hz[i] - _startHz;
            if (offset < 0 || offset > _spanHz)
            {
                continue;
            }
            int b = Math.Min((int)(offset * _binsPerHz), bins - 1); // the stop frequency belongs to the last bin
            double value = loss[i];
            if (value < _min[b])
            {
                _min[b] = value;
            }
            if (value > _max[b])
            {
                _max[b] = value;
            }
        }
        Count++;
    }

    /// <summary>
    /// Folds in what <paramref name="other"/> has gathered (the least and greatest loss per bin, and its count), so
    /// several workers can each fill their own accumulator and be merged at the end.
    /// </summary>
    /// <exception cref="ArgumentException">The other accumulator covers another span or another number of bins.</exception>
    public void Merge(EnvelopeAccumulator other)
    {
        ArgumentNullException.ThrowIfNull(other);
        if (other._min.Length != _min.Length || other._startHz != _startHz || other._spanHz != _spanHz)
        {
            throw new ArgumentException("only an accumulator over the same span and bins can be merged", nameof(other));
        }
        for (int b = 0; b < _min.Length; b++)
        {
            _min[b] = Math.Min(_min[b], other._min[b]);
            _max[b] = Math.Max(_max[b], other._max[b]);
        }
        Count += other.Count;
    }

    /// <summary>The envelope of the sweeps added; bins no point fell in are left out.</summary>
    public LossEnvelope ToEnvelope()
    {
        int bins = _min.Length;
        double widthHz = _spanHz / bins;
        var centres = new List<double>(bins);
        var lows = new List<double>(bins);
        var highs = new List<double>(bins);
        for (int b = 0; b < bins; b++)
        {
            if (_min[b] <= _max[b])
            {
                centres.Add(_startHz + (b + 0.5) * widthHz);
                lows.Add(_min[b]);
                highs.Add(_max[b]);
            }
        }
        return new LossEnvelope([.. centres], [.. lows], [.. highs], Count);
    }
}
