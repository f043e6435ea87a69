using System.Numerics;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Measurement;

/// <summary>
/// Stopband rejection: the least loss over a band (the band rule of <see cref="FrequencyBand"/>), its frequency, the
/// rejection relative to the minimum-loss point, and whether the reading is at the noise floor.
/// </summary>
public static class StopbandRejection
{
    /// <summary>Measures one stopband against the trace's own minimum loss.</summary>
    /// <param name="trace">A transmission trace.</param>
    /// <param name="band">The stopband.</param>
    /// <param name="floorLossDb">
    /// Optional floor trace as loss, dB, one value per point of the trace's grid (a sweep with the fixture terminated
    /// and no part, resampled by the caller onto this grid). The floor is read at its strongest point inside the band (its
    /// least loss there), so a noisy floor trace is compared peak to peak with the reading and a floor that varies across
    /// the band is read where it is worst (conservative). When empty, the floor is estimated with <see cref="NoiseFloor.Estimate(ResponseTrace)"/> and a <c>floor-estimated</c> warning says so.
    /// </param>
    /// <param name="warnings">Optional sink for warnings (band coverage, floor estimated, floor-limited).</param>
    /// <exception cref="ArgumentException">The floor trace is not as long as the grid or holds a value that is not finite.</exception>
    public static StopbandResult Over(ResponseTrace trace, FrequencyBand band, ReadOnlySpan<double> floorLossDb = default,
        ICollection<MeasurementWarning>? warnings = null)
    {
        ArgumentNullException.ThrowIfNull(trace);
        ArgumentNullException.ThrowIfNull(band);
        ReadOnlySpan<double> f = trace.Grid.Hz;
        ReadOnlySpan<double> loss = trace.LossDb;
        CheckFloor(floorLossDb, f.Length, nameof(floorLossDb));
        NoiseFloorEstimate? estimated = floorLossDb.IsEmpty ? EstimateWithWarning(f, loss, warnings) : null;
        double reference = loss[Loss.MinimumIndex(loss)];
        return Over(f, loss, reference, band, floorLossDb, estimated, warnings);
    }

    internal static void CheckFloor(ReadOnlySpan<double> floorLossDb, int count, string name)
    {
        if (floorLossDb.IsEmpty)
        {
            return;
        }
        if (floorLossDb.Length != count)
        {
            throw new ArgumentException(
                $"the floor trace has {Warnings.N(floorLossDb.Length)} values for a grid of {Warnings.N(count)} points; resample it onto the trace's grid", name);
        }
        if (AllFinite(floorLossDb))
        {
            return;
        }
        for (int i = 0; i < floorLossDb.Length; i++)
        {
            if (!double.IsFinite(floorLossDb[i]))
            {
                throw new ArgumentException($"the floor trace value at index {Warnings.N(i)} is {Warnings.N(floorLossDb[i])}; it must be finite", name);
            }
        }
    }

    // x − x is 0 for a finite x and NaN for NaN or an infinity; a vector sum of those is NaN exactly when one is bad.
    private static bool AllFinite(ReadOnlySpan<double> values)
    {
        int width = Vector<double>.Count;
        int i = 0;
        var lanes = Vector<double>.Zero;
        for (; i <= values.Length - width; i += width)
        {
            var v = new Vector<double>(values[i..]);
            lanes += v - v;
        }
        double rest = 0;
        for (; i < values.Length; i++)
        {
            rest += values[i] - values[i];
        }
        return Vector.EqualsAll(lanes, lanes) && rest == 0;
    }

    internal static NoiseFloorEstimate? EstimateWithWarning(ReadOnlySpan<double> f, ReadOnlySpan<double> loss, ICollection<MeasurementWarning>? warnings)
    {
        NoiseFloorEstimate? estimate = NoiseFloor.Estimate(f, loss);
        if (warnings is null)
        {
            return estimate;
        }
        if (estimate is null)
        {
            warnings.Add(new MeasurementWarning(MeasurementWarningCodes.FloorEstimated,
                $"no floor trace was given and {Warnings.N(loss.Length)} points are too few to estimate one; stopband readings are not checked against a floor"));
        }
        else if (estimate.NoiseSeen)
        {
            warnings.Add(new MeasurementWarning(MeasurementWarningCodes.FloorEstimated,
                $"no floor trace was given; the noise floor was estimated from the sweep at {Warnings.N(estimate.LossDb)} dB (noise-like scatter {Warnings.N(estimate.ScatterDb)} dB over {Warnings.N(estimate.StartHz)}–{Warnings.N(estimate.StopHz)} Hz)"));
        }
        else
        {
            warnings.Add(new MeasurementWarning(MeasurementWarningCodes.FloorEstimated,
                $"no floor trace was given; no noise floor is visible in the sweep (deepest part {Warnings.N(estimate.LossDb - NoiseFloor.MarginDb)} dB scatters only {Warnings.N(estimate.ScatterDb)} dB over {Warnings.N(estimate.StartHz)}–{Warnings.N(estimate.StopHz)} Hz), so the floor was estimated at {Warnings.N(estimate.LossDb)} dB or deeper"));
        }
        return estimate;
    }

    internal static StopbandResult Over(ReadOnlySpan<double> f, ReadOnlySpan<double> loss, double referenceLossDb, FrequencyBand band,
        ReadOnlySpan<double> floorTrace, NoiseFloorEstimate? estimated, ICollection<MeasurementWarning>? warnings)
    {
        BandIndexRange range = BandIndexRange.Of(f, band);
        Warnings.BandCoverage(warnings, f, band, range, "stopband");
        if (range.Count == 0)
        {
            return new StopbandResult(band.StartHz, band.StopHz, null, null, null, false, null);
        }
        int at = range.First;
        double least = loss[at];
        for (int i = range.First + 1; i < range.End; i++)
        {
            if (loss[i] < least)
            {
                least = loss[i];
                at = i;
            }
        }
        double? floor;
        bool limited;
        if (!floorTrace.IsEmpty)
        {
            double strongest = floorTrace[range.First];
            for (int i = range.First + 1; i < range.End; i++)
            {
                strongest = Math.Min(strongest, floorTrace[i]);
            }
            floor = strongest;
            limited = NoiseFloor.IsFloorLimited(least, strongest);
        }
        else if (estimated is not null)
        {
            floor = estimated.LossDb;
            limited = NoiseFloor.IsFloorLimited(least, estimated.LossDb)
                || NoiseFloor.LocalScatterDb(loss, at) >= NoiseFloor.NoiseScatterThresholdDb;
        }
        else
        {
            floor = null;
            limited = false;
        }
        double rejection = least - referenceLossDb;
        if (limited)
        {
            Warnings.Add(warnings, MeasurementWarningCodes.FloorLimited,
                $"stopband {band}: the least loss {Warnings.N(least)} dB at {Warnings.N(f[at])} Hz is at the noise floor ({Warnings.N(floor!.Value)} dB; less than {Warnings.N(NoiseFloor.MarginDb)} dB margin, or the points around it scatter like noise): rejection is at least {Warnings.N(rejection)} dB");
        }
        return new StopbandResult(band.StartHz, band.StopHz, rejection, least, f[at], limited, floor);
    }
}
