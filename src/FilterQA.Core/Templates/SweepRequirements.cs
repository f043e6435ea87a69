namespace FilterQA.Core.Templates;

/// <summary>
/// What a sweep must offer before a template may judge it: the span it must cover, how finely it must
/// resolve the narrowest feature, how old the thru reference may be, and which data it must hold.
/// Immutable; validated when made.
/// </summary>
public sealed record SweepRequirements
{
    /// <summary>Makes the requirements.</summary>
    /// <param name="spanStartHz">Lowest frequency the sweep must reach, Hz (absolute, zero or more).</param>
    /// <param name="spanStopHz">Highest frequency the sweep must reach, Hz, above the start.</param>
    /// <param name="narrowestFeatureHz">Width of the narrowest feature the rules depend on (a band, or fs/QL for a resonator), Hz; above zero.</param>
    /// <param name="pointsPerFeature">Points that must fall across that feature; at least 1.</param>
    /// <param name="maximumThruAgeS">Oldest allowed thru reference when the unit is measured, s; above zero.</param>
    /// <param name="needsPhase">True when the sweep must hold the transmission phase.</param>
    /// <param name="needsS11">True when the sweep must hold S11.</param>
    /// <param name="needsS22">True when the sweep must hold S22.</param>
    /// <exception cref="ArgumentException">A value out of range (the message says which).</exception>
    public SweepRequirements(double spanStartHz, double spanStopHz, double narrowestFeatureHz, int pointsPerFeature,
        double maximumThruAgeS, bool needsPhase, bool needsS11, bool needsS22)
    {
        SpanStartHz = Checks.NonNegative(spanStartHz, "the span start");
        SpanStopHz = Checks.Positive(spanStopHz, "the span stop");
        if (spanStopHz <= spanStartHz)
        {
            throw new ArgumentException(Checks.Say($"the span start ({spanStartHz:R} Hz) must be below its stop ({spanStopHz:R} Hz)"));
        }
        NarrowestFeatureHz = Checks.Positive(narrowestFeatureHz, "the narrowest feature");
        if (pointsPerFeature < 1)
        {
            throw new ArgumentException(Checks.Say($"points per feature must be at least 1; got {pointsPerFeature}"));
        }
        PointsPerFeature = pointsPerFeature;
        MaximumThruAgeS = Checks.Positive(maximumThruAgeS, "the maximum thru age");
        NeedsPhase = needsPhase;
        NeedsS11 = needsS11;
        NeedsS22 = needsS22;
    }

    /// <summary>Lowest frequency the sweep must reach, Hz.</summary>
    public double SpanStartHz { get; }

    /// <summary>Highest frequency the sweep must reach, Hz.</summary>
    public double SpanStopHz { get; }

    /// <summary>Width of the narrowest feature the rules depend on, Hz.</summary>
    public double NarrowestFeatureHz { get; }

    /// <summary>Points that must fall across the narrowest feature (at least 1).</summary>
    public int PointsPerFeature { get; }

    /// <summary>Largest allowed step between sweep points, Hz: <see cref="NarrowestFeatureHz"/> / <see cref="PointsPerFeature"/>.</summary>
    public double MaximumStepHz => NarrowestFeatureHz / PointsPerFeature;

    /// <summary>Oldest allowed thru reference, s.</summary>
    public double MaximumThruAgeS { get; }

    /// <summary>True when the transmission phase is required.</summary>
    public bool NeedsPhase { get; }

    /// <summary>True when S11 is required.</summary>
    public bool NeedsS11 { get; }

    /// <summary>True when S22 is required.</summary>
    public bool NeedsS22 { get; }
}
