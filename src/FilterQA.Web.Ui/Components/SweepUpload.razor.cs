using System.Globalization;
using FilterQA.Data.Accounts;
using FilterQA.Web.Ui.Charts;
using FilterQA.Web.Ui.Services;
using Microsoft.AspNetCore.Components;
using Microsoft.AspNetCore.Components.Authorization;
using Microsoft.AspNetCore.Components.Forms;

namespace FilterQA.Web.Ui.Components;

/// <summary>
/// The bench's sweep upload: many files at once through <see cref="InputFile"/> (dropped on it or picked),
/// each offered to the intake through <see cref="BenchSession"/> as the signed-in user, with progress, the
/// latest verdict large, its sweep against the limit lines, and every file's outcome.
/// </summary>
public partial class SweepUpload
{
    /// <summary>Largest sweep file taken, bytes (a 4-port Touchstone file of 20 001 points is about 10 MB).</summary>
    public const long MaxFileBytes = 32L * 1024 * 1024;

    /// <summary>Most files taken in one drop.</summary>
    public const int MaxFiles = 500;

    /// <summary>The id of the file input, so a page can move focus to it.</summary>
    public const string InputId = "sweep-files";

    private const string StationsHref = "stations";

    private InputFile? _input;
    private bool _busy;
    private int _done;
    private int _total;
    private string? _readProblem;
    private ChartModel? _chart;

    [Inject]
    private BenchSession Session { get; set; } = null!;

    [CascadingParameter]
    private Task<AuthenticationState>? AuthenticationState { get; set; }

    /// <summary>The serial typed or scanned for a single file; none by default.</summary>
    [Parameter]
    public string? Serial { get; set; }

    /// <summary>The station measuring (required for a submission).</summary>
    [Parameter]
    public string Station { get; set; } = "";

    /// <summary>Why the unit is measured again, sent with a retest; none by default.</summary>
    [Parameter]
    public string? RetestReason { get; set; }

    /// <summary>Told after each drop (the lot summary in the session has changed).</summary>
    [Parameter]
    public EventCallback<IReadOnlyList<BenchOutcome>> OnSubmitted { get; set; }

    /// <summary>Told when the operator asks to measure a unit again, with its serial; no button without it.</summary>
    [Parameter]
    public EventCallback<string> OnMeasureAgain { get; set; }

    /// <summary>Moves keyboard focus to the file input (Enter or Space then opens the file picker).</summary>
    public async Task FocusAsync()
    {
        if (_input?.Element is { } element)
        {
            await element.FocusAsync().ConfigureAwait(true);
        }
    }

    private bool Ready => Session.Lot is not null && !string.IsNullOrWhiteSpace(Station);

    private BenchOutcome? Latest => Session.LastOutcomes.LastOrDefault(o => o.Result is not null);

    private async Task OnFilesChosenAsync(InputFileChangeEventArgs e)
    {
        _readProblem = null;
        if (e.FileCount > MaxFiles)
        {
            _readProblem = string.Create(CultureInfo.InvariantCulture, $"{e.FileCount} files dropped; give at most {MaxFiles} at a time.");
            return;
        }
        IReadOnlyList<Microsoft.AspNetCore.Components.Forms.IBrowserFile> chosen = e.GetMultipleFiles(MaxFiles);
        var files = new List<SweepFile>(chosen.Count);
        foreach (var file in chosen)
        {
            if (file.Size > MaxFileBytes)
            {
                _readProblem = string.Create(CultureInfo.InvariantCulture,
                    $"{file.Name} is {file.Size / 1048576.0:0.0} MB; a sweep file may be at most {MaxFileBytes / 1048576} MB. Nothing was offered.");
                return;
            }
            using var buffer = new MemoryStream();
            await using (Stream stream = file.OpenReadStream(MaxFileBytes))
            {
                await stream.CopyToAsync(buffer).ConfigureAwait(true);
            }
            files.Add(new SweepFile(file.Name, buffer.ToArray()));
        }
        await SubmitAsync(files).ConfigureAwait(true);
    }

    private async Task SubmitAsync(IReadOnlyList<SweepFile> files)
    {
        if (AuthenticationState is null)
        {
            _readProblem = "Nobody is signed in; sign in before testing.";
            return;
        }
        var actor = ActorClaims.FromClaims((await AuthenticationState.ConfigureAwait(true)).User);
        (_busy, _done, _total, _chart) = (true, 0, files.Count, null);
        StateHasChanged();
        try
        {
            var progress = new Progress<int>(done =>
            {
                _done = done;
                _ = InvokeAsync(StateHasChanged);
            });
            IReadOnlyList<BenchOutcome> outcomes = await Session.SubmitAsync(files, Serial, Station, actor, RetestReason, progress).ConfigureAwait(true);
            _done = outcomes.Count;
            if (Latest is { Trace: { } trace, Result: { } result })
            {
                _chart = SweepChartBuilder.Build(trace, result.Evaluation.MaskLines);
            }
            await OnSubmitted.InvokeAsync(outcomes).ConfigureAwait(true);
        }
        finally
        {
            _busy = false;
        }
    }

    private static string OutcomeKey(BenchOutcome outcome) => outcome.Kind switch
    {
        BenchOutcomeKind.Judged => "judged",
        BenchOutcomeKind.Refused => "refused",
        BenchOutcomeKind.Unreadable => "unreadable",
        BenchOutcomeKind.Skipped => "skipped",
        _ => "not-taken",
    };

    private static string ChartCaption(BenchOutcome outcome) => outcome.Trace is { } trace
        ? string.Create(CultureInfo.InvariantCulture,
            $"Unit {outcome.Serial}: measured loss at {trace.Grid.Count} points from {FrequencyScale.For(trace.Grid.StopHz).Format(trace.Grid.StartHz)} to {FrequencyScale.For(trace.Grid.StopHz).Format(trace.Grid.StopHz)}; dashed lines are the template's limits.")
        : "";
}
