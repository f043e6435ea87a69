namespace FilterQA.Web.Ui.Services;

/// <summary>The trends of one part (and perhaps one supplier): lots with their yields, oldest first, and a trend per rule.</summary>
public sealed record TrendPage(string PartNumber, string? Supplier, IReadOnlyList<string> Suppliers, IReadOnlyList<TrendLot> Lots,
    IReadOnlyList<ParameterTrend> Parameters);
