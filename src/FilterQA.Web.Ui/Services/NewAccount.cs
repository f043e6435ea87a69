namespace FilterQA.Web.Ui.Services;

/// <summary>
/// What an administrator gives for a new account. A badge is optional; with a badge the account gets a
/// random PIN for the quick switch on a shared bench PC.
/// </summary>
public sealed record NewAccount(string UserName, string DisplayName, string Role, string? BadgeNumber);
