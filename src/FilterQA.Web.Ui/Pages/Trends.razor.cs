using System.Globalization;
using FilterQA.Core.Statistics;
using FilterQA.Core.Statistics.ControlCharts;
using FilterQA.Data;
using FilterQA.Web.Ui.Charts;
using FilterQA.Web.Ui.Services;
using Microsoft.AspNetCore.Components;

namespace FilterQA.Web.Ui.Pages;

/// <summary>Yield per lot over time, X-bar and S control charts with spec limits, and Ppk per lot, for a part and perhaps one supplier.</summary>
public partial class Trends
{
    [Inject]
    private TrendPageModel Model { get; set; } = null!;

    [Inject]
    private PartDirectory PartList { get; set; } = null!;

    [Inject]
    private NavigationManager Navigation { get; set; } = null!;

    /// <summary>The part from the address (?part=).</summary>
    [SupplyParameterFromQuery(Name = "part")]
    public string? PartQuery { get; set; }

    /// <summary>The supplier from the address (?supplier=); none for every supplier.</summary>
    [SupplyParameterFromQuery(Name = "supplier")]
    public string? SupplierQuery { get; set; }

    private IReadOnlyList<string> Parts { get; set; } = [];

    private string? PartNumber { get; set; }

    private string? Supplier { get; set; }

    private TrendPage? View { get; set; }

    private string? Problem { get; set; }

    private string? RuleId { get; set; }

    private ParameterTrend? Selected => View?.Parameters.FirstOrDefault(p => p.RuleId == RuleId);

    private DisplayUnit? Unit { get; set; }

    private ChartModel? YieldChart { get; set; }

    private ChartModel? MeanChart { get; set; }

    private ChartModel? SpreadChart { get; set; }

    private ChartModel? CpkChart { get; set; }

    private bool Live { get; set; }

    private DateOnly? ReportFrom { get; set; }

    private DateOnly? ReportTo { get; set; }

    private string ReportPaper { get; set; } = "a4";

    protected override async Task OnInitializedAsync() => Parts = await PartList.PartNumbersAsync().ConfigureAwait(true);

    protected override async Task OnParametersSetAsync()
    {
        if (string.IsNullOrWhiteSpace(PartQuery))
        {
            return;
        }
        PartNumber = PartQuery;
        Supplier = SupplierQuery;
        await LoadAsync().ConfigureAwait(true);
    }

    protected override void OnAfterRender(bool firstRender)
    {
        if (firstRender)
        {
            Live = true;
            StateHasChanged();
        }
    }

    // The choice goes into the address, so the view can be bookmarked or sent; the address change loads it.
    private Task ShowAsync()
    {
        if (string.IsNullOrEmpty(PartNumber))
        {
            Problem = "Choose a part.";
            return Task.CompletedTask;
        }
        var query = new Dictionary<string, object?> { ["part"] = PartNumber, ["supplier"] = string.IsNullOrEmpty(Supplier) ? null : Supplier };
        Navigation.NavigateTo(Navigation.GetUriWithQueryParameters("trends", query));
        return Task.CompletedTask;
    }

    private async Task LoadAsync()
    {
        Problem = null;
        try
        {
            View = await Model.LoadAsync(PartNumber!, Supplier).ConfigureAwait(true);
            if (View.Supplier is { } s && !View.Suppliers.Contains(s, StringComparer.Ordinal))
            {
                Problem = $"No lot of {View.PartNumber} comes from {s}.";
            }
            YieldChart = TrendChartBuilder.Yields(View.Lots);
            // The period offered at first spans the lots shown.
            ReportFrom = View.Lots.Count > 0 ? DateOnly.FromDateTime(View.Lots.Min(l => l.CreatedAt).UtcDateTime) : null;
            ReportTo = View.Lots.Count > 0 ? DateOnly.FromDateTime(View.Lots.Max(l => l.CreatedAt).UtcDateTime) : null;
            Select(View.Parameters.FirstOrDefault(p => p.RuleId == RuleId)?.RuleId ?? View.Parameters.FirstOrDefault()?.RuleId);
        }
        catch (RecordNotFoundException e)
        {
            View = null;
            Problem = Words.Sentence(e.Message);
        }
    }

    private void RuleChanged(ChangeEventArgs e) => Select(e.Value as string);

    private string PeriodReportHref(TrendPage view) => string.Create(CultureInfo.InvariantCulture,
        $"parts/{Uri.EscapeDataString(view.PartNumber)}/yield-report.pdf?from={ReportFrom:yyyy-MM-dd}&to={ReportTo:yyyy-MM-dd}&paper={ReportPaper}");

    private void Select(string? ruleId)
    {
        RuleId = ruleId;
        if (Selected is not { } trend)
        {
            (Unit, MeanChart, SpreadChart, CpkChart) = (null, null, null, null);
            return;
        }
        double largest = trend.Lots.Max(l => Math.Max(Math.Abs(l.Moments.Minimum), Math.Abs(l.Moments.Maximum)));
        Unit = DisplayUnit.For(trend.Unit, largest);
        CpkChart = TrendChartBuilder.Capability(trend);
        if (trend.Chart is { } chart)
        {
            MeanChart = TrendChartBuilder.Means(trend, chart, Unit);
            SpreadChart = TrendChartBuilder.Spreads(trend, chart, Unit);
        }
        else
        {
            (MeanChart, SpreadChart) = (null, null);
        }
    }

    private string Shown(double si) => Unit is { } unit ? Words.Number(unit.From(si), "0.####") + " " + unit.Symbol : Words.Number(si);

    private string LimitsText(ParameterLot lot) => lot.Limits is { } l
        ? string.Join(" to ", new[] { l.Lower is { } lo ? "at least " + Shown(lo) : null, l.Upper is { } hi ? "at most " + Shown(hi) : null }.Where(t => t is not null))
        : "none";

    private string CentreText(XBarSChart chart, DisplayUnit unit) => string.Create(CultureInfo.InvariantCulture,
        $"Centre lines: x̿ = {Words.Number(unit.From(chart.GrandMean), "0.####")} {unit.Symbol}, s̄ = {Words.Number(unit.From(chart.AverageS), "0.####")} {unit.Symbol} ({(chart.IsUniformSize ? "every lot the same sample size: mean of the s" : "sample sizes differ: pooled s, limits per lot")}); {chart.Points.Count} lots.");

    private static string YieldCaption(TrendPage page) => string.Create(CultureInfo.InvariantCulture,
        $"First-pass and final yield of {page.Lots.Count} lot(s), oldest first.");

    private static string CapabilityCaption(ParameterTrend trend)
    {
        double slope = LotTrend.SlopePerLot(trend.Trend.Cpks());
        string drift = double.IsNaN(slope) ? "" : string.Create(CultureInfo.InvariantCulture, $" Least-squares slope {slope:+0.000;-0.000} per lot.");
        return $"Cpk per lot, computed from each lot's overall standard deviation (so strictly Ppk), with the 1.33 reference line.{drift}";
    }
}
