using System.Globalization;

namespace FilterQA.Core.Statistics.ControlCharts;

/// <summary>
/// An X-bar and S control chart of subgroups in time order (here: one subgroup per lot), with three-sigma limits
/// from the factors A3, B3, B4 (<see cref="ControlChartConstants"/>) and the Western Electric rules
/// (<see cref="ControlRule"/>) applied. Values are in the parameter's SI unit.
/// </summary>
/// <remarks>
/// Centre lines follow Montgomery, "Introduction to Statistical Quality Control", section 6.3: with every subgroup
/// of the same size n, x̿ is the mean of the x̄ and s̄ the mean of the s; with sizes that differ (lots sampled by
/// different plans), x̿ = Σ nᵢx̄ᵢ / Σ nᵢ and s̄ = √(Σ (nᵢ − 1)sᵢ² / Σ (nᵢ − 1)) (the weighted approach for variable
/// sample size), and each subgroup gets its own limits x̿ ± A3(nᵢ)·s̄, B3(nᵢ)·s̄, B4(nᵢ)·s̄.
/// These are trial limits computed from the same subgroups they judge (Phase I).
/// </remarks>
public sealed class XBarSChart
{
    private XBarSChart(double grandMean, double averageS, bool uniformSize, ControlChartPoint[] points)
    {
        GrandMean = grandMean;
        AverageS = averageS;
        IsUniformSize = uniformSize;
        Points = points;
    }

    /// <summary>x̿, the centre line of the X-bar chart, SI unit.</summary>
    public double GrandMean { get; }

    /// <summary>s̄, the centre line of the S chart, SI unit, above 0.</summary>
    public double AverageS { get; }

    /// <summary>True when every subgroup has the same size (then s̄ is the plain mean of the s).</summary>
    public bool IsUniformSize { get; }

    /// <summary>The subgroups in the order given, each with its limits and signals.</summary>
    public IReadOnlyList<ControlChartPoint> Points { get; }

    /// <summary>Builds the chart.</summary>
    /// <param name="subgroups">Subgroups in time order; at least 2.</param>
    /// <exception cref="ArgumentException">Fewer than 2 subgroups, a null one, a repeated label, or every s zero (no spread to set limits from).</exception>
    public static XBarSChart Create(IEnumerable<Subgroup> subgroups)
    {
        ArgumentNullException.ThrowIfNull(subgroups);
        Subgroup[] all = subgroups.ToArray();
        if (all.Length < 2)
        {
            throw new ArgumentException(Invariant($"a control chart needs at least 2 subgroups (20 to 25 in practice); got {all.Length}"), nameof(subgroups));
        }
        var labels = new HashSet<string>(StringComparer.Ordinal);
        for (int i = 0; i < all.Length; i++)
        {
            Subgroup g = all[i] ?? throw new ArgumentException(Invariant($"subgroup {i} is null"), nameof(subgroups));
            if (!labels.Add(g.Label))
            {
                throw new ArgumentException(Invariant($"subgroup {i}: label '{g.Label}' is repeated"), nameof(subgroups));
            }
        }

        bool uniform = all.All(g => g.Count == all[0].Count);
        double grandMean, averageS;
        if (uniform)
        {
            grandMean = all.Average(g => g.Mean);
            averageS = all.Average(g => g.StandardDeviation);
        }
        else
        {
            double n = all.Sum(g => (double)g.Count);
            grandMean = all.Sum(g => g.Count * g.Mean) / n;
            averageS = Math.Sqrt(all.Sum(g => (g.Count - 1) * g.StandardDeviation * g.StandardDeviation) / (n - all.Length));
        }
        if (!(averageS > 0))
        {
            throw new ArgumentException("every subgroup has zero spread: the control limits would collapse onto the centre line", nameof(subgroups));
        }

        var z = new double[all.Length];
        var points = new ControlChartPoint[all.Length];
        for (int i = 0; i < all.Length; i++)
        {
            Subgroup g = all[i];
            double halfWidth = ControlChartConstants.A3(g.Count) * averageS;
            double sLower = ControlChartConstants.B3(g.Count) * averageS, sUpper = ControlChartConstants.B4(g.Count) * averageS;
            z[i] = (g.Mean - grandMean) / (halfWidth / 3);
            var signals = new List<ControlSignal>();
            AddMeanSignals(z, i, signals);
            if (g.StandardDeviation > sUpper)
            {
                signals.Add(new ControlSignal(ControlChart.StandardDeviation, ControlRule.BeyondThreeSigma, Above: true));
            }
            else if (g.StandardDeviation < sLower)
            {
                signals.Add(new ControlSignal(ControlChart.StandardDeviation, ControlRule.BeyondThreeSigma, Above: false));
            }
            points[i] = new ControlChartPoint(g, grandMean - halfWidth, grandMean + halfWidth, halfWidth / 3, sLower, sUpper, signals);
        }
        return new XBarSChart(grandMean, averageS, uniform, points);
    }

    /// <summary>The points with at least one signal, in order.</summary>
    public IEnumerable<ControlChartPoint> OutOfControl() => Points.Where(p => p.Signals.Count > 0);

    // Rules on the standardised means z = (x̄ − x̿)/σ(x̄) up to point i. A window's signal is given to its last point,
    // and rules 2 and 3 ask that this point be itself one of those beyond the zone (common practice, no published
    // source), so a run is flagged once where it is completed, not again by an in-zone point after it.
    private static void AddMeanSignals(double[] z, int i, List<ControlSignal> signals)
    {
        foreach (bool above in (bool[])[true, false])
        {
            double sign = above ? 1 : -1;
            double zi = sign * z[i];
            if (zi > 3)
            {
                signals.Add(new ControlSignal(ControlChart.Mean, ControlRule.BeyondThreeSigma, above));
            }
            if (zi > 2 && CountBeyond(z, i, 3, 2, sign) >= 2)
            {
                signals.Add(new ControlSignal(ControlChart.Mean, ControlRule.TwoOfThreeBeyondTwoSigma, above));
            }
            if (zi > 1 && CountBeyond(z, i, 5, 1, sign) >= 4)
            {
                signals.Add(new ControlSignal(ControlChart.Mean, ControlRule.FourOfFiveBeyondOneSigma, above));
            }
            if (i >= 7 && CountBeyond(z, i, 8, 0, sign) == 8)
            {
                signals.Add(new ControlSignal(ControlChart.Mean, ControlRule.EightOnOneSide, above));
            }
        }
    }

    private static int CountBeyond(double[] z, int last, int window, double sigmas, double sign)
    {
        if (last + 1 < window)
        {
            return 0;
        }
        int count = 0;
        for (int j = last - window + 1; j <= last; j++)
        {
            if (sign * z[j] > sigmas)
            {
                count++;
            }
        }
        return count;
    }

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
