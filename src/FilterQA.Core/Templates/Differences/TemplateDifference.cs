namespace FilterQA.Core.Templates.Differences;

/// <summary>
/// The rule-by-rule difference of two revisions of one part's limit template: the header fields (description,
/// nominal, status, author, decision rule, sweep requirements such as the maximum thru age) that differ, and every rule
/// of either revision, matched by its id, as unchanged, changed (with each field's old and new value), added or
/// removed. Values are compared as the canonical template text writes them, so "455 kHz" and "0.455 MHz" in the
/// files are the same value, and a value shows with its unit.
/// </summary>
public sealed class TemplateDifference
{
    private TemplateDifference(string partNumber, int fromRevision, int toRevision, string fromHash, string toHash,
        IReadOnlyList<FieldChange> header, IReadOnlyList<RuleDifference> rules)
    {
        PartNumber = partNumber;
        FromRevision = fromRevision;
        ToRevision = toRevision;
        FromContentHash = fromHash;
        ToContentHash = toHash;
        Header = header;
        Rules = rules;
    }

    /// <summary>The part both revisions belong to.</summary>
    public string PartNumber { get; }

    /// <summary>The earlier (left-hand) revision number.</summary>
    public int FromRevision { get; }

    /// <summary>The later (right-hand) revision number.</summary>
    public int ToRevision { get; }

    /// <summary>Content hash of the earlier revision ("sha256:" + hex).</summary>
    public string FromContentHash { get; }

    /// <summary>Content hash of the later revision ("sha256:" + hex).</summary>
    public string ToContentHash { get; }

    /// <summary>The header fields whose values differ, in the order the text writes them; sweep fields are named "sweep.&lt;key&gt;".</summary>
    public IReadOnlyList<FieldChange> Header { get; }

    /// <summary>
    /// Every rule of either revision: first the later revision's rules in its order, then the rules only the earlier
    /// revision has, in its order.
    /// </summary>
    public IReadOnlyList<RuleDifference> Rules { get; }

    /// <summary>True when the content is the same (equal content hashes): no header field and no rule differs.</summary>
    public bool IsSame => FromContentHash == ToContentHash;

    /// <summary>How many rules have <paramref name="change"/>.</summary>
    public int Count(RuleChange change) => Rules.Count(rule => rule.Change == change);

    /// <summary>The difference from <paramref name="from"/> to <paramref name="to"/>.</summary>
    /// <param name="from">The earlier revision (any status).</param>
    /// <param name="to">The later revision (any status); may be the same revision, which gives no change.</param>
    /// <exception cref="ArgumentNullException">Either template is null.</exception>
    /// <exception cref="ArgumentException">The templates are of different part numbers.</exception>
    public static TemplateDifference Between(LimitTemplate from, LimitTemplate to)
    {
        ArgumentNullException.ThrowIfNull(from);
        ArgumentNullException.ThrowIfNull(to);
        if (!string.Equals(from.PartNumber, to.PartNumber, StringComparison.Ordinal))
        {
            throw new ArgumentException($"revisions of different parts cannot be compared: {from.PartNumber} and {to.PartNumber}", nameof(to));
        }
        var (fromHeader, fromRules) = TemplateFields.Of(from);
        var (toHeader, toRules) = TemplateFields.Of(to);

        var rules = new List<RuleDifference>();
        var earlier = fromRules.ToDictionary(rule => rule.Id, StringComparer.Ordinal);
        foreach (TemplateFields.RuleFields rule in toRules)
        {
            if (earlier.TryGetValue(rule.Id, out TemplateFields.RuleFields? old))
            {
                IReadOnlyList<FieldChange> fields = Compare(old.Fields, rule.Fields);
                rules.Add(new RuleDifference(rule.Id, fields.Count == 0 ? RuleChange.Unchanged : RuleChange.Changed, rule.Title, rule.Kind, fields));
            }
            else
            {
                rules.Add(new RuleDifference(rule.Id, RuleChange.Added, rule.Title, rule.Kind,
                    rule.Fields.Where(f => f.Key != "id").Select(f => new FieldChange(f.Key, null, f.Value)).ToArray()));
            }
        }
        var later = toRules.Select(rule => rule.Id).ToHashSet(StringComparer.Ordinal);
        foreach (TemplateFields.RuleFields rule in fromRules.Where(rule => !later.Contains(rule.Id)))
        {
            rules.Add(new RuleDifference(rule.Id, RuleChange.Removed, rule.Title, rule.Kind,
                rule.Fields.Where(f => f.Key != "id").Select(f => new FieldChange(f.Key, f.Value, null)).ToArray()));
        }
        return new TemplateDifference(from.PartNumber, from.Revision, to.Revision, from.ContentHash, to.ContentHash,
            Compare(fromHeader, toHeader), rules);
    }

    /// <summary>Fields whose values differ: the later list's order, then fields only the earlier list has.</summary>
    private static FieldChange[] Compare(List<KeyValuePair<string, string>> before, List<KeyValuePair<string, string>> after)
    {
        var old = before.ToDictionary(pair => pair.Key, pair => pair.Value, StringComparer.Ordinal);
        var changes = new List<FieldChange>();
        foreach ((string key, string value) in after)
        {
            if (!old.TryGetValue(key, out string? was))
            {
                changes.Add(new FieldChange(key, null, value));
            }
            else if (!string.Equals(was, value, StringComparison.Ordinal))
            {
                changes.Add(new FieldChange(key, was, value));
            }
        }
        var now = after.Select(pair => pair.Key).ToHashSet(StringComparer.Ordinal);
        changes.AddRange(before.Where(pair => !now.Contains(pair.Key)).Select(pair => new FieldChange(pair.Key, pair.Value, null)));
        return changes.ToArray();
    }
}
