namespace FilterQA.Core.Resonators;

/// <summary>
/// A trap (notch) as limit templates check it: notch frequency against a tolerance and depth against a minimum.
/// Losses are positive dB of attenuation.
/// </summary>
/// <param name="NotchHz">Frequency of minimum |S21|, Hz, parabola-refined between points (DOMAIN 4).</param>
/// <param name="NotchLossDb">Absolute insertion loss at the notch, dB (parabola vertex).</param>
/// <param name="PassbandLossDb">
/// Loss of the surrounding passband, dB: on each side of the notch the lowest loss in the span, and of the two the
/// higher (the worse shoulder). Null when the notch is at the first or last point, so that one shoulder is missing
/// and the notch itself may lie outside the span.
/// </param>
/// <param name="DepthDb">
/// Notch depth relative to the passband, dB: <see cref="NotchLossDb"/> − <see cref="PassbandLossDb"/>. Taking the
/// worse shoulder gives the smaller, conservative depth, which is what a "depth at least" limit should see.
/// Null together with <see cref="PassbandLossDb"/>.
/// </param>
/// <param name="Warnings">Problems found, in order.</param>
public sealed record TrapMeasurement(double NotchHz, double NotchLossDb, double? PassbandLossDb, double? DepthDb, IReadOnlyList<ResonatorWarning> Warnings)
{
    /// <summary>Notch frequency, Hz; finite.</summary>
    public double NotchHz { get; } = double.IsFinite(NotchHz) ? NotchHz : throw new ArgumentOutOfRangeException(nameof(NotchHz), NotchHz, "must be finite");

    /// <summary>Loss at the notch, dB; finite.</summary>
    public double NotchLossDb { get; } = double.IsFinite(NotchLossDb) ? NotchLossDb : throw new ArgumentOutOfRangeException(nameof(NotchLossDb), NotchLossDb, "must be finite");

    /// <summary>Passband reference loss, dB, or null.</summary>
    public double? PassbandLossDb { get; } = PassbandLossDb is null || double.IsFinite(PassbandLossDb.Value) ? PassbandLossDb
        : throw new ArgumentOutOfRangeException(nameof(PassbandLossDb), PassbandLossDb, "must be finite or null");

    /// <summary>Depth below the passband, dB, or null.</summary>
    public double? DepthDb { get; } = DepthDb is null || double.IsFinite(DepthDb.Value) ? DepthDb
        : throw new ArgumentOutOfRangeException(nameof(DepthDb), DepthDb, "must be finite or null");

    /// <summary>Warnings; never null.</summary>
    public IReadOnlyList<ResonatorWarning> Warnings { get; } = Warnings ?? throw new ArgumentNullException(nameof(Warnings));
}
