namespace FilterQA.Core.Templates.Differences;

/// <summary>How one rule of a template differs between two revisions (rules are matched by their id).</summary>
public enum RuleChange
{
    /// <summary>The rule is in both revisions with every field the same.</summary>
    Unchanged,

    /// <summary>The rule is in both revisions and at least one field differs.</summary>
    Changed,

    /// <summary>The rule is only in the later revision.</summary>
    Added,

    /// <summary>The rule is only in the earlier revision.</summary>
    Removed,
}
