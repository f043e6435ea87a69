using Microsoft.AspNetCore.Identity;

namespace FilterQA.Data;

/// <summary>A person who signs in: an inspector, an approver, a quality engineer.</summary>
public sealed class FilterQaUser : IdentityUser
{
    /// <summary>Name as printed on records and certificates.</summary>
    public string DisplayName { get; set; } = "";

    /// <summary>Site badge or employee number, printed beside the name; empty when the site has none.</summary>
    public string BadgeNumber { get; set; } = "";

    /// <summary>
    /// The badge PIN hashed with Identity's password hasher (never the PIN itself); null when the
    /// person has no PIN and signs in with user name and password only.
    /// </summary>
    public string? PinHash { get; set; }

    /// <summary>True for a one-time password given at first start: the person should choose a new one.</summary>
    public bool MustChangePassword { get; set; }
}
