using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Measurement;

/// <summary>
/// Return loss and VSWR from a reflection trace (S11 or S22), whose loss per point is the return loss
/// RL = −20·log10|Γ|, dB.
/// </summary>
public static class ReturnLoss
{
    /// <summary>
    /// The least return loss over <paramref name="band"/> (band rule of <see cref="FrequencyBand"/>), where it occurs, and the
    /// largest |Γ| and VSWR that follow. Null, with a <c>band-empty</c> warning, when the band holds no point.
    /// </summary>
    /// <param name="reflection">A reflection trace (<see cref="ResponsePath.InputReflection"/> or <see cref="ResponsePath.OutputReflection"/>).</param>
    /// <param name="band">The band, typically the passband.</param>
    /// <param name="warnings">Optional sink for warnings.</param>
    /// <exception cref="ArgumentException">The trace is a transmission trace.</exception>
    public static ReturnLossResult? OverBand(ResponseTrace reflection, FrequencyBand band, ICollection<MeasurementWarning>? warnings = null)
    {
        ArgumentNullException.ThrowIfNull(reflection);
        ArgumentNullException.ThrowIfNull(band);
        if (reflection.Path == ResponsePath.Transmission)
        {
            throw new ArgumentException("return loss is read from a reflection trace (S11 or S22), not a transmission trace", nameof(reflection));
        }
        ReadOnlySpan<double> f = reflection.Grid.Hz;
        ReadOnlySpan<double> rl = reflection.LossDb;
        BandIndexRange range = BandIndexRange.Of(f, band);
        Warnings.BandCoverage(warnings, f, band, range, "return-loss band");
        if (range.Count == 0)
        {
            return null;
        }
        int at = range.First;
        for (int i = range.First + 1; i < range.End; i++)
        {
            if (rl[i] < rl[at])
            {
                at = i;
            }
        }
        double? vswr = Vswr(rl[at]);
        if (vswr is null)
        {
            Warnings.Add(warnings, MeasurementWarningCodes.ReflectionNotPassive,
                $"return loss {Warnings.N(rl[at])} dB at {Warnings.N(f[at])} Hz means |Γ| >= 1; VSWR is not finite (check the calibration)");
        }
        return new ReturnLossResult(rl[at], f[at], ReflectionMagnitude(rl[at]), vswr);
    }

    /// <summary>|Γ| = 10^(−RL/20) for a return loss in dB.</summary>
    public static double ReflectionMagnitude(double returnLossDb) => Math.Pow(10, -returnLossDb / 20);

    /// <summary>VSWR = (1 + |Γ|)/(1 − |Γ|) for a return loss in dB; null when |Γ| ≥ 1 (RL ≤ 0 dB) or RL is NaN.</summary>
    public static double? Vswr(double returnLossDb)
    {
        double gamma = ReflectionMagnitude(returnLossDb);
        return gamma < 1 ? (1 + gamma) / (1 - gamma) : null;
    }

    /// <summary>Mismatch loss −10·log10(1 − |Γ|²), dB (positive), for a return loss in dB; null when |Γ| ≥ 1 or RL is NaN.</summary>
    public static double? MismatchLossDb(double returnLossDb)
    {
        double gamma = ReflectionMagnitude(returnLossDb);
        return gamma < 1 ? -10 * Math.Log10(1 - (gamma * gamma)) : null;
    }
}
