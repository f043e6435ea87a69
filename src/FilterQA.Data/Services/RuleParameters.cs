using FilterQA.Core.Decisions;
using FilterQA.Core.Statistics;
using FilterQA.Core.Templates;
using FilterQA.Data.Entities;

namespace FilterQA.Data.Services;

/// <summary>Stored rule results summarised per rule: the lot page, the lot statistics and the reports read them the same way.</summary>
public static class RuleParameters
{
    /// <summary>
    /// One summary per rule id, in the order the rules first appear: its finite measured values, its unit, and the
    /// limits the results record (a rule without a finite value is left out).
    /// </summary>
    public static IReadOnlyList<ParameterSummary> Summarise(IEnumerable<RuleResultRecord> results)
    {
        ArgumentNullException.ThrowIfNull(results);
        var parameters = new List<ParameterSummary>();
        foreach (IGrouping<string, RuleResultRecord> rule in results.GroupBy(r => r.RuleId))
        {
            double[] values = rule.Where(r => r.MeasuredValue is { } v && double.IsFinite(v)).Select(r => r.MeasuredValue!.Value).ToArray();
            if (values.Length > 0)
            {
                parameters.Add(ParameterSummary.Compute(rule.Key, rule.First().Unit.Symbol(), values, Limits(rule)));
            }
        }
        return parameters;
    }

    // The lower limit from an at-least rule, the upper from an at-most one; none when they cross.
    private static SpecLimits? Limits(IEnumerable<RuleResultRecord> results)
    {
        RuleResultRecord[] withLimit = results.Where(r => r.LimitValue is { } v && double.IsFinite(v)).ToArray();
        double? lower = withLimit.FirstOrDefault(r => r.Sense == LimitSense.AtLeast)?.LimitValue;
        double? upper = withLimit.FirstOrDefault(r => r.Sense == LimitSense.AtMost)?.LimitValue;
        if (lower is null && upper is null)
        {
            return null;
        }
        return lower is { } lo && upper is { } hi && lo >= hi ? null : new SpecLimits(lower, upper);
    }
}
