using FilterQA.Core.Templates.Text;

namespace FilterQA.Core.Tests.Templates;

/// <summary>
/// Every class of user error in a template text is reported with its line and a message that names what was
/// wrong. The expected line is found in the changed text itself (the line holding the changed words), never
/// taken from the reader.
/// </summary>
public sealed class MalformedTemplateTests
{
    [Fact]
    public void The_unchanged_sample_is_valid()
    {
        TemplateReadResult result = LimitTemplateReader.Read(TemplateSamples.ValidDraft);

        Assert.Empty(result.Problems);
        Assert.True(result.Succeeded);
    }

    /// <summary>Rows: what is wrong, the text to find, its replacement, words on the line the problem must be at, a key phrase.</summary>
    public static TheoryData<string, string, string, string, string> Rows => new()
    {
        { "YAML syntax error", "description: Test bandpass filter", "description: Test: bandpass filter", "description: Test:", "YAML syntax error" },
        { "duplicate key", "    level: 3 dB\n    method", "    level: 3 dB\n    level: 4 dB\n    method", "level: 4 dB", "Duplicate key" },
        { "unknown rule kind", "kind: passband-ripple", "kind: ripple-limit", "kind: ripple-limit", "unknown rule kind 'ripple-limit'" },
        { "missing limit", "    maximum: 1 dB\n", "", "id: ripple", "has no 'maximum'" },
        { "bandwidth without any limit", "    minimum: 200 kHz\n    maximum: 300 kHz\n", "", "kind: bandwidth", "needs at least one limit" },
        { "band start above stop", "    start: 9.7 MHz\n    stop: 10.2 MHz", "    start: 10.2 MHz\n    stop: 9.7 MHz", "start: 10.2 MHz", "must be below its stop" },
        { "level not positive", "level: 3 dB\n    method", "level: 0 dB\n    method", "level: 0 dB", "'level' must be above zero" },
        { "ppm on an absolute band", "stop: 10.2 MHz", "stop: 20 ppm", "stop: 20 ppm", "frequencies are absolute" },
        { "unknown rule field", "title: Ripple at most 1 dB within 50 kHz of nominal\n", "title: Ripple at most 1 dB within 50 kHz of nominal\n    colour: red\n", "colour: red", "unknown field 'colour' in rule 'ripple'" },
        { "unknown top-level field", "status: draft\n", "status: draft\nowner: someone\n", "owner:", "unknown field 'owner' in the template" },
        { "unit in the wrong case", "tolerance: 30 kHz", "tolerance: 30 kHZ", "tolerance: 30 kHZ", "did you mean 'kHz'" },
        { "unit missing", "minimum: 12 dB", "minimum: 12", "minimum: 12", "has no unit" },
        { "decimal comma", "minimum: 30 dB", "minimum: 3,5 dB", "minimum: 3,5 dB", "uses a comma" },
        { "wrong status", "status: draft", "status: approved", "status: approved", "unknown status 'approved'" },
        { "released without release date", "status: draft", "status: released", "status: released", "needs a release date" },
        { "released without author", "status: draft\nauthor: Test Author\n", "status: released\nrelease-date: 2025-10-01\n", "status: released", "needs an author" },
        { "draft with a release date", "status: draft\n", "status: draft\nrelease-date: 2025-10-01\n", "release-date:", "a draft has no release date" },
        { "bad date", "status: draft\n", "status: draft\nrelease-date: 01.10.2025\n", "release-date:", "year-month-day" },
        { "duplicate rule id", "id: rl", "id: ripple", "- id: ripple", "is used by an earlier rule" },
        { "rule id not a short name", "id: gd", "id: Group Delay", "id: Group Delay", "not a short name" },
        { "rule kind not fitting the device", "device: bandpass-filter", "device: resonator", "kind: centre-frequency", "does not apply to a resonator" },
        { "content hash that does not match", "author: Test Author\n", "author: Test Author\ncontent-hash: sha256:" + new string('0', 64) + "\n", "content-hash:", "no longer matches" },
        { "content hash badly written", "author: Test Author\n", "author: Test Author\ncontent-hash: md5:abc\n", "content-hash:", "must be 'sha256:'" },
        { "missing required field", "part: TEST-BP-1\n", "", "format-version", "has no 'part'" },
        { "bad part number", "part: TEST-BP-1", "part: TEST BP 1", "part: TEST BP 1", "part number 'TEST BP 1'" },
        { "wrong format version", "format-version: 1", "format-version: 2", "format-version: 2", "not known" },
        { "phase needed but not required", "needs-phase: true", "needs-phase: false", "needs-phase: false", "needs the transmission phase" },
        { "S11 needed but not required", "needs-s11: true", "needs-s11: false", "needs-s11: false", "needs S11" },
        { "band outside the sweep span", "    start: 9.7 MHz\n    stop: 10.2 MHz", "    start: 9.5 MHz\n    stop: 10.2 MHz", "start: 9.5 MHz", "outside the required sweep span" },
        { "uncertainty in another unit than the tolerance", "uncertainty: 2 kHz", "uncertainty: 2 ppm", "uncertainty: 2 ppm", "same unit" },
        { "negative uncertainty", "uncertainty: 10 ns", "uncertainty: -10 ns", "uncertainty: -10 ns", "must not be negative" },
        { "aperture wider than its band", "aperture: 10 kHz", "aperture: 200 kHz", "id: gd", "narrower than the band" },
        { "limit-line points out of order", "[100 kHz, 3 dB]", "[-120 kHz, 3 dB]", "[-120 kHz", "not above the point before it" },
        { "negative limit-line loss", "[-150 kHz, 60 dB]", "[-150 kHz, -60 dB]", "-60 dB", "negative" },
        { "limit-line point not a pair", "[-150 kHz, 60 dB]", "[-150 kHz]", "[-150 kHz]", "pair [frequency, loss]" },
        { "return-loss port not 1 or 2", "port: 1", "port: 3", "port: 3", "1 (S11) or 2 (S22)" },
        { "not true or false", "needs-s22: false", "needs-s22: no", "needs-s22: no", "true or false" },
        { "unknown anchor", "anchor: nominal-offset\n    start: -50 kHz\n    stop: 50 kHz\n    maximum: 1 dB", "anchor: centre\n    start: -50 kHz\n    stop: 50 kHz\n    maximum: 1 dB", "anchor: centre", "unknown frequency anchor 'centre'" },
        { "section given as a value", "sweep:\n  start: 9.7 MHz", "sweep: wide\nsweep-was:\n  start: 9.7 MHz", "sweep: wide", "must be a section of fields" },
        { "revision not a number", "revision: 3", "revision: C", "revision: C", "whole number" },
    };

    [Theory]
    [MemberData(nameof(Rows))]
    public void Malformed_template_is_reported_at_its_line(string what, string find, string replace, string lineWords, string phrase)
    {
        Assert.Equal(1, Occurrences(TemplateSamples.ValidDraft, find));
        string text = TemplateSamples.ValidDraft.Replace(find, replace, StringComparison.Ordinal);
        int expectedLine = what == "duplicate rule id" ? TemplateSamples.LastLineOf(text, lineWords) : TemplateSamples.LineOf(text, lineWords);

        TemplateReadResult result = LimitTemplateReader.Read(text);

        Assert.Null(result.Template);
        Assert.Contains(result.Problems, p => p.Line == expectedLine && p.Column > 0 && p.Message.Contains(phrase, StringComparison.Ordinal));
    }

    [Fact]
    public void Several_problems_are_all_reported_at_once_in_text_order()
    {
        string text = TemplateSamples.ValidDraft
            .Replace("status: draft", "status: approved", StringComparison.Ordinal)
            .Replace("tolerance: 30 kHz", "tolerance: 30 kHZ", StringComparison.Ordinal)
            .Replace("kind: passband-ripple", "kind: ripple-limit", StringComparison.Ordinal)
            .Replace("id: rl", "id: reject", StringComparison.Ordinal)
            .Replace("[100 kHz, 3 dB]", "[-120 kHz, 3 dB]", StringComparison.Ordinal);

        TemplateReadResult result = LimitTemplateReader.Read(text);

        (int Line, string Phrase)[] expected =
        [
            (TemplateSamples.LineOf(text, "status: approved"), "unknown status"),
            (TemplateSamples.LineOf(text, "tolerance: 30 kHZ"), "did you mean 'kHz'"),
            (TemplateSamples.LineOf(text, "kind: ripple-limit"), "unknown rule kind"),
            (TemplateSamples.LastLineOf(text, "id: reject"), "is used by an earlier rule"),
            (TemplateSamples.LineOf(text, "[-120 kHz"), "not above the point before it"),
        ];
        Assert.Equal(expected.Length, result.Problems.Count);
        for (int i = 0; i < expected.Length; i++)
        {
            Assert.Equal(expected[i].Line, result.Problems[i].Line);
            Assert.Contains(expected[i].Phrase, result.Problems[i].Message, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void Unclosed_bracket_is_a_syntax_error_with_a_position()
    {
        string text = TemplateSamples.ValidDraft.Replace("- [150 kHz, 60 dB]", "- [150 kHz, 60 dB", StringComparison.Ordinal);

        TemplateReadResult result = LimitTemplateReader.Read(text);

        TemplateProblem problem = Assert.Single(result.Problems);
        Assert.Contains("YAML syntax error", problem.Message, StringComparison.Ordinal);
        // The parser gives no position for this case; the reader points at the last good place before the bracket.
        Assert.InRange(problem.Line, 1, TemplateSamples.LineOf(text, "- [150 kHz, 60 dB"));
    }

    [Theory]
    [InlineData("")]
    [InlineData("# only a comment\n")]
    public void Empty_text_is_reported_not_thrown(string text)
    {
        TemplateReadResult result = LimitTemplateReader.Read(text);

        Assert.Contains("holds no template", Assert.Single(result.Problems).Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_list_at_the_top_is_not_a_template()
    {
        TemplateReadResult result = LimitTemplateReader.Read("- part: X\n");

        Assert.Equal(1, Assert.Single(result.Problems).Line);
    }

    [Fact]
    public void Two_documents_are_reported()
    {
        TemplateReadResult result = LimitTemplateReader.Read(TemplateSamples.ValidDraft + "---\npart: OTHER\n");

        Assert.Contains(result.Problems, p => p.Message.Contains("one template", StringComparison.Ordinal));
    }

    [Fact]
    public void Missing_file_is_a_problem_not_an_exception()
    {
        TemplateReadResult result = LimitTemplateReader.ReadFile(Path.Combine(Path.GetTempPath(), $"no-such-template-{Guid.NewGuid():N}.yaml"));

        Assert.Equal(0, Assert.Single(result.Problems).Line);
    }

    private static int Occurrences(string text, string fragment)
    {
        int count = 0;
        for (int at = text.IndexOf(fragment, StringComparison.Ordinal); at >= 0; at = text.IndexOf(fragment, at + 1, StringComparison.Ordinal))
        {
            count++;
        }
        return count;
    }
}
