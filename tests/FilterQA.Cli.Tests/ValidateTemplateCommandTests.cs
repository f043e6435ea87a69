using System.Text.RegularExpressions;

namespace FilterQA.Cli.Tests;

public class ValidateTemplateCommandTests
{
    // Three independent mistakes on lines 6, 8 and 14: an unknown device kind, a nominal without a unit, and a
    // minimum given in the wrong unit.
    internal const string BrokenTemplate = """
        format-version: 1
        part: TEST-BROKEN
        revision: 1
        description: a template with three mistakes
        status: draft
        device: band-pass
        decision-rule: simple-acceptance
        nominal: 455
        sweep:
          start: 255 kHz
          stop: 655 kHz
          narrowest-feature: 10 kHz
          points-per-feature: 50
          max-thru-age: 8 ohm
          needs-phase: false
          needs-s11: false
          needs-s22: false
        rules:
          - id: loss
            kind: insertion-loss
            title: Insertion loss at most 6 dB
            measure: minimum-loss
            maximum: 6 dB
            uncertainty: 0.3 dB
        """;

    [Fact]
    public void Every_shipped_template_is_valid()
    {
        foreach (string file in Directory.GetFiles(Path.Combine(CliFixture.RepositoryRoot(), "limit-templates"), "*.yaml"))
        {
            (int code, string output, string error) = CliFixture.Run("validate-template", file);
            Assert.True(code == 0, file + ": " + error);
            Assert.Matches(@"^valid: TME-[A-Z0-9-]+ rev 1 sha256:[0-9a-f]{64}\r?\n$", output);
        }
    }

    [Fact]
    public void A_broken_template_lists_every_problem_with_line_and_column()
    {
        using var files = new CliFixture();
        string path = files.WriteText("broken.yaml", BrokenTemplate);
        (int code, string output, string error) = CliFixture.Run("validate-template", path);
        Assert.Equal(2, code);
        Assert.Equal("", output);
        string[] lines = error.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.All(lines, l => Assert.Matches("^" + Regex.Escape(path) + @":\d+:\d+: \S", l));
        int[] lineNumbers = [.. lines.Select(l => int.Parse(l[(path.Length + 1)..].Split(':')[0], System.Globalization.CultureInfo.InvariantCulture))];
        Assert.Contains(6, lineNumbers);
        Assert.Contains(8, lineNumbers);
        Assert.Contains(14, lineNumbers);
    }

    [Fact]
    public void A_missing_file_gives_exit_code_2()
    {
        (int code, _, string error) = CliFixture.Run("validate-template", Path.Combine(Path.GetTempPath(), "no-such-template.yaml"));
        Assert.Equal(2, code);
        Assert.Contains("cannot be read", error);
    }

    [Theory]
    [InlineData("validate-template")]
    [InlineData("validate-template", "a.yaml", "b.yaml")]
    public void Usage_errors_give_exit_code_1(params string[] args) => Assert.Equal(1, CliFixture.Run(args).Code);
}
