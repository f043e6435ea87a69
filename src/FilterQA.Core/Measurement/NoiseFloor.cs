using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Measurement;

/// <summary>
/// The measurement's noise floor: the margin rule for readings near it, and an estimator for when no floor trace
/// (a sweep with the fixture terminated and no part) is available.
/// </summary>
/// <remarks>
/// <para>Margin rule: a reading closer than <see cref="MarginDb"/> to the floor is floor-limited: noise adds
/// 10·log10(1 + 10^(−m/10)) dB at a margin m (0.41 dB at 10 dB) and, in a single point, scatters the reading by
/// much more, so the value is only a lower bound on the true attenuation.</para>
/// <para>Estimator: a noise floor is the deepest part of a sweep, roughly flat, whose points scatter randomly.
/// The estimator slides a window of n/25 points (clamped to <see cref="MinWindowPoints"/>…<see cref="MaxWindowPoints"/>)
/// over the trace and takes the window with the largest mean loss (the deepest part). It measures that window's
/// point-to-point scatter robustly: the median of |second differences| divided by 0.6745·√6 (for white Gaussian
/// scatter σ a second difference has standard deviation √6·σ; the median of its magnitude is 0.6745 of that, and a
/// median ignores the two or three points around a sharp notch). A signal with complex noise at a margin of m dB
/// scatters in dB with standard deviation about (20/ln 10)·10^(−m/20)/√2, which is
/// <see cref="NoiseScatterThresholdDb"/> at m = <see cref="MarginDb"/>. A window that scatters at least that much is
/// therefore within the margin of its own floor: the floor is taken as the window's mean linear power in dB. A window
/// that scatters less is clean: the floor is at least the margin deeper than the window's level.</para>
/// <para>Limits: averaging done on dB values (log-domain averaging) lowers the scatter without lowering the floor,
/// and dense real ripple in a deep stopband (for example SAW sidelobes) scatters like noise. A measured floor trace is
/// always better; every estimated floor comes with a <c>floor-estimated</c> warning.</para>
/// </remarks>
public static class NoiseFloor
{
    /// <summary>Margin to keep between a reading and the noise floor, dB (common practice: at least 10 dB).</summary>
    public const double MarginDb = 10;

    /// <summary>
    /// Scatter, dB (standard-deviation equivalent), at or above which a part of the sweep is read as within
    /// <see cref="MarginDb"/> of its noise floor: (20/ln 10)·10^(−10/20)/√2 = 1.942 dB, rounded to 1.94 dB.
    /// </summary>
    public const double NoiseScatterThresholdDb = 1.94;

    /// <summary>Fewest points the estimator window holds (and the fewest a trace needs for an estimate).</summary>
    public const int MinWindowPoints = 8;

    /// <summary>Most points the estimator window holds.</summary>
    public const int MaxWindowPoints = 64;

    /// <summary>
    /// Half-width, in points, of the neighbourhood whose scatter is read around a stopband reading when the floor is
    /// estimated: 16 (33 points, enough for a robust median, narrow enough to stay local).
    /// </summary>
    public const int NeighbourhoodHalfWidthPoints = 16;

    // 0.6745 = the median of |z| for a standard normal z; √6 from the second difference of white scatter.
    private const double MedianAbsSecondDifferencePerSigma = 0.674489750196082 * 2.449489742783178;

    /// <summary>The deepest loss that can be verified above a floor: floor − <see cref="MarginDb"/>, dB.</summary>
    /// <param name="floorLossDb">Floor as a loss below the thru, dB (e.g. 95 for a floor 95 dB below the thru).</param>
    public static double VerifiableLossDb(double floorLossDb) => floorLossDb - MarginDb;

    /// <summary>True when a reading of <paramref name="lossDb"/> keeps less than <see cref="MarginDb"/> to the floor (a reading exactly the margin above it is still verifiable).</summary>
    public static bool IsFloorLimited(double lossDb, double floorLossDb) => lossDb > floorLossDb - MarginDb;

    /// <summary>Estimates the floor from the sweep itself (see the remarks for the method). Null for fewer than <see cref="MinWindowPoints"/> points.</summary>
    public static NoiseFloorEstimate? Estimate(ResponseTrace trace)
    {
        ArgumentNullException.ThrowIfNull(trace);
        return Estimate(trace.Grid.Hz, trace.LossDb);
    }

    internal static NoiseFloorEstimate? Estimate(ReadOnlySpan<double> f, ReadOnlySpan<double> loss)
    {
        int n = loss.Length;
        if (n < MinWindowPoints)
        {
            return null;
        }
        int width = Math.Clamp(n / 25, MinWindowPoints, MaxWindowPoints);

        // Deepest window by the sum of dB values: one pass, no logarithms.
        double sum = 0;
        for (int i = 0; i < width; i++)
        {
            sum += loss[i];
        }
        double best = sum;
        int start = 0;
        for (int i = width; i < n; i++)
        {
            sum += loss[i] - loss[i - width];
            if (sum > best)
            {
                best = sum;
                start = i - width + 1;
            }
        }

        ReadOnlySpan<double> window = loss.Slice(start, width);
        double scatterDb = ScatterDb(window);

        double levelDb = PowerMeanLossDb(window);
        bool noise = scatterDb >= NoiseScatterThresholdDb;
        return new NoiseFloorEstimate(noise ? levelDb : levelDb + MarginDb, noise, scatterDb, f[start], f[start + width - 1]);
    }

    /// <summary>Robust scatter of the loss around point <paramref name="index"/>, over ±<see cref="NeighbourhoodHalfWidthPoints"/> points.</summary>
    internal static double LocalScatterDb(ReadOnlySpan<double> loss, int index)
    {
        int from = Math.Max(0, index - NeighbourhoodHalfWidthPoints);
        int to = Math.Min(loss.Length, index + NeighbourhoodHalfWidthPoints + 1);
        return to - from >= 3 ? ScatterDb(loss[from..to]) : 0;
    }

    /// <summary>Median of |second differences| over 0.6745·√6: a standard-deviation equivalent that ignores a few outliers.</summary>
    private static double ScatterDb(ReadOnlySpan<double> values)
    {
        Span<double> second = stackalloc double[MaxWindowPoints];
        int count = Math.Min(values.Length - 2, MaxWindowPoints);
        for (int i = 1; i <= count; i++)
        {
            second[i - 1] = Math.Abs(values[i - 1] - 2 * values[i] + values[i + 1]);
        }
        Span<double> used = second[..count];
        used.Sort();
        double median = (count & 1) == 1 ? used[count / 2] : 0.5 * (used[(count / 2) - 1] + used[count / 2]);
        return median / MedianAbsSecondDifferencePerSigma;
    }

    /// <summary>The mean of the linear power of the points, as a loss in dB: −10·log10(mean 10^(−L/10)).</summary>
    internal static double PowerMeanLossDb(ReadOnlySpan<double> lossDb)
    {
        // Factor out the smallest loss so deep floors (hundreds of dB) do not underflow.
        double least = double.PositiveInfinity;
        foreach (double value in lossDb)
        {
            least = Math.Min(least, value);
        }
        double sum = 0;
        foreach (double value in lossDb)
        {
            sum += Math.Pow(10, -(value - least) / 10);
        }
        return least - 10 * Math.Log10(sum / lossDb.Length);
    }
}
