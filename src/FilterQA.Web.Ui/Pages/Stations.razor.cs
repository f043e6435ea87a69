using System.Globalization;
using FilterQA.Core.Formats;
using FilterQA.Data;
using FilterQA.Data.Services;
using FilterQA.Data.Accounts;
using FilterQA.Web.Ui.Services;
using Microsoft.AspNetCore.Components;
using Microsoft.AspNetCore.Components.Authorization;
using Microsoft.AspNetCore.Components.Forms;

namespace FilterQA.Web.Ui.Pages;

/// <summary>Stations with the age and flatness of their latest thru, and recording a new thru from a file.</summary>
public partial class Stations
{
    private bool _busy;

    [Inject]
    private StationDirectory Directory { get; set; } = null!;

    [Inject]
    private TimeProvider Clock { get; set; } = null!;

    [CascadingParameter]
    private Task<AuthenticationState>? AuthenticationState { get; set; }

    private IReadOnlyList<StationRow> Rows { get; set; } = [];

    private string Station { get; set; } = "";

    private IReadOnlyList<string> StationNames { get; set; } = [];

    private string? Problem { get; set; }

    private string? Done { get; set; }

    protected override async Task OnInitializedAsync()
    {
        Rows = await Directory.ListAsync().ConfigureAwait(true);
        StationNames = [.. Rows.Select(r => r.Name)];
        Station = Rows.Count > 0 ? Rows[0].Name : "";
    }

    private string AgeText(ThruInfo thru) =>
        string.Create(CultureInfo.InvariantCulture, $"{(Clock.GetUtcNow() - thru.MeasuredAt).TotalHours:0.0} h");

    private async Task ThruChosenAsync(InputFileChangeEventArgs e)
    {
        if (AuthenticationState is null)
        {
            return;
        }
        (_busy, Problem, Done) = (true, null, null);
        try
        {
            Actor actor = ActorClaims.FromClaims((await AuthenticationState.ConfigureAwait(true)).User);
            using var buffer = new MemoryStream();
            await using (Stream stream = e.File.OpenReadStream(Components.SweepUpload.MaxFileBytes))
            {
                await stream.CopyToAsync(buffer).ConfigureAwait(true);
            }
            ThruInfo thru = await Directory.RecordThruAsync(Station, new SweepFile(e.File.Name, buffer.ToArray()), actor).ConfigureAwait(true);
            Done = string.Create(CultureInfo.InvariantCulture, $"Thru recorded for {thru.Station}: flatness {thru.FlatnessDb:0.00} dB.");
            Rows = await Directory.ListAsync().ConfigureAwait(true);
        }
        catch (SweepReadException ex)
        {
            Problem = ex.Message;
        }
        catch (Exception ex) when (ex is RecordNotFoundException or IOException or ArgumentException)
        {
            Problem = ex.Message;
        }
        finally
        {
            _busy = false;
        }
    }
}
