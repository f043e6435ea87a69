using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Text;

namespace FilterQA.Core.Tests.Templates;

/// <summary>Writing then reading gives the same template, for every rule kind and every status.</summary>
public sealed class RoundTripTests
{
    [Fact]
    public void The_round_trip_samples_hold_every_rule_kind()
    {
        RuleKind[] used = TemplateSamples.EveryRuleKind().SelectMany(t => t.Rules).Select(r => r.Kind).Distinct().Order().ToArray();

        Assert.Equal(Enum.GetValues<RuleKind>().Order(), used);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(1)]
    [InlineData(2)]
    public void Written_template_reads_back_equal(int sample)
    {
        LimitTemplate original = TemplateSamples.EveryRuleKind()[sample];

        TemplateReadResult result = LimitTemplateReader.Read(LimitTemplateWriter.Write(original));

        Assert.Empty(result.Problems);
        LimitTemplate copy = result.Template!;
        Assert.Equal(original.PartNumber, copy.PartNumber);
        Assert.Equal(original.Revision, copy.Revision);
        Assert.Equal(original.Description, copy.Description);
        Assert.Equal(original.Device, copy.Device);
        Assert.Equal(original.NominalHz, copy.NominalHz);
        Assert.Equal(original.Status, copy.Status);
        Assert.Equal(original.Author, copy.Author);
        Assert.Equal(original.ReleaseDate, copy.ReleaseDate);
        Assert.Equal(original.DecisionRule, copy.DecisionRule);
        Assert.Equal(original.Sweep, copy.Sweep);
        Assert.Equal(original.Rules, copy.Rules);
        Assert.Equal(original.CanonicalText, copy.CanonicalText);
        Assert.Equal(original.ContentHash, copy.ContentHash);
    }

    [Fact]
    public void Writing_twice_gives_the_same_text()
    {
        LimitTemplate original = TemplateSamples.EveryRuleKind()[0];
        string once = LimitTemplateWriter.Write(original);

        string twice = LimitTemplateWriter.Write(LimitTemplateReader.Read(once).Template!);

        Assert.Equal(once, twice);
    }

    [Fact]
    public void Written_text_uses_lf_only_and_units_a_person_reads()
    {
        string text = LimitTemplateWriter.Write(TemplateSamples.EveryRuleKind()[2]);

        Assert.DoesNotContain('\r', text);
        Assert.Contains("nominal: 24 MHz\n", text, StringComparison.Ordinal);
        Assert.Contains("tolerance: 20 ppm\n", text, StringComparison.Ordinal);
        Assert.Contains("maximum: 5 pF\n", text, StringComparison.Ordinal);
        Assert.Contains("max-thru-age: 1 h\n", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Draft_is_written_without_a_content_hash_and_released_with_it()
    {
        LimitTemplate[] samples = TemplateSamples.EveryRuleKind();

        Assert.DoesNotContain("content-hash", LimitTemplateWriter.Write(samples[1]), StringComparison.Ordinal);
        Assert.Contains("content-hash: " + samples[0].ContentHash + "\n", LimitTemplateWriter.Write(samples[0]), StringComparison.Ordinal);
    }

    [Fact]
    public void Written_file_reads_back_from_disk()
    {
        LimitTemplate original = TemplateSamples.EveryRuleKind()[0];
        string path = Path.Combine(Path.GetTempPath(), $"filterqa-template-{Guid.NewGuid():N}.yaml");
        try
        {
            LimitTemplateWriter.WriteFile(original, path);

            Assert.Equal(original.ContentHash, LimitTemplateReader.ReadFile(path).Template!.ContentHash);
        }
        finally
        {
            File.Delete(path);
        }
    }
}
