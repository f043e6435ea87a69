using System.Globalization;

namespace FilterQA.Web.Ui.Charts;

/// <summary>The unit a frequency axis is shown in (Hz inside, kHz/MHz/GHz on screen), chosen from the largest frequency shown.</summary>
/// <param name="Symbol">"Hz", "kHz", "MHz" or "GHz".</param>
/// <param name="HzPerUnit">Hertz in one unit of <paramref name="Symbol"/>.</param>
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

    /// <summary>A frequency in this unit.</summary>
    public double From(double hz) => hz / HzPerUnit;

    /// <summary>A frequency as text in this unit with a fixed number of decimals, e.g. "455.000 kHz".</summary>
    public string Format(double hz, int decimals = 3) =>
        (hz / HzPerUnit).ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture) + " " + Symbol;
}
