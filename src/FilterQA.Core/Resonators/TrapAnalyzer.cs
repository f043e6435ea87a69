using System.Globalization;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Resonators;

/// <summary>Measures a trap (a series-resonant shunt to ground, or any band-stop notch) from its transmission.</summary>
public static class TrapAnalyzer
{
    /// <summary>Measures the transmission of a sweep (S21, or a scalar gain trace). Magnitude alone is enough.</summary>
    /// <exception cref="ArgumentNullException"><paramref name="sweep"/> is null.</exception>
    /// <exception cref="ArgumentException">A one-port sweep (no transmission), or a dBm trace not normalised by a thru.</exception>
    public static TrapMeasurement Measure(Sweep sweep)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        if (sweep.Network is { PortCount: 1 })
        {
            throw new ArgumentException("a trap is measured in transmission; the sweep is a one-port", nameof(sweep));
        }
        if (sweep.Scalar is { Quantity: ScalarQuantity.PowerDbm })
        {
            throw new ArgumentException("the scalar trace is a power in dBm; normalise it by a thru to a gain before measuring a trap", nameof(sweep));
        }
        return Measure(ResponseTrace.Primary(sweep));
    }

    /// <summary>
    /// Measures a transmission trace: the notch is the largest loss (parabola-refined), the passband the worse of the
    /// two shoulders (see <see cref="TrapMeasurement.PassbandLossDb"/>).
    /// </summary>
    /// <exception cref="ArgumentNullException"><paramref name="trace"/> is null.</exception>
    /// <exception cref="ArgumentException">The trace is a reflection.</exception>
    public static TrapMeasurement Measure(ResponseTrace trace)
    {
        ArgumentNullException.ThrowIfNull(trace);
        if (trace.Path != ResponsePath.Transmission)
        {
            throw new ArgumentException($"a trap is measured in transmission; the trace is {trace.Path}", nameof(trace));
        }
        ReadOnlySpan<double> hz = trace.Grid.Hz;
        ReadOnlySpan<double> loss = trace.LossDb;
        int n = loss.Length;
        int notch = Extrema.ArgMax(loss);
        (double notchHz, double notchLoss) = Extrema.Vertex(hz, loss, notch);
        var warnings = new List<ResonatorWarning>();
        if (notch == 0 || notch == n - 1)
        {
            warnings.Add(new(ResonatorWarningCode.ResonanceAtSpanEdge, string.Create(CultureInfo.InvariantCulture,
                $"the largest loss is at the {(notch == 0 ? "first" : "last")} point ({hz[notch]:F1} Hz); the notch may lie outside the span and its depth is not measured")));
            return new TrapMeasurement(notchHz, notchLoss, null, null, [.. warnings]);
        }
        double below = double.PositiveInfinity, above = double.PositiveInfinity;
        for (int i = 0; i < notch; i++)
        {
            below = Math.Min(below, loss[i]);
        }
        for (int i = notch + 1; i < n; i++)
        {
            above = Math.Min(above, loss[i]);
        }
        double passband = Math.Max(below, above);
        return new TrapMeasurement(notchHz, notchLoss, passband, notchLoss - passband, [.. warnings]);
    }
}
