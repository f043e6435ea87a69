using System.Globalization;

namespace FilterQA.Core.Sweeps;

/// <summary>
/// The frequencies of a sweep, in hertz: finite, non-negative and strictly increasing.
/// Immutable; a grid that breaks any of these rules cannot be made.
/// </summary>
public sealed class FrequencyGrid
{
    private readonly double[] _hz;

    private FrequencyGrid(double[] hz)
    {
        _hz = hz;
        double minStep = double.PositiveInfinity, maxStep = 0;
        for (int i = 1; i < hz.Length; i++)
        {
            double step = hz[i] - hz[i - 1];
            minStep = Math.Min(minStep, step);
            maxStep = Math.Max(maxStep, step);
        }
        MinStepHz = hz.Length > 1 ? minStep : 0;
        MaxStepHz = maxStep;
    }

    /// <summary>Number of points (at least 1).</summary>
    public int Count => _hz.Length;

    /// <summary>First frequency, Hz.</summary>
    public double StartHz => _hz[0];

    /// <summary>Last frequency, Hz.</summary>
    public double StopHz => _hz[^1];

    /// <summary>Smallest spacing between neighbouring points, Hz; 0 for a one-point grid.</summary>
    public double MinStepHz { get; }

    /// <summary>Largest spacing between neighbouring points, Hz; 0 for a one-point grid.</summary>
    public double MaxStepHz { get; }

    /// <summary>The frequencies, Hz, in increasing order.</summary>
    public ReadOnlySpan<double> Hz => _hz;

    /// <summary>Frequency of point <paramref name="index"/>, Hz.</summary>
    public double this[int index] => _hz[index];

    /// <summary>
    /// True when every step is within <paramref name="relativeTolerance"/> of the mean step
    /// (instruments round frequencies, so an exactly equal step is not expected).
    /// </summary>
    /// <param name="relativeTolerance">Allowed relative deviation of a step from the mean; default 1e-3.</param>
    public bool IsUniform(double relativeTolerance = 1e-3)
    {
        if (_hz.Length < 3)
        {
            return true;
        }
        double mean = (StopHz - StartHz) / (_hz.Length - 1);
        return MaxStepHz - mean <= relativeTolerance * mean && mean - MinStepHz <= relativeTolerance * mean;
    }

    /// <summary>Makes a grid from a copy of <paramref name="hz"/>.</summary>
    /// <exception cref="ArgumentException">Empty, or a value is NaN, infinite, negative or not above the one before it; the message names the index.</exception>
    public static FrequencyGrid FromHz(ReadOnlySpan<double> hz)
    {
        if (!TryValidate(hz, out string? problem))
        {
            throw new ArgumentException(problem, nameof(hz));
        }
        return new FrequencyGrid(hz.ToArray());
    }

    /// <summary>Makes a grid of <paramref name="count"/> equally spaced points from start to stop inclusive.</summary>
    /// <exception cref="ArgumentException">count below 2, or start not below stop, or either not finite.</exception>
    public static FrequencyGrid Linear(double startHz, double stopHz, int count)
    {
        if (count < 2 || !double.IsFinite(startHz) || !double.IsFinite(stopHz) || startHz < 0 || stopHz <= startHz)
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                $"a linear grid needs count >= 2 and 0 <= start < stop, both finite; got {count} points from {startHz} Hz to {stopHz} Hz"));
        }
        var hz = new double[count];
        double step = (stopHz - startHz) / (count - 1);
        for (int i = 0; i < count; i++)
        {
            hz[i] = startHz + i * step;
        }
        hz[^1] = stopHz;
        return new FrequencyGrid(hz);
    }

    /// <summary>Takes ownership of an array the caller has already validated (readers build arrays once).</summary>
    internal static FrequencyGrid Own(double[] hz)
    {
        if (!TryValidate(hz, out string? problem))
        {
            throw new ArgumentException(problem, nameof(hz));
        }
        return new FrequencyGrid(hz);
    }

    /// <summary>Checks the grid rules; on failure <paramref name="problem"/> says which index broke which rule.</summary>
    public static bool TryValidate(ReadOnlySpan<double> hz, out string? problem)
    {
        if (hz.Length == 0)
        {
            problem = "a frequency grid needs at least one point";
            return false;
        }
        for (int i = 0; i < hz.Length; i++)
        {
            double f = hz[i];
            if (!double.IsFinite(f))
            {
                problem = string.Create(CultureInfo.InvariantCulture, $"frequency at index {i} is {f}; frequencies must be finite");
                return false;
            }
            if (f < 0)
            {
                problem = string.Create(CultureInfo.InvariantCulture, $"frequency at index {i} is {f} Hz; frequencies must not be negative");
                return false;
            }
            if (i > 0 && f <= hz[i - 1])
            {
                problem = string.Create(CultureInfo.InvariantCulture,
                    $"frequency at index {i} ({f:R} Hz) is not above the one before it ({hz[i - 1]:R} Hz); frequencies must strictly increase");
                return false;
            }
        }
        problem = null;
        return true;
    }
}
