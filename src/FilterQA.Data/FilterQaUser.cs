using Microsoft.AspNetCore.Identity;

namespace FilterQA.Data;

/// <summary>A person who signs in: an inspector, an approver, a quality engineer.</summary>
public sealed class FilterQaUser : IdentityUser
{
    /// <summary>Name as printed on records and certificates.</summary>
    public string DisplayName { get; set; } = "";

    /// <summary>Site badge or employee number, printed beside the name; empty when the site has none.</summary>
    public string BadgeNumber { get; set; } = "";
}
