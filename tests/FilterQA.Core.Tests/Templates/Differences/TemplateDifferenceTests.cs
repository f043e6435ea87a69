using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Differences;
using FilterQA.Core.Templates.Text;

namespace FilterQA.Core.Tests.Templates.Differences;

/// <summary>
/// The rule-by-rule difference of two revisions, from pairs of template texts written out here: each expected
/// difference can be read off the two texts by eye (the values are compared as text with units, so there is no
/// numeric tolerance in these checks).
/// </summary>
public sealed class TemplateDifferenceTests
{
    private const string Earlier = """
        format-version: 1
        part: TEST-IF-455
        revision: 1
        description: Test 455 kHz IF filter
        device: bandpass-filter
        nominal: 455 kHz
        status: draft
        author: Test Author
        decision-rule: guarded-acceptance
        sweep:
          start: 255 kHz
          stop: 655 kHz
          narrowest-feature: 10 kHz
          points-per-feature: 50
          max-thru-age: 8 h
          needs-phase: false
          needs-s11: false
          needs-s22: false
        rules:
          - id: bw-6db
            kind: bandwidth
            title: 6 dB bandwidth at least 15 kHz
            level: 6 dB
            minimum: 15 kHz
            uncertainty: 200 Hz
          - id: loss
            kind: insertion-loss
            title: Insertion loss at most 6 dB
            measure: minimum-loss
            maximum: 6 dB
            uncertainty: 0.3 dB
          - id: ripple
            kind: passband-ripple
            title: Ripple at most 2 dB within 5 kHz
            anchor: nominal-offset
            start: -5 kHz
            stop: 5 kHz
            maximum: 2 dB
            uncertainty: 0.2 dB
        """;

    private static LimitTemplate Read(string text)
    {
        TemplateReadResult read = LimitTemplateReader.Read(text);
        return read.Template ?? throw new InvalidOperationException("test template does not read: " + string.Join("; ", read.Problems));
    }

    /// <summary>The earlier text as a draft of revision 2 with the given line replacements.</summary>
    private static LimitTemplate Later(params (string Old, string New)[] edits)
    {
        string text = Earlier.Replace("revision: 1", "revision: 2", StringComparison.Ordinal);
        foreach ((string old, string replacement) in edits)
        {
            Assert.Contains(old, text, StringComparison.Ordinal);
            text = text.Replace(old, replacement, StringComparison.Ordinal);
        }
        return Read(text);
    }

    [Fact]
    public void A_revision_compared_with_itself_has_no_difference()
    {
        LimitTemplate template = Read(Earlier);

        TemplateDifference difference = TemplateDifference.Between(template, template);

        Assert.True(difference.IsSame);
        Assert.Empty(difference.Header);
        Assert.Equal(["bw-6db", "loss", "ripple"], difference.Rules.Select(r => r.RuleId));
        Assert.All(difference.Rules, r => Assert.Equal((RuleChange.Unchanged, 0), (r.Change, r.Fields.Count)));
    }

    [Fact]
    public void The_same_value_written_in_another_unit_prefix_is_no_change()
    {
        // 455 kHz = 0.455 MHz and 8 h = 480 min: the canonical text writes each one way.
        LimitTemplate earlier = Read(Earlier);
        LimitTemplate later = Read(Earlier.Replace("nominal: 455 kHz", "nominal: 0.455 MHz", StringComparison.Ordinal)
            .Replace("max-thru-age: 8 h", "max-thru-age: 480 min", StringComparison.Ordinal));

        TemplateDifference difference = TemplateDifference.Between(earlier, later);

        Assert.True(difference.IsSame);
        Assert.Empty(difference.Header);
        Assert.Equal(0, difference.Count(RuleChange.Changed));
    }

    [Fact]
    public void A_tightened_loss_limit_is_the_one_changed_field_of_the_one_changed_rule()
    {
        LimitTemplate later = Later(("maximum: 6 dB", "maximum: 4 dB"));

        // Revision 1 released (a released text is made by releasing, never written by hand).
        LimitTemplate released = Read(Earlier).Release("Test Author", new DateOnly(2026, 1, 5));
        TemplateDifference difference = TemplateDifference.Between(released, later);

        RuleDifference loss = Assert.Single(difference.Rules, r => r.Change == RuleChange.Changed);
        Assert.Equal("loss", loss.RuleId);
        Assert.Equal("insertion-loss", loss.Kind);
        Assert.Equal([new FieldChange("maximum", "6 dB", "4 dB")], loss.Fields);
        Assert.Equal(2, difference.Count(RuleChange.Unchanged));
        // The header differs only in the life-cycle fields the draft does not carry yet.
        Assert.Equal([new FieldChange("status", "released", "draft"), new FieldChange("release-date", "2026-01-05", null)], difference.Header);
    }

    [Fact]
    public void A_rule_taken_out_and_another_put_in_are_removed_and_added_with_all_their_fields()
    {
        LimitTemplate later = Later((
            """
              - id: ripple
                kind: passband-ripple
                title: Ripple at most 2 dB within 5 kHz
                anchor: nominal-offset
                start: -5 kHz
                stop: 5 kHz
                maximum: 2 dB
                uncertainty: 0.2 dB
            """.Replace("\r\n", "\n", StringComparison.Ordinal),
            """
              - id: reject-high
                kind: stopband-rejection
                title: Rejection at least 35 dB from 100 kHz above centre
                anchor: nominal-offset
                start: 100 kHz
                stop: 200 kHz
                reference: relative
                minimum: 35 dB
                uncertainty: 1 dB
            """.Replace("\r\n", "\n", StringComparison.Ordinal)));

        TemplateDifference difference = TemplateDifference.Between(Read(Earlier), later);

        // The later revision's rules in its order, then the one only the earlier revision had.
        Assert.Equal([("bw-6db", RuleChange.Unchanged), ("loss", RuleChange.Unchanged), ("reject-high", RuleChange.Added), ("ripple", RuleChange.Removed)],
            difference.Rules.Select(r => (r.RuleId, r.Change)));
        RuleDifference added = difference.Rules[2];
        Assert.Equal("stopband-rejection", added.Kind);
        Assert.Contains(new FieldChange("minimum", null, "35 dB"), added.Fields);
        Assert.Contains(new FieldChange("start", null, "100 kHz"), added.Fields);
        Assert.All(added.Fields, f => Assert.Null(f.OldValue));
        RuleDifference removed = difference.Rules[3];
        Assert.Equal("Ripple at most 2 dB within 5 kHz", removed.Title);
        Assert.Contains(new FieldChange("maximum", "2 dB", null), removed.Fields);
        Assert.Contains(new FieldChange("uncertainty", "0.2 dB", null), removed.Fields);
        Assert.All(removed.Fields, f => Assert.Null(f.NewValue));
    }

    [Fact]
    public void Header_changes_are_listed_with_their_units_and_the_sweep_fields_by_their_sweep_key()
    {
        LimitTemplate later = Later(
            ("description: Test 455 kHz IF filter", "description: Test 455 kHz IF filter, tighter thru"),
            ("max-thru-age: 8 h", "max-thru-age: 4 h"),
            ("points-per-feature: 50", "points-per-feature: 40"));

        TemplateDifference difference = TemplateDifference.Between(Read(Earlier), later);

        Assert.Contains(new FieldChange("description", "Test 455 kHz IF filter", "Test 455 kHz IF filter, tighter thru"), difference.Header);
        Assert.Contains(new FieldChange("sweep.max-thru-age", "8 h", "4 h"), difference.Header);
        Assert.Contains(new FieldChange("sweep.points-per-feature", "50", "40"), difference.Header);
        Assert.All(difference.Rules, r => Assert.Equal(RuleChange.Unchanged, r.Change));
    }

    [Fact]
    public void Going_from_guarded_to_simple_acceptance_removes_the_guard_band_of_every_rule()
    {
        // ILAC-G8:09/2019: under guarded acceptance the guard band w equals the expanded uncertainty U; under simple
        // acceptance there is none.
        LimitTemplate later = Later(("decision-rule: guarded-acceptance", "decision-rule: simple-acceptance"));

        TemplateDifference difference = TemplateDifference.Between(Read(Earlier), later);

        Assert.Contains(new FieldChange("decision-rule", "guarded-acceptance", "simple-acceptance"), difference.Header);
        Assert.Equal(
            [
                [new FieldChange("guard band", "200 Hz", "none (simple acceptance)")],
                [new FieldChange("guard band", "0.3 dB", "none (simple acceptance)")],
                [new FieldChange("guard band", "0.2 dB", "none (simple acceptance)")],
            ],
            difference.Rules.Select(r => r.Fields.ToArray()));
    }

    [Fact]
    public void A_rule_whose_kind_changes_under_the_same_id_shows_the_kind_and_the_fields_it_gains_and_loses()
    {
        LimitTemplate later = Later((
            """
                kind: bandwidth
                title: 6 dB bandwidth at least 15 kHz
                level: 6 dB
                minimum: 15 kHz
                uncertainty: 200 Hz
            """.Replace("\r\n", "\n", StringComparison.Ordinal),
            """
                kind: shape-factor
                title: 6 dB to 40 dB shape factor at most 2
                pass-level: 6 dB
                stop-level: 40 dB
                maximum: 2
                uncertainty: 0.05
            """.Replace("\r\n", "\n", StringComparison.Ordinal)));

        RuleDifference rule = TemplateDifference.Between(Read(Earlier), later).Rules[0];

        Assert.Equal(("bw-6db", RuleChange.Changed, "shape-factor"), (rule.RuleId, rule.Change, rule.Kind));
        Assert.Equal(
            [
                new FieldChange("kind", "bandwidth", "shape-factor"),
                new FieldChange("title", "6 dB bandwidth at least 15 kHz", "6 dB to 40 dB shape factor at most 2"),
                new FieldChange("pass-level", null, "6 dB"),
                new FieldChange("stop-level", null, "40 dB"),
                new FieldChange("maximum", null, "2"),
                new FieldChange("uncertainty", "200 Hz", "0.05"),
                new FieldChange("guard band", "200 Hz", "0.05"),
                new FieldChange("level", "6 dB", null),
                new FieldChange("minimum", "15 kHz", null),
            ],
            rule.Fields);
    }

    [Fact]
    public void Revisions_of_different_parts_are_refused()
    {
        LimitTemplate other = Read(Earlier.Replace("part: TEST-IF-455", "part: TEST-IF-10M7", StringComparison.Ordinal));

        ArgumentException problem = Assert.Throws<ArgumentException>(() => TemplateDifference.Between(Read(Earlier), other));

        Assert.Contains("TEST-IF-455 and TEST-IF-10M7", problem.Message, StringComparison.Ordinal);
    }
}
