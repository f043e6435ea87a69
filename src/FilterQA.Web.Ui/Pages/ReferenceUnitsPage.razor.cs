using System.Globalization;
using FilterQA.Core.Decisions;
using FilterQA.Data;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Web.Ui.Services;
using Microsoft.AspNetCore.Components;
using Microsoft.AspNetCore.Components.Authorization;

namespace FilterQA.Web.Ui.Pages;

/// <summary>
/// The part's reference (known-good) units: the current list, removal with a note, and adding one from the part's
/// stored measurements (pick the lot, then the unit; only go measurements can be chosen). Quality engineers only.
/// </summary>
public partial class ReferenceUnitsPage
{
    private bool _busy;

    [Inject]
    private ReferenceUnitService ReferenceUnits { get; set; } = null!;

    [CascadingParameter]
    private Task<AuthenticationState>? AuthenticationState { get; set; }

    /// <summary>The part number from the address.</summary>
    [Parameter]
    public string PartNumber { get; set; } = "";

    private IReadOnlyList<ReferenceUnitInfo> Units { get; set; } = [];

    private IReadOnlyList<string> Lots { get; set; } = [];

    private IReadOnlyList<ReferenceCandidate> Candidates { get; set; } = [];

    private Dictionary<long, string> RemovalNotes { get; } = [];

    private string Lot { get; set; } = "";

    private string MeasurementText { get; set; } = "";

    private string Note { get; set; } = "";

    private string? LoadProblem { get; set; }

    private string? Problem { get; set; }

    private string? Done { get; set; }

    private bool Live { get; set; }

    protected override async Task OnParametersSetAsync()
    {
        LoadProblem = null;
        try
        {
            await ReloadAsync().ConfigureAwait(true);
        }
        catch (RecordNotFoundException e)
        {
            LoadProblem = e.Message;
        }
    }

    protected override void OnAfterRender(bool firstRender)
    {
        if (firstRender)
        {
            Live = true;
            StateHasChanged();
        }
    }

    private async Task ReloadAsync()
    {
        Units = await ReferenceUnits.ListAsync(PartNumber).ConfigureAwait(true);
        Lots = await ReferenceUnits.LotsAsync(PartNumber).ConfigureAwait(true);
        Candidates = Lot.Length == 0 ? [] : await ReferenceUnits.CandidatesAsync(PartNumber, Lot).ConfigureAwait(true);
    }

    private string RemovalNote(long id) => RemovalNotes.TryGetValue(id, out string? note) ? note : "";

    private static string CandidateLabel(ReferenceCandidate c)
    {
        string why = c.IsReference ? " (already a reference unit)" : c.Verdict == UnitVerdict.Go ? "" : " (not go: cannot be a reference unit)";
        return string.Create(CultureInfo.InvariantCulture, $"{c.Serial}, attempt {c.Attempt}, {Words.Verdict(c.Verdict)}, {Words.Time(c.MeasuredAt)}{why}");
    }

    private async Task LotChosenAsync(ChangeEventArgs e)
    {
        Lot = e.Value?.ToString() ?? "";
        MeasurementText = "";
        await RunAsync(async _ =>
        {
            Candidates = Lot.Length == 0 ? [] : await ReferenceUnits.CandidatesAsync(PartNumber, Lot).ConfigureAwait(true);
            return null;
        }).ConfigureAwait(true);
    }

    private Task AddAsync() => RunAsync(async actor =>
    {
        if (!long.TryParse(MeasurementText, NumberStyles.Integer, CultureInfo.InvariantCulture, out long measurementId))
        {
            throw new ArgumentException("choose the lot and the unit first");
        }
        if (string.IsNullOrWhiteSpace(Note))
        {
            throw new ArgumentException("say why the unit is known good");
        }
        ReferenceUnitInfo added = await ReferenceUnits.AddAsync(PartNumber, measurementId, Note, actor).ConfigureAwait(true);
        Note = "";
        MeasurementText = "";
        await ReloadAsync().ConfigureAwait(true);
        return $"{added.Serial} of lot {added.LotNumber} is now a reference unit.";
    });

    private Task RemoveAsync(ReferenceUnitInfo unit) => RunAsync(async actor =>
    {
        string note = RemovalNote(unit.Id);
        if (string.IsNullOrWhiteSpace(note))
        {
            throw new ArgumentException($"say why {unit.Serial} is removed");
        }
        await ReferenceUnits.RemoveAsync(PartNumber, unit.Id, note, actor).ConfigureAwait(true);
        RemovalNotes.Remove(unit.Id);
        await ReloadAsync().ConfigureAwait(true);
        return $"{unit.Serial} of lot {unit.LotNumber} is no longer a reference unit.";
    });

    private async Task RunAsync(Func<Actor, Task<string?>> action)
    {
        if (AuthenticationState is null)
        {
            return;
        }
        _busy = true;
        Problem = null;
        Done = null;
        try
        {
            Actor actor = ActorClaims.FromClaims((await AuthenticationState.ConfigureAwait(true)).User);
            Done = await action(actor).ConfigureAwait(true);
        }
        catch (Exception e) when (e is StorageRuleException or RecordNotFoundException or ArgumentException)
        {
            Problem = Words.Sentence(e.Message);
        }
        finally
        {
            _busy = false;
        }
    }
}
