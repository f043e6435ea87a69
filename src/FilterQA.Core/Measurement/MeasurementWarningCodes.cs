namespace FilterQA.Core.Measurement;

/// <summary>The stable codes of <see cref="MeasurementWarning.Code"/>. Reports and limit rules may match on them.</summary>
public static class MeasurementWarningCodes
{
    /// <summary>A band edge was not found on one side: the level is not reached (innermost) or not held to the sweep end (outermost).</summary>
    public const string EdgeNotFound = "edge-not-found";

    /// <summary>A band holds none of the sweep's points; its value is null.</summary>
    public const string BandEmpty = "band-empty";

    /// <summary>A band asked for reaches beyond the sweep; only the points inside were used.</summary>
    public const string BandNotCovered = "band-not-covered";

    /// <summary>A frequency asked for lies outside the sweep; its value is null.</summary>
    public const string OutsideSweep = "outside-sweep";

    /// <summary>Fewer points inside the −3 dB band than <see cref="SweepAdequacy.MinPointsInNarrowestBand"/>.</summary>
    public const string UndersampledBand = "undersampled-band";

    /// <summary>The step is larger than the −3 dB bandwidth divided by <see cref="SweepAdequacy.MinBandwidthToStepRatio"/>.</summary>
    public const string CoarseStep = "coarse-step";

    /// <summary>The step is not smaller than the analyser's resolution bandwidth (stepped-generator measurement).</summary>
    public const string StepNotBelowRbw = "step-not-below-rbw";

    /// <summary>The frequency grid is not uniform.</summary>
    public const string NonUniformGrid = "non-uniform-grid";

    /// <summary>The ripple band reaches beyond the −3 dB edges, where ripple is not defined.</summary>
    public const string RippleBandBeyondEdges = "ripple-band-beyond-edges";

    /// <summary>No floor trace was given; the noise floor was estimated from the sweep itself.</summary>
    public const string FloorEstimated = "floor-estimated";

    /// <summary>A rejection reading is at the noise floor: it is only a lower bound ("at least").</summary>
    public const string FloorLimited = "floor-limited";

    /// <summary>The trace has no phase, so group delay cannot be measured.</summary>
    public const string NoPhase = "no-phase";

    /// <summary>The frequency step is too coarse for unambiguous phase unwrapping.</summary>
    public const string PhaseStepTooCoarse = "phase-step-too-coarse";

    /// <summary>A group-delay aperture was cut short by the sweep end, so the difference is not centred.</summary>
    public const string ApertureTruncated = "aperture-truncated";

    /// <summary>A reflection reading implies |Γ| ≥ 1 (return loss ≤ 0 dB), for which VSWR is not finite.</summary>
    public const string ReflectionNotPassive = "reflection-not-passive";
}
