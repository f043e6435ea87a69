using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Measurement;

/// <summary>
/// Whether a sweep can resolve what it is asked to measure. Each broken rule adds a warning with the numbers; nothing is
/// thrown and no value is changed.
/// </summary>
/// <remarks>
/// The rules (common practice, no published source, except the error formulas, which follow from the shapes):
/// at least <see cref="MinPointsInNarrowestBand"/> points inside the −3 dB band; a step no larger than the −3 dB bandwidth
/// divided by <see cref="MinBandwidthToStepRatio"/> (a resonance of 3 dB width B sampled at step Δ can be missed by up to
/// 10·log10(1 + (Δ/B)²) dB); for a stepped generator read by a spectrum analyser, a step smaller than the resolution
/// bandwidth (between steps a Gaussian filter dips about 3.01·(Δ/RBW)² dB); a uniform grid.
/// </remarks>
public static class SweepAdequacy
{
    /// <summary>Fewest sweep points wanted inside the −3 dB band (the narrowest feature): 10.</summary>
    public const int MinPointsInNarrowestBand = 10;

    /// <summary>Least ratio of −3 dB bandwidth to step: 10 (Δ ≤ B/10 keeps the peak error below 0.043 dB).</summary>
    public const double MinBandwidthToStepRatio = 10;

    /// <summary>Relative step tolerance for the uniform-grid check (instruments round frequencies): 1e-3.</summary>
    public const double UniformStepTolerance = 1e-3;

    /// <summary>Checks the sweep against the rules above and adds a warning per broken rule.</summary>
    /// <param name="trace">The trace measured.</param>
    /// <param name="threeDbBand">The −3 dB band (innermost edges); the band checks are skipped when it lacks an edge.</param>
    /// <param name="resolutionBandwidthHz">The analyser's resolution bandwidth for a stepped-generator sweep, Hz; null for a network analyser.</param>
    /// <param name="warnings">Where the warnings go.</param>
    /// <exception cref="ArgumentOutOfRangeException">The resolution bandwidth is not finite and above 0.</exception>
    public static void Check(ResponseTrace trace, LevelBandwidth threeDbBand, double? resolutionBandwidthHz, ICollection<MeasurementWarning> warnings)
    {
        ArgumentNullException.ThrowIfNull(trace);
        ArgumentNullException.ThrowIfNull(threeDbBand);
        ArgumentNullException.ThrowIfNull(warnings);
        CheckRbw(resolutionBandwidthHz, nameof(resolutionBandwidthHz));
        FrequencyGrid grid = trace.Grid;
        ReadOnlySpan<double> f = grid.Hz;
        if (threeDbBand is { LowerHz: { } lower, UpperHz: { } upper, BandwidthHz: { } width } && width > 0)
        {
            CheckBand(f, lower, upper, width, threeDbBand.LevelDb, warnings);
        }
        if (resolutionBandwidthHz is { } rbw && grid.MaxStepHz >= rbw)
        {
            double ratio = grid.MaxStepHz / rbw;
            warnings.Add(new MeasurementWarning(MeasurementWarningCodes.StepNotBelowRbw,
                $"the step {Warnings.N(grid.MaxStepHz)} Hz is not below the resolution bandwidth {Warnings.N(rbw)} Hz; a Gaussian RBW filter dips about 3.01·(Δ/RBW)² = {Warnings.N(3.01 * ratio * ratio)} dB between steps"));
        }
        if (!grid.IsUniform(UniformStepTolerance))
        {
            warnings.Add(new MeasurementWarning(MeasurementWarningCodes.NonUniformGrid,
                $"the grid is not uniform: steps range from {Warnings.N(grid.MinStepHz)} Hz to {Warnings.N(grid.MaxStepHz)} Hz"));
        }
    }

    internal static void CheckRbw(double? resolutionBandwidthHz, string name)
    {
        if (resolutionBandwidthHz is { } rbw && (!double.IsFinite(rbw) || rbw <= 0))
        {
            throw new ArgumentOutOfRangeException(name, rbw, "the resolution bandwidth must be a finite number of Hz above 0");
        }
    }

    private static void CheckBand(ReadOnlySpan<double> f, double lower, double upper, double width, double levelDb, ICollection<MeasurementWarning> warnings)
    {
        // Points inside [lower, upper], and the steps that span the band including the two that straddle its edges.
        int first = BandIndexRange.FirstAtOrAbove(f, lower);
        int end = BandIndexRange.FirstAbove(f, upper);
        int inside = end - first;
        int from = Math.Max(0, first - 1), to = Math.Min(f.Length - 1, end);
        double step = 0;
        for (int k = from; k < to; k++)
        {
            step = Math.Max(step, f[k + 1] - f[k]);
        }
        if (inside < MinPointsInNarrowestBand)
        {
            warnings.Add(new MeasurementWarning(MeasurementWarningCodes.UndersampledBand,
                $"only {Warnings.N(inside)} points lie inside the −{Warnings.N(levelDb)} dB band {Warnings.N(lower)}–{Warnings.N(upper)} Hz; at least {Warnings.N(MinPointsInNarrowestBand)} are wanted"));
        }
        if (step * MinBandwidthToStepRatio > width)
        {
            double ratio = step / width;
            warnings.Add(new MeasurementWarning(MeasurementWarningCodes.CoarseStep,
                $"the step {Warnings.N(step)} Hz is more than 1/{Warnings.N(MinBandwidthToStepRatio)} of the −{Warnings.N(levelDb)} dB bandwidth {Warnings.N(width)} Hz; a peak can be missed by up to 10·log10(1 + (Δ/B)²) = {Warnings.N(10 * Math.Log10(1 + (ratio * ratio)))} dB"));
        }
    }
}
