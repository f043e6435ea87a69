using System.Globalization;

namespace FilterQA.Reports.Charts;

/// <summary>The unit a frequency is printed in (Hz inside, Hz/kHz/MHz/GHz on paper), chosen from the largest frequency shown.</summary>
public sealed record FrequencyScale(string Symbol, double HzPerUnit)
{
    /// <summary>The unit in which <paramref name="largestHz"/> reads as 1 to 999.</summary>
    public static FrequencyScale For(double largestHz) => Math.Abs(largestHz) switch
    {
        >= 1e9 => new FrequencyScale("GHz", 1e9),
        >= 1e6 => new FrequencyScale("MHz", 1e6),
        >= 1e3 => new FrequencyScale("kHz", 1e3),
        _ => new FrequencyScale("Hz", 1),
    };

    public double From(double hz) => hz / HzPerUnit;

    public string Format(double hz, int decimals = 3) =>
        (hz / HzPerUnit).ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture) + " " + Symbol;
}
