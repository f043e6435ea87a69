using FilterQA.Data.Services;

namespace FilterQA.Web.Ui.Services;

/// <summary>A station as the stations page lists it, with its latest thru (null when it has none).</summary>
public sealed record StationRow(string Name, string Description, ThruInfo? LatestThru);
