using System.Globalization;
using FilterQA.Data.Entities;
using FilterQA.Data.Services;
using FilterQA.Web.Ui.Services;
using Microsoft.AspNetCore.Components;

namespace FilterQA.Web.Ui.Pages;

/// <summary>The audit log, newest first, filtered and paged in the database; read-only.</summary>
public partial class Audit
{
    /// <summary>Entries per page.</summary>
    public const int PageSize = 50;

    [Inject]
    private AuditLog Log { get; set; } = null!;

    private DateOnly? From { get; set; }

    private DateOnly? To { get; set; }

    private string? Actor { get; set; }

    private string? Action { get; set; }

    private string? Subject { get; set; }

    private AuditQuery? Shown { get; set; }

    private AuditPage? Found { get; set; }

    private string? Problem { get; set; }

    private bool Live { get; set; }

    protected override Task OnInitializedAsync() => SearchAsync();

    protected override void OnAfterRender(bool firstRender)
    {
        if (firstRender)
        {
            Live = true;
            StateHasChanged();
        }
    }

    /// <summary>The query of the filters as typed: UTC days, the end day inclusive; blank texts mean any.</summary>
    internal static AuditQuery Query(DateOnly? from, DateOnly? to, string? actor, string? action, string? subject) => new()
    {
        From = from is { } f ? new DateTimeOffset(f.ToDateTime(TimeOnly.MinValue), TimeSpan.Zero) : null,
        To = to is { } t ? new DateTimeOffset(t.AddDays(1).ToDateTime(TimeOnly.MinValue), TimeSpan.Zero) : null,
        Actor = string.IsNullOrWhiteSpace(actor) ? null : actor.Trim(),
        Action = Enum.TryParse(action, out AuditAction a) && Enum.IsDefined(a) ? a : null,
        Subject = string.IsNullOrWhiteSpace(subject) ? null : subject.Trim(),
        Take = PageSize,
    };

    private Task SearchAsync()
    {
        if (From is { } f && To is { } t && t < f)
        {
            Problem = "The end day is before the start day.";
            return Task.CompletedTask;
        }
        return ShowAsync(Query(From, To, Actor, Action, Subject));
    }

    private Task NewerAsync() => Shown is { } q ? ShowAsync(q with { Skip = Math.Max(0, q.Skip - PageSize) }) : Task.CompletedTask;

    private Task OlderAsync() => Shown is { } q ? ShowAsync(q with { Skip = q.Skip + PageSize }) : Task.CompletedTask;

    private async Task ShowAsync(AuditQuery query)
    {
        Problem = null;
        try
        {
            Found = await Log.FindAsync(query).ConfigureAwait(true);
            Shown = query;
        }
        catch (ArgumentException e)
        {
            Problem = Words.Sentence(e.Message);
        }
    }

    private static string Caption(AuditPage page) => page.Entries.Count == 0
        ? "No entry matches."
        : string.Create(CultureInfo.InvariantCulture, $"Entries {page.Skip + 1} to {page.Skip + page.Entries.Count}, newest first{(page.HasMore ? "; older entries follow" : "")}.");
}
