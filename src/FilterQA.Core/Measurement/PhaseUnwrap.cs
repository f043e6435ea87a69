namespace FilterQA.Core.Measurement;

/// <summary>
/// Phase unwrapping for the measurements in this folder: each step between neighbouring points is reduced into (−π, π].
/// Internal on purpose; the general-purpose public version belongs to the numerics folder.
/// </summary>
internal static class PhaseUnwrap
{
    private const double TwoPi = 2 * Math.PI;

    /// <summary>The angle reduced into (−π, π] by whole turns.</summary>
    public static double Reduce(double angleRad) => angleRad - (TwoPi * Math.Ceiling((angleRad - Math.PI) / TwoPi));

    /// <summary>Writes the unwrapped phase: output[0] = phase[0], then each reduced step added.</summary>
    public static void Unwrap(ReadOnlySpan<double> phaseRad, Span<double> output)
    {
        if (phaseRad.IsEmpty)
        {
            return;
        }
        output[0] = phaseRad[0];
        for (int i = 1; i < phaseRad.Length; i++)
        {
            output[i] = output[i - 1] + Reduce(phaseRad[i] - phaseRad[i - 1]);
        }
    }
}
