using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Web.Ui.Services;
using Microsoft.AspNetCore.Components;
using Microsoft.AspNetCore.Components.Authorization;

namespace FilterQA.Web.Ui.Pages;

/// <summary>The administrator's accounts: the list, a new account with a one-time password, a new PIN.</summary>
public partial class Accounts
{
    private bool _busy;

    [Inject]
    private AccountDirectory Directory { get; set; } = null!;

    [CascadingParameter]
    private Task<AuthenticationState>? AuthenticationState { get; set; }

    private IReadOnlyList<AccountRow> Rows { get; set; } = [];

    private string UserName { get; set; } = "";

    private string DisplayName { get; set; } = "";

    private string Role { get; set; } = RoleNames.Operator;

    private string Badge { get; set; } = "";

    private string? Problem { get; set; }

    /// <summary>The secrets of the last change, kept only in this circuit's memory until hidden or the page is left.</summary>
    private ShownSecret? Secret { get; set; }

    protected override async Task OnInitializedAsync() => Rows = await Directory.ListAsync().ConfigureAwait(true);

    private async Task CreateAsync()
    {
        if (await ActorAsync().ConfigureAwait(true) is not { } actor)
        {
            return;
        }
        (_busy, Problem, Secret) = (true, null, null);
        try
        {
            CreatedAccount made = await Directory.CreateAsync(new NewAccount(UserName, DisplayName, Role, Badge), actor).ConfigureAwait(true);
            Secret = new ShownSecret(made.Account.UserName, made.OneTimePassword, made.Pin);
            (UserName, DisplayName, Badge) = ("", "", "");
            Rows = await Directory.ListAsync().ConfigureAwait(true);
        }
        catch (AccountChangeException e)
        {
            Problem = e.Message;
        }
        finally
        {
            _busy = false;
        }
    }

    private async Task ResetPinAsync(AccountRow account)
    {
        if (await ActorAsync().ConfigureAwait(true) is not { } actor)
        {
            return;
        }
        (_busy, Problem, Secret) = (true, null, null);
        try
        {
            Secret = new ShownSecret(account.UserName, null, await Directory.ResetPinAsync(account.Id, actor).ConfigureAwait(true));
        }
        catch (AccountChangeException e)
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

    private sealed record ShownSecret(string For, string? Password, string? Pin);
}
