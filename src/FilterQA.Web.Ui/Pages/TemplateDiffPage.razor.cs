using System.Globalization;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Differences;
using FilterQA.Data;
using FilterQA.Data.Services;
using FilterQA.Web.Ui.Services;
using Microsoft.AspNetCore.Components;

namespace FilterQA.Web.Ui.Pages;

/// <summary>
/// The rule-by-rule difference of two stored revisions of a part (<see cref="TemplateDifference"/>): two revision
/// pickers, the header fields that differ, and every rule with its change in words and each changed field's old and new
/// value with its unit. Without from/to it compares the latest revision with the one before it.
/// </summary>
public partial class TemplateDiffPage
{
    [Inject]
    private TemplateCatalog Catalog { get; set; } = null!;

    [Inject]
    private RevisionDirectory RevisionList { get; set; } = null!;

    [Inject]
    private NavigationManager Navigation { get; set; } = null!;

    /// <summary>The part number from the address.</summary>
    [Parameter]
    public string PartNumber { get; set; } = "";

    /// <summary>The earlier revision (query "from").</summary>
    [SupplyParameterFromQuery(Name = "from")]
    public int? From { get; set; }

    /// <summary>The later revision (query "to").</summary>
    [SupplyParameterFromQuery(Name = "to")]
    public int? To { get; set; }

    private IReadOnlyList<RevisionChoice> Revisions { get; set; } = [];

    private int FromShown { get; set; }

    private int ToShown { get; set; }

    private TemplateDifference? Difference { get; set; }

    private string? Problem { get; set; }

    private bool Live { get; set; }

    protected override async Task OnParametersSetAsync()
    {
        Problem = null;
        Difference = null;
        try
        {
            Revisions = (await RevisionList.RevisionsAsync(PartNumber).ConfigureAwait(true)).OrderBy(r => r.Revision).ToArray();
            if (Revisions.Count == 0)
            {
                Problem = $"{PartNumber} has no stored template revisions.";
                return;
            }
            ToShown = To ?? Revisions[^1].Revision;
            FromShown = From ?? Revisions.LastOrDefault(r => r.Revision < ToShown)?.Revision ?? ToShown;
            foreach (int revision in new[] { FromShown, ToShown })
            {
                if (!Revisions.Any(r => r.Revision == revision))
                {
                    Problem = string.Create(CultureInfo.InvariantCulture,
                        $"{PartNumber} has no revision {revision}; it has {string.Join(", ", Revisions.Select(r => r.Revision))}.");
                    return;
                }
            }
            LimitTemplate from = await Catalog.LoadAsync(PartNumber, FromShown).ConfigureAwait(true);
            LimitTemplate to = await Catalog.LoadAsync(PartNumber, ToShown).ConfigureAwait(true);
            Difference = TemplateDifference.Between(from, to);
        }
        catch (Exception e) when (e is RecordNotFoundException or InvalidDataException or ArgumentException)
        {
            Problem = e.Message;
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

    private void FromChosen(ChangeEventArgs e) => Go(Parse(e, FromShown), ToShown);

    private void ToChosen(ChangeEventArgs e) => Go(FromShown, Parse(e, ToShown));

    private void Go(int from, int to) => Navigation.NavigateTo(string.Create(CultureInfo.InvariantCulture,
        $"templates/{Uri.EscapeDataString(PartNumber)}/diff?from={from}&to={to}"));

    private static int Parse(ChangeEventArgs e, int fallback) =>
        int.TryParse(e.Value?.ToString(), NumberStyles.Integer, CultureInfo.InvariantCulture, out int value) ? value : fallback;

    private static string ChangeWord(RuleChange change) => change switch
    {
        RuleChange.Changed => "CHANGED",
        RuleChange.Added => "ADDED",
        RuleChange.Removed => "REMOVED",
        _ => "unchanged",
    };

    private static string FieldWord(FieldChange f) => (f.OldValue, f.NewValue) switch
    {
        (null, _) => "added",
        (_, null) => "removed",
        _ => "changed",
    };
}
