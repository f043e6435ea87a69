namespace FilterQA.Reports.Documents;

/// <summary>One lot's line of a yield report: units tested, go at the first attempt, go as counted (after retests).</summary>
public sealed record LotYieldRow(string LotNumber, string Supplier, DateTimeOffset CreatedAt, string Status, int UnitsTested, int FirstPassGo, int FinalGo)
{
    public double? FirstPassYield => UnitsTested == 0 ? null : (double)FirstPassGo / UnitsTested;

    public double? FinalYield => UnitsTested == 0 ? null : (double)FinalGo / UnitsTested;
}
