using System.Text;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Text;
using FilterQA.Data;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Web.Ui.Services;
using Microsoft.AspNetCore.Components;
using Microsoft.AspNetCore.Components.Authorization;
using Microsoft.AspNetCore.Components.Forms;

namespace FilterQA.Web.Ui.Pages;

/// <summary>One part's template revisions with who did what and when; start a draft from a revision, import a file as a draft.</summary>
public partial class TemplatePart
{
    /// <summary>Template files above this size are refused (a template is a few kilobytes).</summary>
    public const long MaxImportBytes = 1024 * 1024;

    [Parameter]
    public string PartNumber { get; set; } = "";

    [Inject]
    private TemplateCatalog Catalog { get; set; } = null!;

    [Inject]
    private NavigationManager Navigation { get; set; } = null!;

    [CascadingParameter]
    private Task<AuthenticationState> Authentication { get; set; } = null!;

    private IReadOnlyList<TemplateRevisionHistory>? Revisions { get; set; }

    private string? Problem { get; set; }

    private IReadOnlyList<TemplateProblem> ImportProblems { get; set; } = [];

    protected override async Task OnParametersSetAsync()
    {
        try
        {
            Revisions = await Catalog.RevisionHistoryAsync(PartNumber).ConfigureAwait(true);
            Problem = null;
        }
        catch (RecordNotFoundException e)
        {
            Revisions = null;
            Problem = Words.Sentence(e.Message);
        }
    }

    private int? Previous(int revision) => Revisions?.Where(r => r.Revision < revision).Select(r => (int?)r.Revision).Max();

    private static string StatusWords(TemplateStatus status) => status switch
    {
        TemplateStatus.Draft => "draft",
        TemplateStatus.Released => "released",
        _ => "withdrawn",
    };

    private async Task<Actor?> ActorAsync()
    {
        AuthenticationState state = await Authentication.ConfigureAwait(true);
        return ActorClaims.TryFromClaims(state.User);
    }

    private async Task StartDraftAsync(int fromRevision)
    {
        if (await ActorAsync().ConfigureAwait(true) is not { } actor)
        {
            Problem = "You are no longer signed in.";
            return;
        }
        try
        {
            StoredTemplateText draft = await Catalog.StartDraftAsync(PartNumber, fromRevision, actor).ConfigureAwait(true);
            Navigation.NavigateTo(TemplateLinks.Edit(PartNumber, draft.Revision));
        }
        catch (Exception e) when (e is StorageRuleException or RecordNotFoundException or InvalidDataException or Microsoft.EntityFrameworkCore.DbUpdateException)
        {
            Problem = "No draft was started: " + Words.Sentence(e.Message);
        }
    }

    private async Task ImportAsync(InputFileChangeEventArgs e)
    {
        ImportProblems = [];
        if (await ActorAsync().ConfigureAwait(true) is not { } actor)
        {
            Problem = "You are no longer signed in.";
            return;
        }
        IBrowserFile file = e.File;
        if (file.Size > MaxImportBytes)
        {
            ImportProblems = [new TemplateProblem(0, 0, $"{file.Name} is larger than 1 MiB; a template file is a few kilobytes")];
            return;
        }
        string text;
        await using (Stream stream = file.OpenReadStream(MaxImportBytes))
        using (var reader = new StreamReader(stream, new UTF8Encoding(false, true)))
        {
            try
            {
                text = await reader.ReadToEndAsync().ConfigureAwait(true);
            }
            catch (DecoderFallbackException)
            {
                ImportProblems = [new TemplateProblem(0, 0, $"{file.Name} is not UTF-8 text")];
                return;
            }
        }
        try
        {
            StoredTemplateText stored = await Catalog.ImportDraftAsync(PartNumber, text, actor).ConfigureAwait(true);
            Navigation.NavigateTo(TemplateLinks.Edit(PartNumber, stored.Revision));
        }
        catch (TemplateTextException refused)
        {
            ImportProblems = refused.Problems;
        }
    }
}
