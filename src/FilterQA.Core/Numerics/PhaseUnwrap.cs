using System.Globalization;

namespace FilterQA.Core.Numerics;

/// <summary>
/// Phase wrapping and unwrapping, in radians. Unwrapping reduces each step between neighbouring
/// points into (−π, π] and accumulates the steps, so it is right only while the true phase changes by
/// less than π from one point to the next (for a delay τ: a step Δf &lt; 1/(2τ)).
/// </summary>
public static class PhaseUnwrap
{
    private const double TwoPi = 2 * Math.PI;

    /// <summary>
    /// <paramref name="phaseRad"/> plus the multiple of 2π that puts it in (−π, π]; exactly π stays π and
    /// −π becomes π.
    /// </summary>
    /// <returns>The wrapped phase, radians; NaN for NaN or an infinity.</returns>
    public static double Wrap(double phaseRad)
    {
        double r = Math.IEEERemainder(phaseRad, TwoPi);
        if (r <= -Math.PI)
        {
            r += TwoPi;
        }
        else if (r > Math.PI)
        {
            r -= TwoPi;
        }
        return r;
    }

    /// <summary>
    /// Unwraps <paramref name="phaseRad"/>: the first value is kept, each later value is the previous
    /// result plus the step between the inputs reduced into (−π, π] (see <see cref="Wrap"/>).
    /// </summary>
    /// <returns>A new array of the same length, radians; empty for empty input.</returns>
    /// <exception cref="ArgumentException">A value is NaN or infinite; the message names its index.</exception>
    public static double[] Unwrap(ReadOnlySpan<double> phaseRad)
    {
        var result = new double[phaseRad.Length];
        Unwrap(phaseRad, result);
        return result;
    }

    /// <summary>Unwraps <paramref name="phaseRad"/> into <paramref name="result"/> (which may be the same memory).</summary>
    /// <exception cref="ArgumentException">Lengths differ, or a value is NaN or infinite; the message names its index.</exception>
    public static void Unwrap(ReadOnlySpan<double> phaseRad, Span<double> result)
    {
        if (result.Length != phaseRad.Length)
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                $"result has {result.Length} places for {phaseRad.Length} phases"), nameof(result));
        }
        double previousInput = 0, previousOutput = 0;
        for (int i = 0; i < phaseRad.Length; i++)
        {
            double input = phaseRad[i];
            if (!double.IsFinite(input))
            {
                throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                    $"phase at index {i} is {input}; phases must be finite"), nameof(phaseRad));
            }
            double output = i == 0 ? input : previousOutput + Wrap(input - previousInput);
            previousInput = input;
            previousOutput = output;
            result[i] = output;
        }
    }
}
