using System.Globalization;
using MathNet.Numerics;

namespace FilterQA.Core.Statistics.ControlCharts;

/// <summary>
/// Factors of the X-bar and S control charts for subgroups of n values, computed from their defining formulas rather
/// than read from a printed table, so that any subgroup size (a lot's sample of 5, 13, 80 …) has its factors. The
/// printed tables (ASTM E2587, Table 1; Montgomery, "Introduction to Statistical Quality Control", Appendix VI) list
/// the same values rounded to three or four decimals.
/// </summary>
/// <remarks>
/// <para>c4(n) = √(2/(n − 1)) · Γ(n/2) / Γ((n − 1)/2) is the mean of the sample standard deviation s of n normal
/// values divided by σ (E[s] = c4·σ).</para>
/// <para>A3 = 3 / (c4·√n), B3 = max(0, 1 − 3·√(1 − c4²)/c4), B4 = 1 + 3·√(1 − c4²)/c4: the three-sigma limits of the
/// subgroup mean and of s in terms of the average s̄.</para>
/// </remarks>
public static class ControlChartConstants
{
    /// <summary>The largest subgroup size accepted; far beyond any lot sample (MIL-STD-105E's largest is 2000).</summary>
    public const int MaxSubgroupSize = 100_000;

    /// <summary>c4(n), dimensionless, in (0, 1); e.g. 0.9400 for n = 5.</summary>
    /// <param name="n">Subgroup size, 2 to <see cref="MaxSubgroupSize"/>.</param>
    /// <exception cref="ArgumentOutOfRangeException">n below 2 or above the maximum.</exception>
    public static double C4(int n)
    {
        Check(n);
        // Γ of large arguments overflows; the difference of log-gammas does not.
        return Math.Sqrt(2.0 / (n - 1)) * Math.Exp(SpecialFunctions.GammaLn(n / 2.0) - SpecialFunctions.GammaLn((n - 1) / 2.0));
    }

    /// <summary>A3(n) = 3/(c4·√n), dimensionless: the X-bar chart limits are x̿ ± A3·s̄; e.g. 1.427 for n = 5.</summary>
    /// <param name="n">Subgroup size, 2 to <see cref="MaxSubgroupSize"/>.</param>
    /// <exception cref="ArgumentOutOfRangeException">n below 2 or above the maximum.</exception>
    public static double A3(int n) => 3.0 / (C4(n) * Math.Sqrt(n));

    /// <summary>B3(n) = max(0, 1 − 3·√(1 − c4²)/c4), dimensionless: the S chart's lower limit is B3·s̄; 0 for n ≤ 5.</summary>
    /// <param name="n">Subgroup size, 2 to <see cref="MaxSubgroupSize"/>.</param>
    /// <exception cref="ArgumentOutOfRangeException">n below 2 or above the maximum.</exception>
    public static double B3(int n) => Math.Max(0, 1 - SpreadOfS(n));

    /// <summary>B4(n) = 1 + 3·√(1 − c4²)/c4, dimensionless: the S chart's upper limit is B4·s̄; e.g. 2.089 for n = 5.</summary>
    /// <param name="n">Subgroup size, 2 to <see cref="MaxSubgroupSize"/>.</param>
    /// <exception cref="ArgumentOutOfRangeException">n below 2 or above the maximum.</exception>
    public static double B4(int n) => 1 + SpreadOfS(n);

    private static double SpreadOfS(int n)
    {
        double c4 = C4(n);
        return 3 * Math.Sqrt(1 - c4 * c4) / c4;
    }

    private static void Check(int n)
    {
        if (n < 2 || n > MaxSubgroupSize)
        {
            throw new ArgumentOutOfRangeException(nameof(n), n, string.Create(CultureInfo.InvariantCulture,
                $"a subgroup for an X-bar and S chart has 2 to {MaxSubgroupSize} values (a standard deviation needs 2)"));
        }
    }
}
