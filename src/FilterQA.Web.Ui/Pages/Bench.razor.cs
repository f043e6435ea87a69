using FilterQA.Web.Ui.Components;
using FilterQA.Web.Ui.Services;
using Microsoft.AspNetCore.Components;

namespace FilterQA.Web.Ui.Pages;

/// <summary>
/// The operator's bench: choose the station, scan the lot (Enter opens it), scan the serial (Enter moves to the
/// sweep), give the sweep; the verdict shows at once. Focus moves along the steps, so a scanner and the keyboard
/// suffice. The logic lives in <see cref="BenchSession"/>.
/// </summary>
public partial class Bench
{
    private ElementReference _lotInput;
    private ElementReference _serialInput;
    private ElementReference _reasonInput;
    private SweepUpload? _upload;
    private string? _focusNext = "lot";

    [Inject]
    private BenchSession Session { get; set; } = null!;

    [Inject]
    private StationDirectory StationList { get; set; } = null!;

    private IReadOnlyList<StationRow> Stations { get; set; } = [];

    private string Station { get; set; } = "";

    private string? LotText { get; set; }

    private string? SerialText { get; set; }

    private bool Retesting { get; set; }

    private string? RetestReason { get; set; }

    private ThruStatus? ThruStatus { get; set; }

    // After-render only runs once the circuit is live (never while prerendering), so this says the fields take input.
    private bool Live { get; set; }

    protected override async Task OnInitializedAsync()
    {
        Stations = await StationList.ListAsync().ConfigureAwait(true);
        Station = Stations.Count > 0 ? Stations[0].Name : "";
        if (Session.Lot is { } lot)
        {
            LotText = lot.LotNumber;
            await RefreshThruAsync().ConfigureAwait(true);
        }
    }

    protected override async Task OnAfterRenderAsync(bool firstRender)
    {
        if (firstRender)
        {
            Live = true;
            StateHasChanged();
        }
        if (_focusNext is { } next)
        {
            _focusNext = null;
            ElementReference? target = next switch
            {
                "lot" => _lotInput,
                "serial" => _serialInput,
                "reason" => _reasonInput,
                _ => null,
            };
            if (target is { } element && element.Context is not null)
            {
                await element.FocusAsync().ConfigureAwait(true);
            }
            else if (next == "upload" && _upload is not null)
            {
                await _upload.FocusAsync().ConfigureAwait(true);
            }
        }
    }

    private async Task OpenLotAsync()
    {
        Retesting = false;
        if (await Session.OpenLotAsync(LotText).ConfigureAwait(true))
        {
            LotText = Session.Lot!.LotNumber;
            SerialText = null;
            await RefreshThruAsync().ConfigureAwait(true);
            _focusNext = "serial";
        }
        else
        {
            _focusNext = "lot";
        }
    }

    private async Task RefreshThruAsync()
    {
        ThruStatus = await Session.ThruStatusAsync(Station).ConfigureAwait(true);
        Session.ClearBlockWhenCurrent(ThruStatus);
    }

    private Task SerialEnteredAsync()
    {
        SerialText = SerialText?.Trim();
        _focusNext = string.IsNullOrEmpty(SerialText) ? "serial" : Retesting && string.IsNullOrWhiteSpace(RetestReason) ? "reason" : "upload";
        return Task.CompletedTask;
    }

    private async Task SubmittedAsync(IReadOnlyList<BenchOutcome> outcomes)
    {
        await RefreshThruAsync().ConfigureAwait(true);
        if (outcomes.Any(o => o.Kind == BenchOutcomeKind.Judged))
        {
            // The unit is done: the next scan is the next unit's serial.
            SerialText = null;
            Retesting = false;
            RetestReason = null;
        }
        _focusNext = "serial";
    }

    private Task MeasureAgainAsync(string serial)
    {
        SerialText = serial;
        Retesting = true;
        RetestReason = null;
        _focusNext = "reason";
        return Task.CompletedTask;
    }
}
