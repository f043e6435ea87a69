using FilterQA.Core.Statistics;
using FilterQA.Core.Statistics.ControlCharts;
using FilterQA.Data;
using FilterQA.Data.Services;

namespace FilterQA.Web.Ui.Services;

/// <summary>
/// Reads a part's lots for the trends page: yields per lot, and per rule the lot means and spreads for an X-bar and
/// S chart (one subgroup per lot) and Cpk per lot. Reads rule results lot by lot through <see cref="LotService"/>,
/// never sweeps.
/// </summary>
public sealed class TrendPageModel(LotService lots)
{
    /// <summary>The most recent lots shown.</summary>
    public const int MaxLots = 200;

    /// <summary>The part's trends over its tested lots (of one supplier when given), oldest first.</summary>
    /// <exception cref="RecordNotFoundException">The part has no lot at all (or is not registered).</exception>
    public async Task<TrendPage> LoadAsync(string partNumber, string? supplier, CancellationToken cancellationToken = default)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(partNumber);
        supplier = string.IsNullOrWhiteSpace(supplier) ? null : supplier.Trim();
        IReadOnlyList<LotSummary> ofPart = await lots.FindLotsAsync(new LotQuery { PartNumber = partNumber, Take = 1000 }, cancellationToken).ConfigureAwait(false);
        if (ofPart.Count == 0)
        {
            throw new RecordNotFoundException($"part {partNumber} has no lot");
        }
        string[] suppliers = ofPart.Select(l => l.Supplier).Distinct(StringComparer.Ordinal).Order(StringComparer.Ordinal).ToArray();

        // The same order as LotTrend: registration time, then lot number.
        LotSummary[] chosen = ofPart.Where(l => supplier is null || string.Equals(l.Supplier, supplier, StringComparison.Ordinal))
            .Where(l => l.UnitsTested > 0)
            .Take(MaxLots)
            .OrderBy(l => l.CreatedAt).ThenBy(l => l.LotNumber, StringComparer.Ordinal)
            .ToArray();
        var trendLots = new List<TrendLot>(chosen.Length);
        var byRule = new Dictionary<string, (string Unit, List<(ParameterLot Lot, double FirstPass, double Final)> Lots)>(StringComparer.Ordinal);
        var ruleOrder = new List<string>();
        foreach (LotSummary lot in chosen)
        {
            LotStatistics statistics = await lots.GetStatisticsAsync(lot.LotNumber, cancellationToken).ConfigureAwait(false);
            trendLots.Add(new TrendLot(lot.LotNumber, lot.Supplier, lot.CreatedAt, statistics.Yield.UnitsTested, statistics.Yield.FirstPassYield, statistics.Yield.FinalYield));
            foreach (ParameterSummary parameter in statistics.Parameters)
            {
                if (!byRule.TryGetValue(parameter.Parameter, out var entry))
                {
                    entry = (parameter.Unit, []);
                    byRule.Add(parameter.Parameter, entry);
                    ruleOrder.Add(parameter.Parameter);
                }
                entry.Lots.Add((new ParameterLot(lot.LotNumber, lot.CreatedAt, parameter.Moments, parameter.Limits, parameter.Capability, parameter.CapabilityNote),
                    statistics.Yield.FirstPassYield, statistics.Yield.FinalYield));
            }
        }
        ParameterTrend[] parameters = ruleOrder.Select(rule => Trend(rule, byRule[rule].Unit, byRule[rule].Lots)).ToArray();
        return new TrendPage(partNumber, supplier, suppliers, trendLots, parameters);
    }

    private static ParameterTrend Trend(string rule, string unit, List<(ParameterLot Lot, double FirstPass, double Final)> lots)
    {
        LotTrend trend = LotTrend.Create(rule, lots.Select(l => new LotTrendPoint(l.Lot.LotNumber, l.Lot.CreatedAt, l.Lot.Moments.Mean,
            l.Lot.Capability is { Cpk: var cpk } && double.IsFinite(cpk) ? cpk : null, l.FirstPass, l.Final)));
        ParameterLot[] usable = lots.Select(l => l.Lot).Where(l => l.Moments.Count >= 2 && double.IsFinite(l.Moments.StandardDeviation)).ToArray();
        if (usable.Length < 2)
        {
            return new ParameterTrend(rule, unit, lots.Select(l => l.Lot).ToArray(), trend, null,
                "A control chart needs at least 2 lots with 2 or more values each; " + (usable.Length == 1 ? "there is 1." : "there is none."));
        }
        try
        {
            XBarSChart chart = XBarSChart.Create(usable.Select(l => new Subgroup(l.LotNumber, l.Moments.Count, l.Moments.Mean, l.Moments.StandardDeviation)));
            string? note = usable.Length < lots.Count ? $"{lots.Count - usable.Length} lot(s) with a single value are left out of the control chart." : null;
            return new ParameterTrend(rule, unit, lots.Select(l => l.Lot).ToArray(), trend, chart, note);
        }
        catch (ArgumentException e)
        {
            return new ParameterTrend(rule, unit, lots.Select(l => l.Lot).ToArray(), trend, null, Words.Sentence(e.Message));
        }
    }
}
