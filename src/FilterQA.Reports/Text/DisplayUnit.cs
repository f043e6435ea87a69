using System.Globalization;
using FilterQA.Reports.Charts;

namespace FilterQA.Reports.Text;

/// <summary>How an SI value is printed: Hz as kHz/MHz, seconds as ns/µs, farad as pF/fF, henry as mH; dB, ppm, ohm as they are.</summary>
/// <param name="Symbol">The unit printed ("" for a ratio).</param>
/// <param name="SiPerUnit">SI units in one printed unit.</param>
public sealed record DisplayUnit(string Symbol, double SiPerUnit)
{
    /// <summary>The printed unit for values of SI unit <paramref name="siSymbol"/> whose largest magnitude is <paramref name="largest"/>.</summary>
    public static DisplayUnit For(string siSymbol, double largest)
    {
        double a = Math.Abs(largest);
        return siSymbol switch
        {
            "Hz" => FrequencyScale.For(a) is var f ? new DisplayUnit(f.Symbol, f.HzPerUnit) : throw new InvalidOperationException(),
            "s" => a >= 1e-3 ? new DisplayUnit("ms", 1e-3) : a >= 1e-6 ? new DisplayUnit("µs", 1e-6) : new DisplayUnit("ns", 1e-9),
            "F" => a >= 1e-12 || a == 0 ? new DisplayUnit("pF", 1e-12) : new DisplayUnit("fF", 1e-15),
            "H" => a >= 1 ? new DisplayUnit("H", 1) : new DisplayUnit("mH", 1e-3),
            _ => new DisplayUnit(siSymbol, 1),
        };
    }

    /// <summary>An SI value in this unit.</summary>
    public double From(double si) => si / SiPerUnit;

    /// <summary>Decimals that print about five significant digits of <paramref name="largestShown"/> (in this unit); dB two decimals, ppm one.</summary>
    public int DecimalsFor(double largestShown)
    {
        if (Symbol == "dB")
        {
            return 2;
        }
        if (Symbol == "ppm")
        {
            return 1;
        }
        double a = Math.Abs(largestShown);
        if (!(a > 0) || !double.IsFinite(a))
        {
            return 3;
        }
        return Math.Clamp(4 - (int)Math.Floor(Math.Log10(a)), 0, 6);
    }

    /// <summary>An SI value printed in this unit with <paramref name="decimals"/> decimals, without the symbol; "–" for null.</summary>
    public string Number(double? si, int decimals) =>
        si is { } v && double.IsFinite(v) ? From(v).ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture) : "–";

    /// <summary>As <see cref="Number"/>, followed by the symbol.</summary>
    public string WithSymbol(double? si, int decimals) =>
        si is { } v && double.IsFinite(v) ? Number(v, decimals) + (Symbol.Length > 0 ? " " + Symbol : string.Empty) : "–";
}
