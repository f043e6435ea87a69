using System.Globalization;

namespace FilterQA.Core.Statistics;

/// <summary>Specification limits of one parameter, in the parameter's own SI unit; one or both.</summary>
public sealed record SpecLimits
{
    /// <summary>Makes limits.</summary>
    /// <param name="lower">LSL, or null for an upper limit only.</param>
    /// <param name="upper">USL, or null for a lower limit only.</param>
    /// <exception cref="ArgumentException">Both null, a limit NaN or infinite, or LSL not below USL.</exception>
    public SpecLimits(double? lower, double? upper)
    {
        if (lower is null && upper is null)
        {
            throw new ArgumentException("specification limits need a lower limit, an upper limit or both");
        }
        if (lower is { } l && !double.IsFinite(l))
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture, $"the lower limit is {l}; it must be finite"), nameof(lower));
        }
        if (upper is { } u && !double.IsFinite(u))
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture, $"the upper limit is {u}; it must be finite"), nameof(upper));
        }
        if (lower is { } lo && upper is { } hi && lo >= hi)
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture, $"the lower limit {lo} must be below the upper limit {hi}"), nameof(lower));
        }
        Lower = lower;
        Upper = upper;
    }

    /// <summary>LSL, or null.</summary>
    public double? Lower { get; }

    /// <summary>USL, or null.</summary>
    public double? Upper { get; }

    /// <summary>True when both limits are given.</summary>
    public bool IsTwoSided => Lower is not null && Upper is not null;

    /// <summary>Limits nominal ± tolerance.</summary>
    /// <exception cref="ArgumentException">Tolerance not positive, or values not finite.</exception>
    public static SpecLimits Symmetric(double nominal, double tolerance)
    {
        if (!(tolerance > 0))
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture, $"the tolerance {tolerance} must be positive"), nameof(tolerance));
        }
        return new SpecLimits(nominal - tolerance, nominal + tolerance);
    }
}
