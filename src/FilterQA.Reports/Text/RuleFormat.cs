using FilterQA.Reports.Documents;

namespace FilterQA.Reports.Text;

/// <summary>A rule line's numbers in one display unit with one number of decimals, chosen from the larger of value and limit.</summary>
public static class RuleFormat
{
    public static (DisplayUnit Unit, int Decimals) For(RuleLine rule)
    {
        ArgumentNullException.ThrowIfNull(rule);
        double largest = Math.Max(Math.Abs(rule.Measured ?? 0), Math.Abs(rule.Limit ?? 0));
        DisplayUnit unit = DisplayUnit.For(rule.Unit, largest);
        return (unit, unit.DecimalsFor(unit.From(largest)));
    }

    public static string Value(RuleLine rule)
    {
        (DisplayUnit unit, int decimals) = For(rule);
        return unit.WithSymbol(rule.Measured, decimals);
    }

    public static string Limit(RuleLine rule)
    {
        (DisplayUnit unit, int decimals) = For(rule);
        return rule.Limit is null ? "–" : Say.Sense(rule.Sense) + " " + unit.WithSymbol(rule.Limit, decimals);
    }

    public static string Margin(RuleLine rule)
    {
        (DisplayUnit unit, int decimals) = For(rule);
        return unit.WithSymbol(rule.Margin, decimals);
    }
}
