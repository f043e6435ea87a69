using System.Globalization;

namespace FilterQA.Core.Resonators;

/// <summary>Settings of a resonator measurement. Immutable; validated when made. <see cref="Default"/> suits most sweeps.</summary>
public sealed record ResonatorOptions
{
    /// <summary>The defaults described on each property.</summary>
    public static ResonatorOptions Default { get; } = new();

    /// <summary>
    /// Fewest points inside fs ± B/2 (B = fs/QL) before <see cref="ResonatorWarningCode.TooFewPointsInBandwidth"/> is
    /// raised. Default 5 (common practice, no published source). Range 1..1000.
    /// </summary>
    public int MinPointsInBandwidth { get; init => field = InRange(value, 1, 1000, nameof(MinPointsInBandwidth)); } = 5;

    /// <summary>
    /// Largest frequency step near fs as a fraction of B before <see cref="ResonatorWarningCode.StepTooCoarse"/>.
    /// Default 0.1 (DOMAIN 4: Δ ≤ B/10 keeps the sampled-peak error below 0.043 dB). Range (0, 10].
    /// </summary>
    public double MaxStepFractionOfBandwidth { get; init => field = InRange(value, double.Epsilon, 10, nameof(MaxStepFractionOfBandwidth)); } = 0.1;

    /// <summary>Least prominence of an unwanted mode, dB. Default 3. Range (0, 100].</summary>
    public double ModeProminenceDb { get; init => field = InRange(value, double.Epsilon, 100, nameof(ModeProminenceDb)); } = 3;

    /// <summary>
    /// How many unwanted modes (the strongest) are modelled as motional arms of their own in the fit. Default 4;
    /// 0 fits the main arm and C0 alone. Range 0..8.
    /// </summary>
    public int MaxModeArms { get; init => field = InRange(value, 0, 8, nameof(MaxModeArms)); } = 4;

    /// <summary>Iteration limit of the Levenberg–Marquardt refinement. Default 200. Range 1..10000.</summary>
    public int MaxIterations { get; init => field = InRange(value, 1, 10000, nameof(MaxIterations)); } = 200;

    /// <summary>
    /// Largest acceptable RMS fit residual as a fraction of the peak response |S21|, |1 − S11|/2 or |1 − S21|
    /// (whichever the fixture resonates in). Default 0.01. A residual above it and above 3× the estimated noise
    /// raises <see cref="ResonatorWarningCode.FitPoorResidual"/>. Range (0, 1].
    /// </summary>
    public double MaxResidualFraction { get; init => field = InRange(value, double.Epsilon, 1, nameof(MaxResidualFraction)); } = 0.01;

    /// <summary>Reference impedance used for scalar traces, which carry none, ohm. Default 50. Range (0, 1e6].</summary>
    public double ScalarReferenceOhm { get; init => field = InRange(value, double.Epsilon, 1e6, nameof(ScalarReferenceOhm)); } = 50;

    private static int InRange(int value, int min, int max, string name) => value >= min && value <= max
        ? value
        : throw new ArgumentOutOfRangeException(name, value, string.Create(CultureInfo.InvariantCulture, $"{name} must be {min}..{max}"));

    private static double InRange(double value, double min, double max, string name) => value >= min && value <= max
        ? value
        : throw new ArgumentOutOfRangeException(name, value, string.Create(CultureInfo.InvariantCulture, $"{name} must be in ({0}, {max}]"));
}
