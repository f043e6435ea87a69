namespace FilterQA.Web.Ui.Services;

/// <summary>One lot on the trends page: when it was registered, from whom, and its yields (0..1).</summary>
public sealed record TrendLot(string LotNumber, string Supplier, DateTimeOffset CreatedAt, int UnitsTested, double FirstPassYield, double FinalYield);
