namespace FilterQA.Data.Accounts;

/// <summary>The roles of FilterQA, as stored by ASP.NET Core Identity and checked by pages and endpoints.</summary>
public static class RoleNames
{
    /// <summary>Tests units at the bench.</summary>
    public const string Operator = "operator";

    /// <summary>Edits and releases limit templates.</summary>
    public const string QualityEngineer = "quality-engineer";

    /// <summary>Dispositions lots and signs certificates.</summary>
    public const string Approver = "approver";

    /// <summary>Manages accounts, stations and API keys.</summary>
    public const string Administrator = "administrator";

    /// <summary>Every role, in the order screens list them.</summary>
    public static IReadOnlyList<string> All { get; } = [Operator, QualityEngineer, Approver, Administrator];
}
