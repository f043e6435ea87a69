namespace FilterQA.Web.Ui.Services;

/// <summary>An account as the accounts page lists it (never a password or PIN hash).</summary>
public sealed record AccountRow(string Id, string UserName, string DisplayName, IReadOnlyList<string> Roles, string BadgeNumber,
    bool HasPin, bool MustChangePassword);
