namespace FilterQA.Data.Entities;

/// <summary>
/// The lot summary kept in the lot row. A unit's counted verdict follows the part's retest policy;
/// a not-verifiable unit counts as a defective (a unit that cannot be shown to conform is not accepted).
/// </summary>
public sealed class LotCounters
{
    public int UnitsTested { get; set; }

    public int Go { get; set; }

    public int NoGo { get; set; }

    public int NotVerifiable { get; set; }

    public int Defectives { get; set; }

    public int FirstPassGo { get; set; }

    public int UnitsRetested { get; set; }

    public int Measurements { get; set; }
}
