using System.Globalization;
using System.Text.RegularExpressions;

namespace FilterQA.Reports.Tests.Infrastructure;

/// <summary>Numbers read back from extracted text with double.Parse (invariant), and their printing resolution.</summary>
public static partial class Numbers
{
    [GeneratedRegex(@"-?\d+(\.\d+)?")]
    private static partial Regex NumberPattern();

    public static IReadOnlyList<string> In(string text) => NumberPattern().Matches(text).Select(m => m.Value).ToArray();

    /// <summary>The tokens of a printed line that are whole numbers (double.TryParse, invariant), with the token after each (its unit, when printed).</summary>
    public static IReadOnlyList<(string Number, string? Unit)> Tokens(string[] line)
    {
        var found = new List<(string, string?)>();
        for (int i = 0; i < line.Length; i++)
        {
            if (double.TryParse(line[i], NumberStyles.Float, CultureInfo.InvariantCulture, out _))
            {
                found.Add((line[i], i + 1 < line.Length ? line[i + 1] : null));
            }
        }
        return found;
    }

    public static double Parse(string text) => double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);

    /// <summary>Half a unit of the last printed digit: the most a correctly rounded print can differ from the value.</summary>
    public static double HalfLastDigit(string printed)
    {
        int dot = printed.IndexOf('.', StringComparison.Ordinal);
        int decimals = dot < 0 ? 0 : printed.Length - dot - 1;
        return 0.5 * Math.Pow(10, -decimals) * (1 + 1e-9);
    }

    /// <summary>Asserts that <paramref name="printed"/> is <paramref name="expected"/> rounded to its printed digits.</summary>
    public static void Equal(double expected, string printed, string what)
    {
        double value = Parse(printed);
        double tolerance = HalfLastDigit(printed) + Math.Abs(expected) * 1e-12; // rounding to the printed digits, plus binary representation
        Assert.True(Math.Abs(value - expected) <= tolerance, $"{what}: printed {printed}, expected {expected} (±{tolerance})");
    }
}
