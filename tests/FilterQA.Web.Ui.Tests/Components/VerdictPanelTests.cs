using Bunit;
using FilterQA.Core.Decisions;
using FilterQA.Core.Templates;
using FilterQA.Web.Ui.Components;

namespace FilterQA.Web.Ui.Tests.Components;

public sealed class VerdictPanelTests : BunitContext
{
    private static RuleResult Rule(string id, RuleOutcome outcome, string message) =>
        new(id, RuleKind.StopbandRejection, "Rejection at 455 kHz ± 100 kHz", RuleUnit.Decibel, 31.2, 35, LimitSense.AtLeast,
            -3.8, 0, outcome, false, 555e3, message);

    private static UnitEvaluation Evaluation(UnitVerdict verdict, params RuleResult[] rules) =>
        new(verdict, rules, [], "TME-CF455-15", 1, "sha256:00", DecisionRule.SimpleAcceptance, []);

    [Fact]
    public void Go_shows_its_words_and_the_circle_with_a_tick_and_no_failing_rules()
    {
        var cut = Render<VerdictPanel>(p => p.Add(x => x.Evaluation, Evaluation(UnitVerdict.Go,
            Rule("reject-high", RuleOutcome.Pass, "rejection 48.0 dB at 555.000 kHz, limit 35 dB"))));
        Assert.Equal("go", cut.Find("section").GetAttribute("data-verdict"));
        Assert.Equal("GO", cut.Find(".verdict-word").TextContent.Trim());
        Assert.Equal("circle-tick", cut.Find(".verdict-word").GetAttribute("data-shape"));
        Assert.NotEmpty(cut.FindAll("svg circle"));
        Assert.Empty(cut.FindAll(".verdict-rules li"));
    }

    [Fact]
    public void No_go_shows_its_words_the_octagon_and_each_failing_rules_message()
    {
        var cut = Render<VerdictPanel>(p => p.Add(x => x.Evaluation, Evaluation(UnitVerdict.NoGo,
            Rule("reject-high", RuleOutcome.Fail, "rejection 31.2 dB at 555.000 kHz, limit 35 dB"),
            Rule("reject-low", RuleOutcome.Pass, "rejection 40.1 dB at 355.000 kHz, limit 35 dB"))));
        Assert.Equal("no-go", cut.Find("section").GetAttribute("data-verdict"));
        Assert.Equal("NO-GO", cut.Find(".verdict-word").TextContent.Trim());
        Assert.Equal("octagon-cross", cut.Find(".verdict-word").GetAttribute("data-shape"));
        Assert.NotEmpty(cut.FindAll("svg polygon"));
        var failing = cut.FindAll(".verdict-rules li");
        Assert.Single(failing);
        Assert.Equal("reject-high", failing[0].GetAttribute("data-rule"));
        Assert.Contains("rejection 31.2 dB at 555.000 kHz, limit 35 dB", failing[0].TextContent, StringComparison.Ordinal);
        Assert.DoesNotContain("355.000 kHz", cut.Markup, StringComparison.Ordinal);
    }

    [Fact]
    public void Not_verifiable_shows_its_own_words_and_triangle_and_never_the_go_words_or_shape()
    {
        var cut = Render<VerdictPanel>(p => p.Add(x => x.Evaluation, Evaluation(UnitVerdict.NotVerifiable,
            Rule("reject-high", RuleOutcome.NotVerifiable, "the sweep stops at 520 kHz; the band needs 555 kHz"))));
        var section = cut.Find("section");
        Assert.Equal("not-verifiable", section.GetAttribute("data-verdict"));
        Assert.Equal("NOT VERIFIABLE", cut.Find(".verdict-word").TextContent.Trim());
        Assert.Equal("triangle-exclamation", cut.Find(".verdict-word").GetAttribute("data-shape"));
        Assert.DoesNotContain("verdict-go", section.ClassName, StringComparison.Ordinal);
        Assert.Empty(cut.FindAll("svg circle.shape-fill"));
        Assert.Contains("not passed", cut.Find(".verdict-meaning").TextContent, StringComparison.Ordinal);
        Assert.Contains("the sweep stops at 520 kHz; the band needs 555 kHz", cut.Find(".verdict-rules").TextContent, StringComparison.Ordinal);
    }

    [Fact]
    public void Warnings_of_the_sweep_are_listed()
    {
        var evaluation = Evaluation(UnitVerdict.Go) with { Warnings = ["the thru's age is not known"] };
        var cut = Render<VerdictPanel>(p => p.Add(x => x.Evaluation, evaluation).Add(x => x.Serial, "S0007"));
        Assert.Contains("the thru's age is not known", cut.Find(".verdict-warnings").TextContent, StringComparison.Ordinal);
        Assert.Contains("S0007", cut.Find(".verdict-unit").TextContent, StringComparison.Ordinal);
    }
}
