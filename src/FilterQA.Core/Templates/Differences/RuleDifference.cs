namespace FilterQA.Core.Templates.Differences;

/// <summary>One rule of either revision and how it differs, with the fields that changed.</summary>
/// <param name="RuleId">The rule's id, which identifies it in both revisions.</param>
/// <param name="Change">Unchanged, changed, added or removed.</param>
/// <param name="Title">The rule's title in the later revision (in the earlier one when removed).</param>
/// <param name="Kind">The rule kind's word in the later revision (in the earlier one when removed), e.g. "insertion-loss".</param>
/// <param name="Fields">For a changed rule, every field whose value differs, in the order the text writes them; for
/// an added rule, every field with a null old value; for a removed rule, every field with a null new value; empty for
/// an unchanged rule.</param>
public sealed record RuleDifference(string RuleId, RuleChange Change, string Title, string Kind, IReadOnlyList<FieldChange> Fields);
