using FilterQA.Core.Sampling;
using FilterQA.Data;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Web.Ui.Services;
using Microsoft.AspNetCore.Components;
using Microsoft.AspNetCore.Components.Authorization;

namespace FilterQA.Web.Ui.Pages;

/// <summary>Registers a delivery as a lot; the plan fields are for quality engineers (see <see cref="NewLotForm"/>).</summary>
public partial class NewLotPage
{
    private ElementReference _first;
    private bool _busy;

    [Inject]
    private LotService LotsService { get; set; } = null!;

    [Inject]
    private PartDirectory PartList { get; set; } = null!;

    [Inject]
    private NavigationManager Navigation { get; set; } = null!;

    [CascadingParameter]
    private Task<AuthenticationState>? AuthenticationState { get; set; }

    private NewLotForm Form { get; } = new();

    private IReadOnlyList<string> Parts { get; set; } = [];

    private IReadOnlyList<string> Problems { get; set; } = [];

    private bool MayChangePlan { get; set; }

    private string SeverityText
    {
        get => Form.Severity?.ToString() ?? "";
        set => Form.Severity = Enum.TryParse(value, out InspectionSeverity s) ? s : null;
    }

    protected override async Task OnInitializedAsync()
    {
        Parts = await PartList.PartNumbersAsync().ConfigureAwait(true);
        if (AuthenticationState is not null)
        {
            MayChangePlan = (await AuthenticationState.ConfigureAwait(true)).User.IsInRole(RoleNames.QualityEngineer);
        }
    }

    protected override async Task OnAfterRenderAsync(bool firstRender)
    {
        if (firstRender)
        {
            await _first.FocusAsync().ConfigureAwait(true);
        }
    }

    private async Task CreateAsync()
    {
        Problems = Form.Problems(MayChangePlan);
        if (Problems.Count > 0 || AuthenticationState is null)
        {
            return;
        }
        _busy = true;
        try
        {
            Actor actor = ActorClaims.FromClaims((await AuthenticationState.ConfigureAwait(true)).User);
            LotSummary lot = await LotsService.CreateLotAsync(Form.ToNewLot(MayChangePlan), actor).ConfigureAwait(true);
            Navigation.NavigateTo("lots/" + Uri.EscapeDataString(lot.LotNumber));
        }
        catch (Exception e) when (e is StorageRuleException or RecordNotFoundException or ArgumentException)
        {
            Problems = [e.Message];
        }
        finally
        {
            _busy = false;
        }
    }
}
