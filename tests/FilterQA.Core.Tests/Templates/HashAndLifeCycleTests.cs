using System.Reflection;
using System.Security.Cryptography;
using System.Text;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;
using FilterQA.Core.Templates.Text;

namespace FilterQA.Core.Tests.Templates;

/// <summary>The content hash and the life cycle: released revisions cannot change, changes make new revisions.</summary>
public sealed class HashAndLifeCycleTests
{
    private static LimitTemplate Draft() => LimitTemplateReader.Read(TemplateSamples.ValidDraft).Template!;

    [Fact]
    public void Content_hash_is_the_SHA256_of_the_canonical_text()
    {
        LimitTemplate template = Draft();
        // Reference: the SHA-256 of .NET's cryptography library (FIPS 180-4), computed here from the canonical text.
        string expected = "sha256:" + Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(template.CanonicalText)));

        Assert.Equal(expected, template.ContentHash);
        Assert.DoesNotContain("content-hash", template.CanonicalText, StringComparison.Ordinal);
        Assert.DoesNotContain('\r', template.CanonicalText);
    }

    [Fact]
    public void Hash_function_matches_the_FIPS_180_4_test_vector()
    {
        // FIPS 180-4 / NIST example "abc": ba7816bf 8f01cfea 414140de 5dae2223 b00361a3 96177a9c b410ff61 f20015ad.
        Assert.Equal("sha256:ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", TemplateHash.Of("abc"));
    }

    [Theory]
    [InlineData("maximum: 1 dB", "maximum: 1.1 dB")]
    [InlineData("title: Ripple at most 1 dB within 50 kHz of nominal", "title: Ripple at most 1 dB within 50 kHz of the nominal")]
    [InlineData("revision: 3", "revision: 4")]
    [InlineData("needs-s22: false", "needs-s22: true")]
    [InlineData("[100 kHz, 3 dB]", "[100 kHz, 3.5 dB]")]
    public void Hash_changes_when_content_changes(string find, string replace)
    {
        string changed = TemplateSamples.ValidDraft.Replace(find, replace, StringComparison.Ordinal);

        Assert.NotEqual(Draft().ContentHash, LimitTemplateReader.Read(changed).Template!.ContentHash);
    }

    [Theory]
    [InlineData("nominal: 10.7 MHz", "nominal:    10.7MHz   # the IF")]
    [InlineData("nominal: 10.7 MHz", "nominal: 10700 kHz")]
    [InlineData("nominal: 10.7 MHz", "nominal: \"10.7 MHz\"")]
    [InlineData("rules:\n", "\n# the limits\nrules:\n\n")]
    [InlineData("  start: 9.7 MHz\n  stop: 11.7 MHz\n", "  stop: 11.7 MHz\n  start: 9.7 MHz\n")]
    public void Hash_does_not_change_with_layout_comments_or_spelling_of_a_quantity(string find, string replace)
    {
        string changed = TemplateSamples.ValidDraft.Replace(find, replace, StringComparison.Ordinal).Replace("\n", "\r\n", StringComparison.Ordinal);

        TemplateReadResult result = LimitTemplateReader.Read(changed);

        Assert.Empty(result.Problems);
        Assert.Equal(Draft().ContentHash, result.Template!.ContentHash);
    }

    [Fact]
    public void Edited_released_file_is_refused_at_its_content_hash()
    {
        string text = File.ReadAllText(TemplateSamples.ShippedPath("TME-CF455-15"));
        string edited = text.Replace("maximum: 6 dB", "maximum: 7 dB", StringComparison.Ordinal);

        TemplateReadResult result = LimitTemplateReader.Read(edited);

        TemplateProblem problem = Assert.Single(result.Problems);
        Assert.Equal(TemplateSamples.LineOf(edited, "content-hash:"), problem.Line);
        Assert.Contains("no longer matches", problem.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Released_file_without_its_hash_line_is_refused()
    {
        string text = File.ReadAllText(TemplateSamples.ShippedPath("TME-LC92-TRAP"));
        string unsealed = string.Join('\n', text.Split('\n').Where(line => !line.StartsWith("content-hash:", StringComparison.Ordinal)));

        TemplateReadResult result = LimitTemplateReader.Read(unsealed);

        Assert.Equal(TemplateSamples.LineOf(unsealed, "status: released"), Assert.Single(result.Problems).Line);
    }

    [Fact]
    public void New_revision_is_a_draft_with_the_next_number_and_the_released_one_is_untouched()
    {
        LimitTemplate released = LimitTemplateReader.ReadFile(TemplateSamples.ShippedPath("TME-CF455-15")).Template!;
        string hashBefore = released.ContentHash;
        var tighter = new InsertionLossRule("loss", "Insertion loss at most 5.5 dB (minimum loss)", 5.5, InsertionLossMeasure.MinimumLoss, null, 0.3);

        LimitTemplate next = released.NewRevision(edit =>
        {
            int index = edit.Rules.IndexOf(edit.Rules.Single(rule => rule.Id == "loss"));
            edit.Rules[index] = tighter;
        });

        Assert.Equal(released.Revision + 1, next.Revision);
        Assert.Equal(TemplateStatus.Draft, next.Status);
        Assert.Null(next.ReleaseDate);
        Assert.Equal(tighter, next.FindRule("loss"));
        Assert.Equal(6.0, ((InsertionLossRule)released.FindRule("loss")!).MaximumDb);
        Assert.Equal(hashBefore, released.ContentHash);
        Assert.NotEqual(hashBefore, next.ContentHash);
    }

    [Fact]
    public void Release_and_withdraw_follow_the_life_cycle()
    {
        LimitTemplate draft = Draft();

        LimitTemplate released = draft.Release("J. Lindqvist", new DateOnly(2025, 11, 3));
        LimitTemplate withdrawn = released.Withdraw();

        Assert.Equal((TemplateStatus.Released, 3, "J. Lindqvist"), (released.Status, released.Revision, released.Author));
        Assert.Equal(TemplateStatus.Withdrawn, withdrawn.Status);
        Assert.Equal(released.ReleaseDate, withdrawn.ReleaseDate);
        Assert.Throws<InvalidOperationException>(() => released.Release("S. Petrova", new DateOnly(2025, 11, 4)));
        Assert.Throws<InvalidOperationException>(() => draft.Withdraw());
        Assert.Throws<ArgumentException>(() => draft.Release(" ", new DateOnly(2025, 11, 4)));
    }

    [Fact]
    public void Template_and_rules_expose_nothing_that_changes_them()
    {
        Type[] types = [typeof(LimitTemplate), typeof(SweepRequirements), typeof(FrequencyBand), typeof(AnchoredFrequency), typeof(FrequencyTolerance),
            .. typeof(LimitRule).Assembly.GetTypes().Where(t => t.IsAssignableTo(typeof(LimitRule)))];

        // Records get a compiler-made copy constructor and 'EqualityContract'; neither can change a field.
        string[] writable = types.SelectMany(t => t.GetProperties(BindingFlags.Public | BindingFlags.Instance)
                .Where(p => p.SetMethod is { IsPublic: true } || p.SetMethod is { IsFamily: true })
                .Select(p => $"{t.Name}.{p.Name}"))
            .ToArray();

        Assert.Empty(writable);
        Assert.True(((ICollection<LimitRule>)Draft().Rules).IsReadOnly);
    }

    [Fact]
    public void Create_refuses_duplicate_ids_and_rules_that_do_not_fit_the_device()
    {
        LimitTemplate source = Draft();
        var resonatorRule = new UnloadedQRule("qu", "Qu", 1000, 10);
        var duplicate = new PassbandRippleRule("centre", "Second rule named centre", new FrequencyBand(FrequencyAnchor.NominalOffset, -1e3, 1e3), 1, 0);

        var error = Assert.Throws<ArgumentException>(() => LimitTemplate.Create(source.PartNumber, 1, source.Description, source.Device, source.NominalHz,
            TemplateStatus.Draft, null, null, source.Sweep, source.DecisionRule, [.. source.Rules, resonatorRule, duplicate]));

        Assert.Contains("does not apply to a bandpass-filter", error.Message, StringComparison.Ordinal);
        Assert.Contains("used by an earlier rule", error.Message, StringComparison.Ordinal);
    }
}
