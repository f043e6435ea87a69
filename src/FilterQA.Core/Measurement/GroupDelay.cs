using FilterQA.Core.Numerics;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Measurement;

/// <summary>
/// Group delay τ = −dφ/dω from the trace's phase (radians, unwrapped by reducing each step into (−π, π]), as a central
/// difference over a stated smoothing aperture.
/// </summary>
/// <remarks>
/// <para>At a frequency f the difference is taken between the sweep points nearest f − aperture/2 and f + aperture/2:
/// τ = −(φ₂ − φ₁)/(2π(f₂ − f₁)). When both are the same point the aperture is widened to one step.</para>
/// <para>Unwrapping is unambiguous only while every step Δf &lt; 1/(2τmax), i.e. the phase turns by less than π between
/// points. A step that aliases is reduced into a smaller one, so the delay seen from the data understates τmax; a
/// <c>phase-step-too-coarse</c> warning is therefore given when a step is within a factor
/// <see cref="UnwrapSafetyFactor"/> of the limit, Δf·2τmax·<see cref="UnwrapSafetyFactor"/> ≥ 1, with τmax the larger of the
/// per-step delay seen and the caller's expected maximum delay.</para>
/// </remarks>
public static class GroupDelay
{
    /// <summary>Factor by which a step must stay below the unwrapping limit 1/(2τmax): 2, i.e. at most a quarter turn of phase per step.</summary>
    public const double UnwrapSafetyFactor = 2;

    /// <summary>Group delay at <paramref name="hz"/>, s (positive for a causal filter). Null, with a warning, without phase or outside the sweep.</summary>
    /// <param name="trace">A trace with phase (S21 of a network sweep).</param>
    /// <param name="hz">Frequency, Hz.</param>
    /// <param name="apertureHz">Smoothing aperture, Hz, finite and &gt; 0; at least one step is always used.</param>
    /// <param name="warnings">Optional sink for warnings.</param>
    /// <param name="expectedMaxDelayS">Optional largest delay the part may have, s (&gt; 0), for the unwrapping check.</param>
    /// <exception cref="ArgumentOutOfRangeException">The aperture is not finite and above 0, or the expected delay is not finite and above 0.</exception>
    public static double? At(ResponseTrace trace, double hz, double apertureHz, ICollection<MeasurementWarning>? warnings = null,
        double? expectedMaxDelayS = null)
    {
        ArgumentNullException.ThrowIfNull(trace);
        CheckArguments(apertureHz, expectedMaxDelayS);
        ReadOnlySpan<double> f = trace.Grid.Hz;
        if (!HasUsablePhase(trace, warnings))
        {
            return null;
        }
        if (!(hz >= f[0] && hz <= f[^1]))
        {
            Warnings.Add(warnings, MeasurementWarningCodes.OutsideSweep,
                $"group delay asked for at {Warnings.N(hz)} Hz, outside the sweep {Warnings.N(f[0])}–{Warnings.N(f[^1])} Hz");
            return null;
        }
        ReadOnlySpan<double> phase = trace.PhaseRad;
        (int lo, int hi) = Aperture(f, hz, apertureHz, warnings);
        double turned = 0, worstStep = 0;
        for (int k = lo; k < hi; k++)
        {
            double step = PhaseUnwrap.Wrap(phase[k + 1] - phase[k]);
            turned += step;
            worstStep = Math.Max(worstStep, Math.Abs(step) / (f[k + 1] - f[k]));
        }
        CheckUnwrap(f, lo, hi, worstStep, expectedMaxDelayS, warnings);
        return -turned / (2 * Math.PI * (f[hi] - f[lo]));
    }

    /// <summary>
    /// Group delay at every sweep point inside <paramref name="band"/> (band rule of <see cref="FrequencyBand"/>), each with the
    /// same aperture, and its extremes; the variation is their spread. Null, with a warning, without phase or when the band
    /// holds no point.
    /// </summary>
    /// <param name="trace">A trace with phase.</param>
    /// <param name="band">Band over which the delay is read.</param>
    /// <param name="apertureHz">Smoothing aperture, Hz, finite and &gt; 0.</param>
    /// <param name="warnings">Optional sink for warnings.</param>
    /// <param name="expectedMaxDelayS">Optional largest delay the part may have, s (&gt; 0), for the unwrapping check.</param>
    /// <exception cref="ArgumentOutOfRangeException">The aperture or expected delay is not finite and above 0.</exception>
    public static GroupDelayVariation? Variation(ResponseTrace trace, FrequencyBand band, double apertureHz,
        ICollection<MeasurementWarning>? warnings = null, double? expectedMaxDelayS = null)
    {
        ArgumentNullException.ThrowIfNull(trace);
        ArgumentNullException.ThrowIfNull(band);
        CheckArguments(apertureHz, expectedMaxDelayS);
        ReadOnlySpan<double> f = trace.Grid.Hz;
        if (!HasUsablePhase(trace, warnings))
        {
            return null;
        }
        BandIndexRange range = BandIndexRange.Of(f, band);
        Warnings.BandCoverage(warnings, f, band, range, "group-delay band");
        if (range.Count == 0)
        {
            return null;
        }
        var unwrapped = new double[f.Length];
        PhaseUnwrap.Unwrap(trace.PhaseRad, unwrapped);
        double min = double.PositiveInfinity, max = double.NegativeInfinity;
        int minAt = range.First, maxAt = range.First;
        int usedLo = int.MaxValue, usedHi = -1;
        bool truncated = false;
        for (int i = range.First; i < range.End; i++)
        {
            (int lo, int hi) = ApertureIndices(f, f[i], apertureHz, ref truncated);
            usedLo = Math.Min(usedLo, lo);
            usedHi = Math.Max(usedHi, hi);
            double tau = -(unwrapped[hi] - unwrapped[lo]) / (2 * Math.PI * (f[hi] - f[lo]));
            if (tau < min)
            {
                min = tau;
                minAt = i;
            }
            if (tau > max)
            {
                max = tau;
                maxAt = i;
            }
        }
        if (truncated)
        {
            Warnings.Add(warnings, MeasurementWarningCodes.ApertureTruncated,
                $"the aperture of {Warnings.N(apertureHz)} Hz around points of {band} reaches beyond the sweep {Warnings.N(f[0])}–{Warnings.N(f[^1])} Hz; the difference there is not centred");
        }
        double worstStep = 0;
        for (int k = usedLo; k < usedHi; k++)
        {
            worstStep = Math.Max(worstStep, Math.Abs(unwrapped[k + 1] - unwrapped[k]) / (f[k + 1] - f[k]));
        }
        CheckUnwrap(f, usedLo, usedHi, worstStep, expectedMaxDelayS, warnings);
        return new GroupDelayVariation(min, f[minAt], max, f[maxAt]);
    }

    private static void CheckArguments(double apertureHz, double? expectedMaxDelayS)
    {
        if (!double.IsFinite(apertureHz) || apertureHz <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(apertureHz), apertureHz, "the group-delay aperture must be a finite number of Hz above 0");
        }
        if (expectedMaxDelayS is { } expected && (!double.IsFinite(expected) || expected <= 0))
        {
            throw new ArgumentOutOfRangeException(nameof(expectedMaxDelayS), expected, "the expected maximum delay must be a finite number of seconds above 0");
        }
    }

    private static bool HasUsablePhase(ResponseTrace trace, ICollection<MeasurementWarning>? warnings)
    {
        if (!trace.HasPhase)
        {
            Warnings.Add(warnings, MeasurementWarningCodes.NoPhase, "the trace has no phase (a scalar sweep?), so group delay cannot be measured");
            return false;
        }
        if (trace.Grid.Count < 2)
        {
            Warnings.Add(warnings, MeasurementWarningCodes.NoPhase, "group delay needs at least two points");
            return false;
        }
        return true;
    }

    private static (int Lo, int Hi) Aperture(ReadOnlySpan<double> f, double hz, double apertureHz, ICollection<MeasurementWarning>? warnings)
    {
        bool truncated = false;
        (int lo, int hi) = ApertureIndices(f, hz, apertureHz, ref truncated);
        if (truncated)
        {
            Warnings.Add(warnings, MeasurementWarningCodes.ApertureTruncated,
                $"the aperture of {Warnings.N(apertureHz)} Hz around {Warnings.N(hz)} Hz reaches beyond the sweep {Warnings.N(f[0])}–{Warnings.N(f[^1])} Hz; the difference is not centred");
        }
        return (lo, hi);
    }

    // Indices of the points nearest hz ± aperture/2, at least one step apart; flags an aperture that leaves the sweep.
    private static (int Lo, int Hi) ApertureIndices(ReadOnlySpan<double> f, double hz, double apertureHz, ref bool truncated)
    {
        double low = hz - 0.5 * apertureHz, high = hz + 0.5 * apertureHz;
        int last = f.Length - 1;
        if (low < f[0] - 0.5 * (f[1] - f[0]) || high > f[last] + 0.5 * (f[last] - f[last - 1]))
        {
            truncated = true;
        }
        int lo = Nearest(f, low), hi = Nearest(f, high);
        if (lo == hi)
        {
            if (hi < last)
            {
                hi++;
            }
            else
            {
                lo--;
            }
        }
        return (lo, hi);
    }

    private static int Nearest(ReadOnlySpan<double> f, double hz)
    {
        int index = f.BinarySearch(hz);
        if (index >= 0)
        {
            return index;
        }
        index = ~index;
        if (index == 0)
        {
            return 0;
        }
        if (index == f.Length)
        {
            return f.Length - 1;
        }
        return hz - f[index - 1] <= f[index] - hz ? index - 1 : index;
    }

    private static void CheckUnwrap(ReadOnlySpan<double> f, int lo, int hi, double worstRadPerHz, double? expectedMaxDelayS,
        ICollection<MeasurementWarning>? warnings)
    {
        double seenDelayS = worstRadPerHz / (2 * Math.PI);
        double delayS = Math.Max(seenDelayS, expectedMaxDelayS ?? 0);
        double maxStepHz = 0;
        for (int k = lo; k < hi; k++)
        {
            maxStepHz = Math.Max(maxStepHz, f[k + 1] - f[k]);
        }
        if (delayS > 0 && maxStepHz * 2 * delayS * UnwrapSafetyFactor >= 1)
        {
            Warnings.Add(warnings, MeasurementWarningCodes.PhaseStepTooCoarse,
                $"a step of {Warnings.N(maxStepHz)} Hz against a delay of up to {Warnings.N(delayS)} s: unwrapping needs steps below 1/(2τ) = {Warnings.N(1 / (2 * delayS))} Hz, and this is within a factor {Warnings.N(UnwrapSafetyFactor)} of it; the phase may be ambiguous");
        }
    }
}
