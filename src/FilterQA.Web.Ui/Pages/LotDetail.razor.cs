using System.Globalization;
using FilterQA.Core.Statistics;
using FilterQA.Data;
using FilterQA.Data.Services;
using FilterQA.Data.Accounts;
using FilterQA.Web.Ui.Charts;
using FilterQA.Web.Ui.Services;
using Microsoft.AspNetCore.Components;
using Microsoft.AspNetCore.Components.Authorization;

namespace FilterQA.Web.Ui.Pages;

/// <summary>
/// One lot: progress against the plan, the approver's dispositions, yield, failing rules, the overlay of all
/// counted sweeps (a server-side min/max envelope) against the limit lines, a histogram per parameter, the units.
/// </summary>
public partial class LotDetail
{
    private bool _busy;

    [Inject]
    private LotPageModel Model { get; set; } = null!;

    [CascadingParameter]
    private Task<AuthenticationState>? AuthenticationState { get; set; }

    /// <summary>The lot number from the address.</summary>
    [Parameter]
    public string LotNumber { get; set; } = "";

    private LotPage? Page { get; set; }

    private ChartModel? Overlay { get; set; }

    private IReadOnlyList<(ParameterSummary Summary, ChartModel Chart)> Histograms { get; set; } = [];

    private string? Problem { get; set; }

    private string? Done { get; set; }

    private string? Reason { get; set; }

    private string OverlayCaption => Page is null ? "" : string.Create(CultureInfo.InvariantCulture,
        $"Least and largest loss of {Page.Envelope.TraceCount} counted sweeps in {Page.Envelope.BinCount} frequency bins. {Page.MaskNote}");

    // After-render only runs once the circuit is live (never while prerendering), so this says the buttons answer.
    private bool Live { get; set; }

    protected override Task OnParametersSetAsync() => LoadAsync();

    protected override void OnAfterRender(bool firstRender)
    {
        if (firstRender)
        {
            Live = true;
            StateHasChanged();
        }
    }

    private async Task LoadAsync()
    {
        try
        {
            Page = await Model.LoadAsync(LotNumber).ConfigureAwait(true);
            Overlay = EnvelopeChartBuilder.Build(Page.Envelope, Page.MaskLines);
            Histograms = Page.Statistics.Parameters.Select(p => (p, HistogramChartBuilder.Build(p))).ToArray();
        }
        catch (RecordNotFoundException e)
        {
            Page = null;
            Problem = e.Message;
        }
    }

    private Task DecideAsync() => ActAsync((m, actor) => m.DecideAsync(LotNumber, actor), "Decided by the plan.");

    private Task HoldAsync() => ActAsync((m, actor) => m.HoldAsync(LotNumber, Reason, actor), "The lot is on hold.");

    private Task ReleaseAsync() => ActAsync((m, actor) => m.ReleaseHoldAsync(LotNumber, actor), "The hold is released.");

    private Task OverrideAsync(bool accept) =>
        ActAsync((m, actor) => m.OverrideAsync(LotNumber, accept, Reason, actor), accept ? "Accepted by override." : "Rejected by override.");

    private async Task ActAsync(Func<LotPageModel, Actor, Task<LotActionResult>> action, string doneText)
    {
        if (AuthenticationState is null)
        {
            return;
        }
        _busy = true;
        (Problem, Done) = (null, null);
        try
        {
            Actor actor = ActorClaims.FromClaims((await AuthenticationState.ConfigureAwait(true)).User);
            LotActionResult result = await action(Model, actor).ConfigureAwait(true);
            if (result.Succeeded)
            {
                Done = doneText;
                Reason = null;
                await LoadAsync().ConfigureAwait(true);
            }
            else
            {
                Problem = result.Problem;
            }
        }
        finally
        {
            _busy = false;
        }
    }

    private static string BarWidth(double share) => (share * 12).ToString("0.##", CultureInfo.InvariantCulture) + "rem";

    private static string ParameterText(ParameterSummary summary)
    {
        double largest = Math.Max(Math.Abs(summary.Moments.Minimum), Math.Abs(summary.Moments.Maximum));
        DisplayUnit unit = DisplayUnit.For(summary.Unit, largest);
        string limits = summary.Limits is { } l
            ? string.Join(", ", new[] { l.Lower is { } lo ? "lower limit " + Words.Number(unit.From(lo)) : null, l.Upper is { } hi ? "upper limit " + Words.Number(unit.From(hi)) : null }
                .Where(s => s is not null))
            : "no limits";
        string capability = summary.Capability is { } c
            ? string.Create(CultureInfo.InvariantCulture, $"; {(c.IsPerformanceIndex ? "Ppk" : "Cpk")} {c.Cpk:0.00} (lower {c.Confidence * 100:0} % bound {c.CpkLowerBound:0.00})")
            : summary.CapabilityNote is { } note ? "; " + note : "";
        return string.Create(CultureInfo.InvariantCulture,
            $"{summary.Moments.Count} values in {unit.Symbol}: mean {Words.Number(unit.From(summary.Moments.Mean))}, standard deviation {Words.Number(unit.From(summary.Moments.StandardDeviation))}, from {Words.Number(unit.From(summary.Moments.Minimum))} to {Words.Number(unit.From(summary.Moments.Maximum))}; {limits}{capability}.");
    }
}
