using FilterQA.Core.Formats;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Text;
using FilterQA.Data;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Web.Ui.Components;
using FilterQA.Web.Ui.Services;
using Microsoft.AspNetCore.Components;
using Microsoft.AspNetCore.Components.Authorization;
using Microsoft.AspNetCore.Components.Forms;
using Microsoft.AspNetCore.Components.Routing;
using Microsoft.JSInterop;

namespace FilterQA.Web.Ui.Pages;

/// <summary>
/// The draft editor: the rules as a form and as text kept in step, saved against the version loaded (a save after
/// someone else's is refused), and a live preview of units judged against the draft as it changes.
/// </summary>
public partial class DraftEditor : IDisposable
{
    /// <summary>How long the preview waits after the last change before judging again.</summary>
    public static readonly TimeSpan PreviewDelay = TimeSpan.FromMilliseconds(300);

    private IDisposable? _leaving;
    private CancellationTokenSource? _pending;
    private string? _judgedHash;

    [Parameter]
    public string PartNumber { get; set; } = "";

    [Parameter]
    public int Revision { get; set; }

    [Inject]
    private TemplateCatalog Catalog { get; set; } = null!;

    [Inject]
    private DraftPreview Preview { get; set; } = null!;

    [Inject]
    private NavigationManager Navigation { get; set; } = null!;

    [Inject]
    private IJSRuntime Js { get; set; } = null!;

    [CascadingParameter]
    private Task<AuthenticationState> Authentication { get; set; } = null!;

    internal TemplateDraftEditor? Editor { get; private set; }

    private int LoadedVersion { get; set; }

    private DateTimeOffset SavedAt { get; set; }

    private string SavedBy { get; set; } = "";

    private string? Problem { get; set; }

    private string? Conflict { get; set; }

    private string? SaveNote { get; set; }

    private bool Saving { get; set; }

    private RuleKind NewRuleKind { get; set; }

    private IReadOnlyList<PreviewCandidate> Candidates { get; set; } = [];

    private long PickedMeasurementId { get; set; }

    private IReadOnlyList<PreviewOutcome> Outcomes { get; set; } = [];

    private string? PreviewProblem { get; set; }

    protected override async Task OnParametersSetAsync()
    {
        try
        {
            StoredTemplateText stored = await Catalog.LoadTextAsync(PartNumber, Revision).ConfigureAwait(true);
            if (stored.Status != TemplateStatus.Draft)
            {
                Problem = $"{PartNumber} revision {Revision} is {stored.Status.ToString().ToLowerInvariant()} and cannot be edited; start a new draft from it on the part's page.";
                Editor = null;
                return;
            }
            Editor = new TemplateDraftEditor(PartNumber, Revision, stored.Text);
            NewRuleKind = TemplateFieldSpecs.KindsFor(Editor.Device)[0];
            Remember(stored);
            Candidates = await Preview.CandidatesAsync(PartNumber).ConfigureAwait(true);
            Problem = null;
        }
        catch (Exception e) when (e is RecordNotFoundException or ArgumentException)
        {
            Problem = Words.Sentence(e.Message);
            Editor = null;
        }
    }

    /// <summary>True once the circuit answers (after the first interactive render); the editor bar says so for browser tests.</summary>
    private bool Live { get; set; }

    protected override void OnAfterRender(bool firstRender)
    {
        if (firstRender)
        {
            _leaving = Navigation.RegisterLocationChangingHandler(OnLeavingAsync);
            Live = true;
            StateHasChanged();
        }
    }

    private async ValueTask OnLeavingAsync(LocationChangingContext context)
    {
        if (Editor is { IsDirty: true }
            && !await Js.InvokeAsync<bool>("confirm", "The draft has changes that are not saved. Leave and lose them?").ConfigureAwait(true))
        {
            context.PreventNavigation();
        }
    }

    private void Remember(StoredTemplateText stored)
    {
        LoadedVersion = stored.DraftVersion;
        SavedAt = stored.SavedAt;
        SavedBy = stored.SavedBy;
    }

    private Task FormChangedAsync()
    {
        Editor?.FormChanged();
        SchedulePreview();
        return Task.CompletedTask;
    }

    private Task TextChangedAsync(ChangeEventArgs e)
    {
        Editor?.TextChanged(e.Value?.ToString() ?? "");
        SchedulePreview();
        return Task.CompletedTask;
    }

    private Task AddRuleAsync()
    {
        Editor?.AddRule(NewRuleKind);
        SchedulePreview();
        return Task.CompletedTask;
    }

    private Task RemoveRuleAsync(RuleForm rule)
    {
        Editor?.RemoveRule(rule);
        SchedulePreview();
        return Task.CompletedTask;
    }

    private Task AddPointAsync(RuleForm rule)
    {
        rule.Points.Add(new PointForm());
        return FormChangedAsync();
    }

    private Task RemovePointAsync(RuleForm rule, PointForm point)
    {
        rule.Points.Remove(point);
        return FormChangedAsync();
    }

    private async Task SaveAsync()
    {
        if (Editor is not { IsValid: true } editor)
        {
            return;
        }
        AuthenticationState state = await Authentication.ConfigureAwait(true);
        if (ActorClaims.TryFromClaims(state.User) is not { } actor)
        {
            Problem = "You are no longer signed in; the draft was not saved.";
            return;
        }
        Saving = true;
        Conflict = null;
        SaveNote = null;
        try
        {
            LimitTemplate template = editor.LastGood;
            StoredTemplateText stored = await Catalog.SaveDraftTextAsync(PartNumber, Revision, LimitTemplateWriter.Write(template), LoadedVersion, actor)
                .ConfigureAwait(true);
            Remember(stored);
            editor.Saved(template.ContentHash);
            SaveNote = $"Saved as version {stored.DraftVersion} at {Words.Time(stored.SavedAt)}.";
        }
        catch (DraftConflictException e)
        {
            Conflict = e.Message;
        }
        catch (Exception e) when (e is TemplateTextException or StorageRuleException or RecordNotFoundException)
        {
            Conflict = "The draft was not saved: " + Words.Sentence(e.Message);
        }
        finally
        {
            Saving = false;
        }
    }

    private async Task AddStoredAsync()
    {
        PreviewProblem = null;
        if (Editor is null || Candidates.FirstOrDefault(c => c.MeasurementId == PickedMeasurementId) is not { } candidate)
        {
            PreviewProblem = "Pick a stored measurement first.";
            return;
        }
        try
        {
            await Preview.AddStoredAsync(candidate, Editor.LastGood).ConfigureAwait(true);
        }
        catch (Exception e) when (e is InvalidOperationException or InvalidDataException or RecordNotFoundException)
        {
            PreviewProblem = Words.Sentence(e.Message);
            return;
        }
        await JudgeAsync(force: true).ConfigureAwait(true);
    }

    private async Task UploadAsync(InputFileChangeEventArgs e)
    {
        PreviewProblem = null;
        if (Editor is null)
        {
            return;
        }
        try
        {
            using var buffer = new MemoryStream();
            await using (Stream stream = e.File.OpenReadStream(SweepUpload.MaxFileBytes))
            {
                await stream.CopyToAsync(buffer).ConfigureAwait(true);
            }
            Preview.AddUploaded(e.File.Name, buffer.ToArray());
        }
        catch (Exception problem) when (problem is SweepReadException or InvalidOperationException or IOException)
        {
            PreviewProblem = Words.Sentence(problem.Message);
            return;
        }
        await JudgeAsync(force: true).ConfigureAwait(true);
    }

    private Task RemoveSampleAsync(PreviewSample sample)
    {
        Preview.Remove(sample);
        return JudgeAsync(force: true);
    }

    /// <summary>Judges again after <see cref="PreviewDelay"/> without a further change (typing does not judge on every key).</summary>
    private void SchedulePreview()
    {
        _pending?.Cancel();
        _pending?.Dispose();
        _pending = new CancellationTokenSource();
        CancellationToken token = _pending.Token;
        _ = Task.Delay(PreviewDelay, token).ContinueWith(async t =>
        {
            if (!t.IsCanceled)
            {
                await InvokeAsync(async () =>
                {
                    await JudgeAsync(force: false).ConfigureAwait(true);
                    StateHasChanged();
                }).ConfigureAwait(false);
            }
        }, TaskScheduler.Default);
    }

    private async Task JudgeAsync(bool force)
    {
        if (Editor is not { } editor || (!force && editor.LastGood.ContentHash == _judgedHash))
        {
            return;
        }
        try
        {
            _judgedHash = editor.LastGood.ContentHash;
            Outcomes = await Preview.JudgeAsync(editor.LastGood).ConfigureAwait(true);
        }
        catch (Exception e) when (e is InvalidDataException or RecordNotFoundException)
        {
            PreviewProblem = Words.Sentence(e.Message);
        }
    }

    public void Dispose()
    {
        _leaving?.Dispose();
        _pending?.Cancel();
        _pending?.Dispose();
        GC.SuppressFinalize(this);
    }
}
