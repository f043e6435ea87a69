using System.Globalization;

namespace FilterQA.Core.Statistics.ControlCharts;

/// <summary>One rational subgroup of a control chart (here: one lot's sample) summarised by its size, mean and s.</summary>
public sealed record Subgroup
{
    /// <summary>Makes a subgroup.</summary>
    /// <param name="label">What the subgroup is (a lot number); not empty.</param>
    /// <param name="count">n, 2 or more.</param>
    /// <param name="mean">x̄, the parameter's SI unit; finite.</param>
    /// <param name="standardDeviation">s with n − 1, the parameter's SI unit; finite, 0 or more.</param>
    /// <exception cref="ArgumentException">An empty label, n below 2, or a mean or s that is NaN, infinite or (s) negative.</exception>
    public Subgroup(string label, int count, double mean, double standardDeviation)
    {
        ArgumentException.ThrowIfNullOrEmpty(label);
        if (count < 2)
        {
            throw new ArgumentException(Invariant($"subgroup '{label}' has {count} value(s); an X-bar and S chart needs 2 or more per subgroup"), nameof(count));
        }
        if (!double.IsFinite(mean))
        {
            throw new ArgumentException(Invariant($"subgroup '{label}': the mean {mean} must be finite"), nameof(mean));
        }
        if (!double.IsFinite(standardDeviation) || standardDeviation < 0)
        {
            throw new ArgumentException(Invariant($"subgroup '{label}': the standard deviation {standardDeviation} must be finite and 0 or more"), nameof(standardDeviation));
        }
        Label = label;
        Count = count;
        Mean = mean;
        StandardDeviation = standardDeviation;
    }

    /// <summary>What the subgroup is (a lot number).</summary>
    public string Label { get; }

    /// <summary>n, 2 or more.</summary>
    public int Count { get; }

    /// <summary>x̄, the parameter's SI unit.</summary>
    public double Mean { get; }

    /// <summary>s (n − 1), the parameter's SI unit, 0 or more.</summary>
    public double StandardDeviation { get; }

    /// <summary>The subgroup of these values (at least 2, finite).</summary>
    /// <exception cref="ArgumentException">Fewer than 2 values or a NaN or infinite value (index named).</exception>
    public static Subgroup Of(string label, ReadOnlySpan<double> values)
    {
        SampleMoments.CheckValues(values, 2);
        SampleMoments m = SampleMoments.Of(values);
        return new Subgroup(label, m.Count, m.Mean, m.StandardDeviation);
    }

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
