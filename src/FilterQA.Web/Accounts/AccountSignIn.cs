using FilterQA.Data;
using Microsoft.AspNetCore.Identity;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Web.Accounts;

/// <summary>
/// Sign-in by user name and password, or by badge and PIN (the quick switch on a shared bench PC). Both
/// count failures towards Identity's lockout, so a short PIN cannot be guessed by trying them all.
/// </summary>
public sealed class AccountSignIn(UserManager<FilterQaUser> users, SignInManager<FilterQaUser> signIn, IPasswordHasher<FilterQaUser> hasher)
{
    private const string Wrong = "The user name or password is wrong.";
    private const string WrongBadge = "The badge number or PIN is wrong.";

    /// <summary>Checks the password and signs in with the cookie.</summary>
    public async Task<SignInOutcome> WithPasswordAsync(string? userName, string? password)
    {
        if (string.IsNullOrWhiteSpace(userName) || string.IsNullOrEmpty(password))
        {
            return SignInOutcome.Failed("Give your user name and password.");
        }
        FilterQaUser? user = await users.FindByNameAsync(userName.Trim()).ConfigureAwait(false);
        if (user is null)
        {
            return SignInOutcome.Failed(Wrong);
        }
        SignInResult result = await signIn.CheckPasswordSignInAsync(user, password, lockoutOnFailure: true).ConfigureAwait(false);
        return await FinishAsync(user, result, Wrong).ConfigureAwait(false);
    }

    /// <summary>Checks the badge's PIN (hashed like a password) and signs in with the cookie.</summary>
    public async Task<SignInOutcome> WithBadgeAsync(string? badge, string? pin)
    {
        if (string.IsNullOrWhiteSpace(badge) || string.IsNullOrEmpty(pin))
        {
            return SignInOutcome.Failed("Give your badge number and PIN.");
        }
        string number = badge.Trim();
        FilterQaUser? user = await users.Users.SingleOrDefaultAsync(u => u.BadgeNumber == number).ConfigureAwait(false);
        if (user?.PinHash is not { } pinHash)
        {
            return SignInOutcome.Failed(WrongBadge);
        }
        if (await users.IsLockedOutAsync(user).ConfigureAwait(false))
        {
            return LockedOut(user);
        }
        if (hasher.VerifyHashedPassword(user, pinHash, pin) == PasswordVerificationResult.Failed)
        {
            await users.AccessFailedAsync(user).ConfigureAwait(false);
            return await users.IsLockedOutAsync(user).ConfigureAwait(false) ? LockedOut(user) : SignInOutcome.Failed(WrongBadge);
        }
        await users.ResetAccessFailedCountAsync(user).ConfigureAwait(false);
        return await FinishAsync(user, SignInResult.Success, WrongBadge).ConfigureAwait(false);
    }

    /// <summary>Ends the cookie session.</summary>
    public Task SignOutAsync() => signIn.SignOutAsync();

    private async Task<SignInOutcome> FinishAsync(FilterQaUser user, SignInResult result, string wrong)
    {
        if (result.IsLockedOut)
        {
            return LockedOut(user);
        }
        if (!result.Succeeded)
        {
            return SignInOutcome.Failed(wrong);
        }
        await signIn.SignInAsync(user, isPersistent: false).ConfigureAwait(false);
        return user.MustChangePassword ? SignInOutcome.Success with { MustChangePassword = true } : SignInOutcome.Success;
    }

    /// <summary>
    /// Replaces the signed-in person's password (the current one proves it is them) and clears the
    /// must-change flag of a one-time password; the reason is plain words for the form.
    /// </summary>
    public async Task<SignInOutcome> ChangePasswordAsync(System.Security.Claims.ClaimsPrincipal principal, string? current, string? replacement, string? confirmation)
    {
        FilterQaUser? user = await users.GetUserAsync(principal).ConfigureAwait(false);
        if (user is null)
        {
            return SignInOutcome.Failed("Sign in first.");
        }
        if (string.IsNullOrEmpty(current) || string.IsNullOrEmpty(replacement))
        {
            return SignInOutcome.Failed("Give the current password and a new one.");
        }
        if (!string.Equals(replacement, confirmation, StringComparison.Ordinal))
        {
            return SignInOutcome.Failed("The new password and its repetition differ.");
        }
        if (string.Equals(replacement, current, StringComparison.Ordinal))
        {
            return SignInOutcome.Failed("The new password must differ from the current one.");
        }
        IdentityResult changed = await users.ChangePasswordAsync(user, current, replacement).ConfigureAwait(false);
        if (!changed.Succeeded)
        {
            return SignInOutcome.Failed(string.Join(" ", changed.Errors.Select(e => e.Description)));
        }
        user.MustChangePassword = false;
        await users.UpdateAsync(user).ConfigureAwait(false);
        await signIn.RefreshSignInAsync(user).ConfigureAwait(false);
        return SignInOutcome.Success;
    }

    private static SignInOutcome LockedOut(FilterQaUser user)
    {
        string until = user.LockoutEnd is { } end ? end.UtcDateTime.ToString("HH:mm", System.Globalization.CultureInfo.InvariantCulture) + " UTC" : "later";
        return SignInOutcome.Failed($"Too many wrong tries: the account is locked until {until}.");
    }
}
