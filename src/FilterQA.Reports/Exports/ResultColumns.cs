using System.Globalization;
using FilterQA.Data.Services.Exports;

namespace FilterQA.Reports.Exports;

/// <summary>The columns of a lot's results export, shared by the CSV and the workbook so both say the same.</summary>
public static class ResultColumns
{
    /// <summary>The fixed columns before the rule columns.</summary>
    public static IReadOnlyList<string> Fixed { get; } = ["Serial", "Attempt", "Counted", "Verdict", "Measured at (UTC)", "Station"];

    /// <summary>The header row: the fixed columns, then per rule its value, limit and margin (with the unit) and its outcome.</summary>
    public static IReadOnlyList<string> Header(IReadOnlyList<ExportRuleColumn> rules)
    {
        ArgumentNullException.ThrowIfNull(rules);
        var header = new List<string>(Fixed);
        foreach (ExportRuleColumn rule in rules)
        {
            string unit = rule.Unit.Length == 0 ? " (ratio)" : $" ({rule.Unit})";
            header.Add($"{rule.RuleId} value{unit}");
            header.Add($"{rule.RuleId} limit{unit}");
            header.Add($"{rule.RuleId} margin{unit}");
            header.Add($"{rule.RuleId} outcome");
        }
        return header;
    }

    /// <summary>A time as written in the exports: UTC, ISO 8601 with seven fraction digits.</summary>
    public static string Time(DateTimeOffset at) => at.UtcDateTime.ToString("yyyy-MM-dd'T'HH:mm:ss.fffffff'Z'", CultureInfo.InvariantCulture);

    /// <summary>A number as written in the CSV: invariant culture, round-trip ("R"); empty when there is none.</summary>
    public static string Number(double? value) => value is { } v ? v.ToString("R", CultureInfo.InvariantCulture) : "";

    /// <summary>The counted flag as written: "yes" when the attempt decides the unit for the lot.</summary>
    public static string Counted(bool counts) => counts ? "yes" : "no";
}
