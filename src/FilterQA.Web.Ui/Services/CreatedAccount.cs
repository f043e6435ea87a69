namespace FilterQA.Web.Ui.Services;

/// <summary>A new account with its one-time password and PIN (null without a badge), to be shown once and never stored in clear.</summary>
public sealed record CreatedAccount(AccountRow Account, string OneTimePassword, string? Pin);
