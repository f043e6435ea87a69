using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Measurement;

/// <summary>
/// Front door of the filter measurements: minimum loss, band edges at each requested level, ripple, stopband rejection
/// and the sweep-adequacy checks, from one transmission trace, in one pass over the points where possible.
/// </summary>
public static class FilterMeasurer
{
    private const double ThreeDbLevelDb = 3;

    /// <summary>Measures a transmission trace.</summary>
    /// <param name="trace">A transmission trace, already normalised by its thru (loss positive = attenuation).</param>
    /// <param name="request">What to measure.</param>
    /// <param name="floorLossDb">
    /// Optional floor trace as loss, dB, aligned to the trace's grid (see <see cref="StopbandRejection.Over(ResponseTrace, FrequencyBand, ReadOnlySpan{double}, ICollection{MeasurementWarning})"/>); when empty and
    /// stopbands are requested, the floor is estimated from the sweep and a <c>floor-estimated</c> warning says so.
    /// </param>
    /// <exception cref="ArgumentException">The trace is a reflection trace, or the floor trace has the wrong length or a value that is not finite.</exception>
    public static FilterMeasurement Measure(ResponseTrace trace, FilterMeasurementRequest request, ReadOnlySpan<double> floorLossDb = default)
    {
        ArgumentNullException.ThrowIfNull(trace);
        ArgumentNullException.ThrowIfNull(request);
        if (trace.Path != ResponsePath.Transmission)
        {
            throw new ArgumentException($"filter measurements need a transmission trace, not {trace.Path}; read a reflection with ReturnLoss.OverBand", nameof(trace));
        }
        ReadOnlySpan<double> f = trace.Grid.Hz;
        ReadOnlySpan<double> loss = trace.LossDb;
        StopbandRejection.CheckFloor(floorLossDb, f.Length, nameof(floorLossDb));
        var warnings = new List<MeasurementWarning>();

        int m = Loss.MinimumIndex(loss);
        double minLossDb = loss[m];

        IReadOnlyList<double> levels = request.LevelsDb;
        var bands = new LevelBandwidth[levels.Count];
        LevelBandwidth? threeDb = null;
        for (int i = 0; i < bands.Length; i++)
        {
            bands[i] = BandEdges.Find(f, loss, m, levels[i], EdgeSearch.Innermost, warnings);
            if (levels[i] == ThreeDbLevelDb)
            {
                threeDb ??= bands[i];
            }
        }
        threeDb ??= BandEdges.Find(f, loss, m, ThreeDbLevelDb, EdgeSearch.Innermost, null);
        SweepAdequacy.Check(trace, threeDb, request.ResolutionBandwidthHz, warnings);

        double? rippleDb = null;
        if (request.RippleBand is { } rippleBand)
        {
            BandIndexRange range = BandIndexRange.Of(f, rippleBand);
            Warnings.BandCoverage(warnings, f, rippleBand, range, "ripple band");
            rippleDb = PassbandRipple.Over(loss, range);
            if (threeDb is { LowerHz: { } lower, UpperHz: { } upper } && (rippleBand.StartHz < lower || rippleBand.StopHz > upper))
            {
                warnings.Add(new MeasurementWarning(MeasurementWarningCodes.RippleBandBeyondEdges,
                    $"ripple band {rippleBand} reaches beyond the −3 dB edges {Warnings.N(lower)}–{Warnings.N(upper)} Hz; ripple is read inside the passband only"));
            }
        }

        IReadOnlyList<FrequencyBand> stopbands = request.Stopbands;
        var rejections = new StopbandResult[stopbands.Count];
        if (rejections.Length > 0)
        {
            NoiseFloorEstimate? estimated = floorLossDb.IsEmpty ? StopbandRejection.EstimateWithWarning(f, loss, warnings) : null;
            for (int i = 0; i < rejections.Length; i++)
            {
                rejections[i] = StopbandRejection.Over(f, loss, minLossDb, stopbands[i], floorLossDb, estimated, warnings);
            }
        }

        return new FilterMeasurement(f[m], minLossDb, Array.AsReadOnly(bands), rippleDb, Array.AsReadOnly(rejections), warnings.AsReadOnly());
    }
}
