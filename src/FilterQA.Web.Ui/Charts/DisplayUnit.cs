namespace FilterQA.Web.Ui.Charts;

/// <summary>How a stored SI value is shown: Hz as kHz/MHz, farad as pF, seconds as ns, ohm as Ω.</summary>
/// <param name="Symbol">The unit shown.</param>
/// <param name="SiPerUnit">SI units in one shown unit.</param>
public sealed record DisplayUnit(string Symbol, double SiPerUnit)
{
    /// <summary>The shown unit for values of SI unit <paramref name="siSymbol"/> whose largest magnitude is <paramref name="largest"/>.</summary>
    public static DisplayUnit For(string siSymbol, double largest) => siSymbol switch
    {
        "Hz" => FrequencyScale.For(largest) is var f ? new DisplayUnit(f.Symbol, f.HzPerUnit) : throw new InvalidOperationException(),
        "F" => new DisplayUnit("pF", 1e-12),
        "s" => new DisplayUnit("ns", 1e-9),
        "ohm" => new DisplayUnit("Ω", 1),
        _ => new DisplayUnit(siSymbol, 1),
    };

    /// <summary>An SI value in this unit.</summary>
    public double From(double si) => si / SiPerUnit;
}
