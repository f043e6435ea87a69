namespace FilterQA.Data.Services;

/// <summary>
/// One lot judged again: go counts of the units' counted measurements (the yield that decides the lot) and of their
/// first measurements (first-pass yield), as recorded and as the draft would have judged them.
/// </summary>
public sealed record WhatIfLot(string LotNumber, int RecordedTemplateRevision, int UnitsTested, int RecordedGo, int WhatIfGo,
    int RecordedFirstPassGo, int WhatIfFirstPassGo)
{
    /// <summary>Recorded yield, RecordedGo / UnitsTested, 0..1; NaN for a lot with no unit tested.</summary>
    public double RecordedYield => Fraction(RecordedGo);

    /// <summary>What-if yield, WhatIfGo / UnitsTested, 0..1; NaN for a lot with no unit tested.</summary>
    public double WhatIfYield => Fraction(WhatIfGo);

    /// <summary>Recorded first-pass yield, 0..1; NaN for no unit.</summary>
    public double RecordedFirstPassYield => Fraction(RecordedFirstPassGo);

    /// <summary>What-if first-pass yield, 0..1; NaN for no unit.</summary>
    public double WhatIfFirstPassYield => Fraction(WhatIfFirstPassGo);

    private double Fraction(int go) => UnitsTested == 0 ? double.NaN : (double)go / UnitsTested;
}
