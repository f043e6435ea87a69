using System.Globalization;
using FilterQA.Core.Templates;

namespace FilterQA.Web.Ui.Services;

/// <summary>A rule's value, limit or margin with its unit for the screen (frequencies in kHz/MHz/GHz, times in ns, capacitance in pF).</summary>
public static class RuleValueText
{
    /// <summary>The value with its unit, e.g. "455.2 kHz", "5.83 dB", "62 ns"; "—" for null.</summary>
    public static string Format(double? value, RuleUnit unit)
    {
        if (value is not { } v)
        {
            return "—";
        }
        (double scaled, string symbol) = unit switch
        {
            RuleUnit.Hertz => Math.Abs(v) >= 1e9 ? (v / 1e9, "GHz") : Math.Abs(v) >= 1e6 ? (v / 1e6, "MHz") : Math.Abs(v) >= 1e3 ? (v / 1e3, "kHz") : (v, "Hz"),
            RuleUnit.Second => Math.Abs(v) >= 1e-6 ? (v * 1e6, "us") : (v * 1e9, "ns"),
            RuleUnit.Farad => (v * 1e12, "pF"),
            RuleUnit.Ohm => (v, "ohm"),
            RuleUnit.Decibel => (v, "dB"),
            RuleUnit.PartsPerMillion => (v, "ppm"),
            _ => (v, ""),
        };
        string number = scaled.ToString("0.####", CultureInfo.InvariantCulture);
        return symbol.Length == 0 ? number : number + " " + symbol;
    }
}
