using FilterQA.Data;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using Microsoft.AspNetCore.Components;
using Microsoft.AspNetCore.Components.Authorization;

namespace FilterQA.Web.Ui.Components;

/// <summary>Station API keys on the stations page, for administrators (the page shows it only to them).</summary>
public partial class StationKeys
{
    private bool _busy;

    [Inject]
    private StationApiKeys ApiKeys { get; set; } = null!;

    [CascadingParameter]
    private Task<AuthenticationState>? AuthenticationState { get; set; }

    /// <summary>The registered stations by name; the first is chosen at start.</summary>
    [Parameter, EditorRequired]
    public IReadOnlyList<string> StationNames { get; set; } = [];

    private string Station { get; set; } = "";

    private string Label { get; set; } = "";

    private IReadOnlyList<StationApiKeyInfo> Keys { get; set; } = [];

    /// <summary>The key just made, kept only in this circuit's memory until hidden or the page is left.</summary>
    private string? NewKey { get; set; }

    private string? Problem { get; set; }

    protected override async Task OnParametersSetAsync()
    {
        if (!StationNames.Contains(Station, StringComparer.Ordinal))
        {
            Station = StationNames.Count > 0 ? StationNames[0] : "";
            await LoadAsync().ConfigureAwait(true);
        }
    }

    private async Task StationChangedAsync(ChangeEventArgs e)
    {
        (Station, NewKey, Problem) = (e.Value as string ?? "", null, null);
        await LoadAsync().ConfigureAwait(true);
    }

    private async Task LoadAsync() => Keys = Station.Length == 0 ? [] : await ApiKeys.ListAsync(Station).ConfigureAwait(true);

    private async Task CreateAsync()
    {
        if (await ActorAsync().ConfigureAwait(true) is not { } actor)
        {
            return;
        }
        (_busy, NewKey, Problem) = (true, null, null);
        try
        {
            if (string.IsNullOrWhiteSpace(Label) || Label.Any(char.IsControl))
            {
                Problem = "What the key is for: say it in 1 to 200 printable characters, for example the instrument or script.";
                return;
            }
            NewStationApiKey made = await ApiKeys.CreateAsync(Station, Label, actor).ConfigureAwait(true);
            (NewKey, Label) = (made.Key, "");
            await LoadAsync().ConfigureAwait(true);
        }
        catch (Exception e) when (e is RecordNotFoundException or ArgumentException)
        {
            Problem = e.Message;
        }
        finally
        {
            _busy = false;
        }
    }

    private async Task RevokeAsync(StationApiKeyInfo key)
    {
        if (await ActorAsync().ConfigureAwait(true) is not { } actor)
        {
            return;
        }
        (_busy, NewKey, Problem) = (true, null, null);
        try
        {
            await ApiKeys.RevokeAsync(key.Station, key.Id, actor).ConfigureAwait(true);
            await LoadAsync().ConfigureAwait(true);
        }
        catch (RecordNotFoundException e)
        {
            Problem = e.Message;
        }
        finally
        {
            _busy = false;
        }
    }

    private async Task<Actor?> ActorAsync() =>
        AuthenticationState is null ? null : ActorClaims.TryFromClaims((await AuthenticationState.ConfigureAwait(true)).User);
}
