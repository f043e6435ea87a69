using FilterQA.Data;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using Microsoft.AspNetCore.Identity;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Logging;

namespace FilterQA.Web.Ui.Services;

/// <summary>
/// Accounts for the administrator's page: list, create with a one-time password (and a PIN with a badge),
/// reset a PIN. Secrets are returned once to be shown and are stored only hashed. Every change is logged
/// with the acting person's name (the audit trail of the store covers quality records, not accounts).
/// </summary>
public sealed partial class AccountDirectory(UserManager<FilterQaUser> users, IPasswordHasher<FilterQaUser> hasher, ILogger<AccountDirectory> log)
{
    private const int MaxNameLength = 100;

    /// <summary>Every account by user name, with its roles.</summary>
    public async Task<IReadOnlyList<AccountRow>> ListAsync(CancellationToken cancellationToken = default)
    {
        List<FilterQaUser> all = await users.Users.AsNoTracking().OrderBy(u => u.UserName).ToListAsync(cancellationToken).ConfigureAwait(false);
        var rows = new List<AccountRow>(all.Count);
        foreach (FilterQaUser user in all)
        {
            rows.Add(await RowAsync(user).ConfigureAwait(false));
        }
        return rows;
    }

    /// <summary>Makes an account that must change its password; the password (and PIN, with a badge) is in the answer only.</summary>
    /// <exception cref="AccountChangeException">A field is missing or wrong, the user name or badge is taken, or Identity refused the account.</exception>
    public async Task<CreatedAccount> CreateAsync(NewAccount account, Actor actor)
    {
        ArgumentNullException.ThrowIfNull(account);
        ArgumentNullException.ThrowIfNull(actor);
        string userName = Required(account.UserName, "user name");
        string displayName = Required(account.DisplayName, "display name");
        if (!RoleNames.All.Contains(account.Role, StringComparer.Ordinal))
        {
            throw new AccountChangeException($"role: '{account.Role}' is not one of {string.Join(", ", RoleNames.All)}");
        }
        string badge = account.BadgeNumber?.Trim() ?? "";
        if (badge.Length > 0 && !badge.All(char.IsAsciiLetterOrDigit))
        {
            throw new AccountChangeException($"badge: '{badge}' must be letters and digits only");
        }
        if (await users.FindByNameAsync(userName).ConfigureAwait(false) is not null)
        {
            throw new AccountChangeException($"user name: '{userName}' is already taken");
        }
        // Badge sign-in looks a badge up as one account, so a badge may belong to one account only.
        if (badge.Length > 0 && await users.Users.AnyAsync(u => u.BadgeNumber == badge).ConfigureAwait(false))
        {
            throw new AccountChangeException($"badge: '{badge}' already belongs to another account");
        }
        string password = OneTimeSecret.Password();
        string? pin = badge.Length > 0 ? OneTimeSecret.Pin() : null;
        var user = new FilterQaUser { UserName = userName, DisplayName = displayName, BadgeNumber = badge, MustChangePassword = true };
        if (pin is not null)
        {
            user.PinHash = hasher.HashPassword(user, pin);
        }
        Check(await users.CreateAsync(user, password).ConfigureAwait(false), $"account {userName}");
        Check(await users.AddToRoleAsync(user, account.Role).ConfigureAwait(false), $"role {account.Role} of {userName}");
        LogCreated(userName, account.Role, badge.Length > 0, actor.Name);
        return new CreatedAccount(await RowAsync(user).ConfigureAwait(false), password, pin);
    }

    /// <summary>Gives the account a new random PIN (returned once) and ends any lockout count from wrong PINs.</summary>
    /// <exception cref="AccountChangeException">No account has that id, or it has no badge to sign in with.</exception>
    public async Task<string> ResetPinAsync(string accountId, Actor actor)
    {
        ArgumentNullException.ThrowIfNull(actor);
        FilterQaUser user = await users.FindByIdAsync(accountId).ConfigureAwait(false)
            ?? throw new AccountChangeException($"account: no account has the id '{accountId}'");
        if (string.IsNullOrEmpty(user.BadgeNumber))
        {
            throw new AccountChangeException($"PIN: {user.UserName} has no badge, so a PIN would never be asked for");
        }
        string pin = OneTimeSecret.Pin();
        user.PinHash = hasher.HashPassword(user, pin);
        Check(await users.UpdateAsync(user).ConfigureAwait(false), $"the PIN of {user.UserName}");
        Check(await users.ResetAccessFailedCountAsync(user).ConfigureAwait(false), $"the failed-try count of {user.UserName}");
        LogPinReset(user.UserName ?? accountId, actor.Name);
        return pin;
    }

    private async Task<AccountRow> RowAsync(FilterQaUser user) =>
        new(user.Id, user.UserName ?? "", user.DisplayName, [.. await users.GetRolesAsync(user).ConfigureAwait(false)], user.BadgeNumber,
            user.PinHash is not null, user.MustChangePassword);

    private static string Required(string? value, string field)
    {
        string text = value?.Trim() ?? "";
        if (text.Length == 0 || text.Length > MaxNameLength || text.Any(char.IsControl))
        {
            throw new AccountChangeException($"{field}: give 1 to {MaxNameLength} printable characters");
        }
        return text;
    }

    private static void Check(IdentityResult result, string what)
    {
        if (!result.Succeeded)
        {
            throw new AccountChangeException($"{what}: {string.Join("; ", result.Errors.Select(e => e.Description))}");
        }
    }

    [LoggerMessage(Level = LogLevel.Warning, Message = "Account {UserName} created with role {Role} (badge PIN: {HasPin}) by {Actor}; its one-time password was shown once, not logged")]
    private partial void LogCreated(string userName, string role, bool hasPin, string actor);

    [LoggerMessage(Level = LogLevel.Warning, Message = "PIN of account {UserName} reset by {Actor}; the new PIN was shown once, not logged")]
    private partial void LogPinReset(string userName, string actor);
}
