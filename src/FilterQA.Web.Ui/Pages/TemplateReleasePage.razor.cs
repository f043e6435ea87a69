using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Text;
using FilterQA.Data;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using Microsoft.AspNetCore.Components;
using Microsoft.AspNetCore.Components.Authorization;

namespace FilterQA.Web.Ui.Pages;

/// <summary>
/// Releases a draft: shows its text, judges it against the part's reference units (serial, lot, outcome, failing
/// rules), asks for the reason and releases through <see cref="TemplateCatalog.ReleaseAsync(string, int, string, string?, Actor, CancellationToken)"/>, which makes the same
/// check again in the release's transaction. Quality engineers only.
/// </summary>
public partial class TemplateReleasePage
{
    private bool _busy;

    [Inject]
    private TemplateCatalog Catalog { get; set; } = null!;

    [Inject]
    private ReferenceUnitService ReferenceUnits { get; set; } = null!;

    [CascadingParameter]
    private Task<AuthenticationState>? AuthenticationState { get; set; }

    /// <summary>The part number from the address.</summary>
    [Parameter]
    public string PartNumber { get; set; } = "";

    /// <summary>The revision from the address.</summary>
    [Parameter]
    public int Revision { get; set; }

    private LimitTemplate? Template { get; set; }

    private string Text { get; set; } = "";

    private ReferenceCheck? Check { get; set; }

    private TemplateRevisionInfo? Released { get; set; }

    private string? Reason { get; set; }

    private string? LoadProblem { get; set; }

    private string? CheckProblem { get; set; }

    private string? ReleaseProblem { get; set; }

    private bool Live { get; set; }

    private bool MayRelease => Live && !_busy && Check is { Passed: true } && !string.IsNullOrWhiteSpace(Reason);

    private string ReferenceUnitsHref => $"templates/{Uri.EscapeDataString(PartNumber)}/reference-units";

    protected override async Task OnParametersSetAsync()
    {
        LoadProblem = null;
        Released = null;
        try
        {
            Template = await Catalog.LoadAsync(PartNumber, Revision).ConfigureAwait(true);
            Text = LimitTemplateWriter.Write(Template);
        }
        catch (Exception e) when (e is RecordNotFoundException or InvalidDataException)
        {
            LoadProblem = e.Message;
            return;
        }
        await CheckAsync().ConfigureAwait(true);
    }

    protected override void OnAfterRender(bool firstRender)
    {
        if (firstRender)
        {
            Live = true;
            StateHasChanged();
        }
    }

    private async Task CheckAsync()
    {
        if (Template is null)
        {
            return;
        }
        _busy = true;
        CheckProblem = null;
        try
        {
            Check = await ReferenceUnits.CheckAsync(Template).ConfigureAwait(true);
        }
        catch (Exception e) when (e is RecordNotFoundException or InvalidDataException or ArgumentException)
        {
            Check = null;
            CheckProblem = e.Message;
        }
        finally
        {
            _busy = false;
        }
    }

    private async Task ReleaseAsync()
    {
        if (AuthenticationState is null || Template is null)
        {
            return;
        }
        _busy = true;
        ReleaseProblem = null;
        try
        {
            Actor actor = ActorClaims.FromClaims((await AuthenticationState.ConfigureAwait(true)).User);
            // The hash of the text whose check is on screen: a draft saved by someone in between is refused, not released unseen.
            Released = await Catalog.ReleaseAsync(PartNumber, Revision, Reason ?? "", Template.ContentHash, actor).ConfigureAwait(true);
            Template = await Catalog.LoadAsync(PartNumber, Revision).ConfigureAwait(true);
            Text = LimitTemplateWriter.Write(Template);
        }
        catch (ReleaseRefusedException e)
        {
            ReleaseProblem = e.Message;
            if (e.Check is { } check)
            {
                Check = check;
            }
        }
        catch (Exception e) when (e is StorageRuleException or RecordNotFoundException or InvalidDataException or InvalidOperationException)
        {
            ReleaseProblem = e.Message;
        }
        finally
        {
            _busy = false;
        }
    }
}
