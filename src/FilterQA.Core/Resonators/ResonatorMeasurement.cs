namespace FilterQA.Core.Resonators;

/// <summary>
/// What a resonator sweep shows: the sampled peak and notch, and the Butterworth–Van Dyke (BVD) model of
/// the main mode fitted to the data. SI units; a value that could not be measured is null, never NaN.
/// Loss figures are positive dB of attenuation.
/// </summary>
/// <param name="PeakHz">
/// Frequency of maximum transmission |S21|, Hz, refined between points by the three-point parabola on the dB
/// values (DOMAIN 4; the sampled point when the maximum is at the first or last point). Null for a one-port.
/// </param>
/// <param name="PeakLossDb">Insertion loss at <paramref name="PeakHz"/>, dB, positive for attenuation (parabola vertex). Null for a one-port.</param>
/// <param name="NotchHz">
/// Series and shunt fixtures: frequency of minimum |S21| (the antiresonance notch of a crystal, the trap notch).
/// One-port: frequency of minimum |S11| (the series-resonance dip). Parabola-refined. For the series fixture the
/// minimum must be inside the span (not the first or last point), otherwise null: a falling skirt is no notch.
/// </param>
/// <param name="NotchLossDb">Loss at <paramref name="NotchHz"/>, dB, positive: insertion loss (two-port) or return loss (one-port).</param>
/// <param name="SeriesHz">Fitted fs = 1/(2π√(L1·C1)), Hz. This is the model's series resonance, not the peak.</param>
/// <param name="ParallelHz">Fitted fp = fs·√(1 + C1/C0), Hz; null when the span holds no antiresonance.</param>
/// <param name="R1Ohm">Fitted motional resistance, ohm.</param>
/// <param name="C1F">Fitted motional capacitance, F.</param>
/// <param name="L1H">Fitted motional inductance, H.</param>
/// <param name="C0F">Fitted shunt (static) capacitance, F; null when the span holds no antiresonance.</param>
/// <param name="UnloadedQ">2π·fs·L1/R1 of the fitted model.</param>
/// <param name="LoadedQ">2π·fs·L1/(R1 + Rext): Rext = 2·Z0 (series), Z0 (one-port), Z0/2 (shunt).</param>
/// <param name="UnwantedModes">
/// Responses other than the main one, in frequency order; see <see cref="UnwantedMode"/> for the sign. With phase they
/// are the interior peaks of the resonance response |g| (|S21| series, |1 − S11|/2 one-port, |1 − S21| shunt) with at
/// least <see cref="ResonatorOptions.ModeProminenceDb"/> of prominence, reported at the matching extremum of |S|;
/// without phase, the prominent extrema of |S| itself. An extremum that rises less than 10× the RMS noise (estimated
/// from second differences) above its base is ignored, so noise in a deep notch is never a mode.
/// </param>
/// <param name="Warnings">Everything questionable about the sweep or the fit, in the order found.</param>
public sealed record ResonatorMeasurement(
    double? PeakHz,
    double? PeakLossDb,
    double? NotchHz,
    double? NotchLossDb,
    double? SeriesHz,
    double? ParallelHz,
    double? R1Ohm,
    double? C1F,
    double? L1H,
    double? C0F,
    double? UnloadedQ,
    double? LoadedQ,
    IReadOnlyList<UnwantedMode> UnwantedModes,
    IReadOnlyList<ResonatorWarning> Warnings)
{
    /// <summary>Peak frequency, Hz, or null.</summary>
    public double? PeakHz { get; } = Finite(PeakHz, nameof(PeakHz));

    /// <summary>Loss at the peak, dB (positive = attenuation), or null.</summary>
    public double? PeakLossDb { get; } = Finite(PeakLossDb, nameof(PeakLossDb));

    /// <summary>Notch frequency, Hz, or null.</summary>
    public double? NotchHz { get; } = Finite(NotchHz, nameof(NotchHz));

    /// <summary>Loss at the notch, dB (positive = attenuation), or null.</summary>
    public double? NotchLossDb { get; } = Finite(NotchLossDb, nameof(NotchLossDb));

    /// <summary>Fitted series resonance fs, Hz, or null.</summary>
    public double? SeriesHz { get; } = Finite(SeriesHz, nameof(SeriesHz));

    /// <summary>Fitted parallel resonance fp, Hz, or null.</summary>
    public double? ParallelHz { get; } = Finite(ParallelHz, nameof(ParallelHz));

    /// <summary>Fitted R1, ohm, or null.</summary>
    public double? R1Ohm { get; } = Finite(R1Ohm, nameof(R1Ohm));

    /// <summary>Fitted C1, F, or null.</summary>
    public double? C1F { get; } = Finite(C1F, nameof(C1F));

    /// <summary>Fitted L1, H, or null.</summary>
    public double? L1H { get; } = Finite(L1H, nameof(L1H));

    /// <summary>Fitted C0, F, or null.</summary>
    public double? C0F { get; } = Finite(C0F, nameof(C0F));

    /// <summary>Unloaded Q, or null.</summary>
    public double? UnloadedQ { get; } = Finite(UnloadedQ, nameof(UnloadedQ));

    /// <summary>Loaded Q, or null.</summary>
    public double? LoadedQ { get; } = Finite(LoadedQ, nameof(LoadedQ));

    /// <summary>Unwanted modes in frequency order; never null.</summary>
    public IReadOnlyList<UnwantedMode> UnwantedModes { get; } = UnwantedModes ?? throw new ArgumentNullException(nameof(UnwantedModes));

    /// <summary>Warnings in the order found; never null.</summary>
    public IReadOnlyList<ResonatorWarning> Warnings { get; } = Warnings ?? throw new ArgumentNullException(nameof(Warnings));

    /// <summary>True when a warning with <paramref name="code"/> is present.</summary>
    public bool HasWarning(ResonatorWarningCode code) => Warnings.Any(w => w.Code == code);

    private static double? Finite(double? value, string name) => value is null || double.IsFinite(value.Value)
        ? value
        : throw new ArgumentOutOfRangeException(name, value, "a measured value must be finite or null, never NaN or infinite");
}
