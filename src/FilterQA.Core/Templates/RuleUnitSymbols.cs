namespace FilterQA.Core.Templates;

/// <summary>The printed symbol of a <see cref="RuleUnit"/>: SI where there is one; a ratio has none.</summary>
public static class RuleUnitSymbols
{
    /// <summary>"Hz", "ppm", "dB", "s", "ohm", "F", or "" for a dimensionless ratio.</summary>
    public static string Symbol(this RuleUnit unit) => unit switch
    {
        RuleUnit.Hertz => "Hz",
        RuleUnit.PartsPerMillion => "ppm",
        RuleUnit.Decibel => "dB",
        RuleUnit.Second => "s",
        RuleUnit.Ohm => "ohm",
        RuleUnit.Farad => "F",
        RuleUnit.Ratio => "",
        _ => throw new ArgumentOutOfRangeException(nameof(unit), unit, "not a rule unit"),
    };
}
