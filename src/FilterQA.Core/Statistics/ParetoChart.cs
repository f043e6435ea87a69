namespace FilterQA.Core.Statistics;

/// <summary>
/// Pareto of failing rules: counts sorted descending (ties by rule name, ordinal, so the order is
/// reproducible) with each bar's share and cumulative share of all failures.
/// </summary>
public sealed class ParetoChart
{
    private ParetoChart(IReadOnlyList<ParetoEntry> entries, int total)
    {
        Entries = entries;
        TotalFailures = total;
    }

    /// <summary>Bars, largest first; empty when there were no failures.</summary>
    public IReadOnlyList<ParetoEntry> Entries { get; }

    /// <summary>Sum of all counts.</summary>
    public int TotalFailures { get; }

    /// <summary>Builds the chart from one rule name per failure (a unit failing 3 rules contributes 3 names).</summary>
    /// <exception cref="ArgumentException">A null or empty rule name; the message names its index.</exception>
    public static ParetoChart FromFailures(IEnumerable<string> failedRules)
    {
        ArgumentNullException.ThrowIfNull(failedRules);
        var counts = new Dictionary<string, int>(StringComparer.Ordinal);
        int index = 0;
        foreach (string rule in failedRules)
        {
            CheckRule(rule, index++, nameof(failedRules));
            counts[rule] = counts.GetValueOrDefault(rule) + 1;
        }
        return Build(counts);
    }

    /// <summary>Builds the chart from counts per rule; rules with a count of 0 are left out.</summary>
    /// <exception cref="ArgumentException">A null or empty rule name, a repeated name, or a negative count.</exception>
    public static ParetoChart FromCounts(IEnumerable<KeyValuePair<string, int>> countsByRule)
    {
        ArgumentNullException.ThrowIfNull(countsByRule);
        var counts = new Dictionary<string, int>(StringComparer.Ordinal);
        int index = 0;
        foreach ((string rule, int count) in countsByRule)
        {
            CheckRule(rule, index, nameof(countsByRule));
            if (count < 0)
            {
                throw new ArgumentException(FormattableString.Invariant($"rule '{rule}' has a negative count {count}"), nameof(countsByRule));
            }
            if (!counts.TryAdd(rule, count))
            {
                throw new ArgumentException($"rule '{rule}' appears more than once", nameof(countsByRule));
            }
            index++;
        }
        return Build(counts);
    }

    private static ParetoChart Build(Dictionary<string, int> counts)
    {
        int total = counts.Values.Sum();
        var ordered = counts.Where(kv => kv.Value > 0)
            .OrderByDescending(kv => kv.Value)
            .ThenBy(kv => kv.Key, StringComparer.Ordinal)
            .ToArray();
        var entries = new ParetoEntry[ordered.Length];
        int running = 0;
        for (int i = 0; i < ordered.Length; i++)
        {
            running += ordered[i].Value;
            // The cumulative share is running/total (not a sum of rounded shares), so the last bar is exactly 1.
            entries[i] = new ParetoEntry(ordered[i].Key, ordered[i].Value, (double)ordered[i].Value / total, (double)running / total);
        }
        return new ParetoChart(entries, total);
    }

    private static void CheckRule(string? rule, int index, string parameter)
    {
        if (string.IsNullOrEmpty(rule))
        {
            throw new ArgumentException(FormattableString.Invariant($"rule name at index {index} is null or empty"), parameter);
        }
    }
}
