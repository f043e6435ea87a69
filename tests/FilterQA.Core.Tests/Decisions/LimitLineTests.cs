using FilterQA.Core.Decisions;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;

namespace FilterQA.Core.Tests.Decisions;

// Limit lines on a trapezoid: 2 dB flat ±5 kHz around 455 kHz, 5 dB/kHz skirts to 52 dB at ±15 kHz. Relative to the
// 2 dB minimum the trace is R(d) = 5·(d − 5 kHz) dB on the skirt and 50 dB beyond (d = offset in kHz).
public class LimitLineTests
{
    private static readonly FrequencyGrid Grid = FrequencyGrid.Linear(255e3, 655e3, 2001);

    private static UnitEvaluation Evaluate(params LimitRule[] rules) =>
        Units.Evaluate(Units.Template(DecisionRule.GuardedAcceptance, 455e3, 255e3, 655e3, rules),
            Units.Scalar(Units.Trapezoid(455e3, 5e3, 15e3, 2, 52), Grid), floor: Enumerable.Repeat(150.0, Grid.Count).ToArray());

    [Fact]
    public void Upper_line_the_worst_point_decides()
    {
        // A maximum of 3 dB relative over ±6 kHz: the trace reaches 5 dB at ±6 kHz, margin 3 − 5 = −2 dB there.
        var line = new LimitLineRule("mask", "mask", LimitBoundary.Upper, FrequencyAnchor.NominalOffset, LossReference.Relative, [-6e3, 6e3], [3, 3], 0.2);
        RuleResult r = Units.Only(Evaluate(line));
        Assert.Equal(5, r.MeasuredValue!.Value, 1e-9);
        Assert.Equal(3, r.LimitValue!.Value, 1e-12);
        Assert.Equal(-2, r.Margin!.Value, 1e-9);
        Assert.Equal(RuleOutcome.Fail, r.Outcome);
        Assert.Equal(449e3, r.AtHz); // the first of the two equally bad points
    }

    [Fact]
    public void Lower_line_interpolated_between_its_points()
    {
        // A minimum loss from 45 dB at −20 kHz to 5 dB at −10 kHz: L(d) = 5 + 4·(d − 10). Margin R − L is 20 at d = 10,
        // 25 at d = 15 and 50 − 45 = 5 at d = 20: the worst is at −20 kHz.
        var line = new LimitLineRule("mask", "mask", LimitBoundary.Lower, FrequencyAnchor.NominalOffset, LossReference.Relative, [-20e3, -10e3], [45, 5], 1);
        RuleResult r = Units.Only(Evaluate(line));
        Assert.Equal(5, r.Margin!.Value, 1e-9);
        Assert.Equal(435e3, r.AtHz);
        Assert.Equal(RuleOutcome.Pass, r.Outcome);
        Assert.Equal(LimitSense.AtLeast, r.Sense);
    }

    [Fact]
    public void Absolute_reference_compares_the_loss_as_measured()
    {
        // The same 3 dB line read as absolute loss: the flat 2 dB passes, ±6 kHz reads 7 dB: margin −4 dB.
        var line = new LimitLineRule("mask", "mask", LimitBoundary.Upper, FrequencyAnchor.NominalOffset, LossReference.Absolute, [-6e3, 6e3], [3, 3], 0.2);
        Assert.Equal(-4, Units.Only(Evaluate(line)).Margin!.Value, 1e-9);
    }

    [Fact]
    public void A_line_beyond_the_sweep_is_not_verifiable()
    {
        // Offsets from the measured centre (455 kHz): 605 to 705 kHz, past the 655 kHz sweep end.
        var line = new LimitLineRule("mask", "mask", LimitBoundary.Upper, FrequencyAnchor.MeasuredOffset, LossReference.Relative, [150e3, 250e3], [3, 3], 0.2);
        LimitTemplate template = Units.Template(DecisionRule.GuardedAcceptance, 455e3, 255e3, 655e3, [line]);
        RuleResult r = Units.Only(Units.Evaluate(template, Units.Scalar(Units.Trapezoid(455e3, 5e3, 15e3, 2, 52), Grid)));
        Assert.Equal(RuleOutcome.NotVerifiable, r.Outcome);
        Assert.Contains("reaches beyond the sweep", r.Message);
    }

    [Fact]
    public void Mask_lines_are_in_absolute_frequency_and_absolute_loss()
    {
        var line = new LimitLineRule("mask", "mask", LimitBoundary.Upper, FrequencyAnchor.NominalOffset, LossReference.Relative, [-6e3, 6e3], [3, 3], 0.2);
        var stop = new StopbandRejectionRule("reject", "reject", new FrequencyBand(FrequencyAnchor.NominalOffset, 100e3, 200e3), 35, LossReference.Relative, 1);
        UnitEvaluation e = Evaluate(line, stop);
        MaskLine mask = e.MaskLines.Single(m => m.RuleId == "mask");
        Assert.Equal(new[] { 449e3, 461e3 }, mask.FrequenciesHz.ToArray());
        Assert.Equal(new[] { 5.0, 5.0 }, mask.LossDb.ToArray()); // 3 dB relative + the unit's 2 dB minimum loss
        Assert.Equal(LimitBoundary.Upper, mask.Boundary);
        MaskLine box = e.MaskLines.Single(m => m.RuleId == "reject");
        Assert.Equal(new[] { 555e3, 655e3 }, box.FrequenciesHz.ToArray());
        Assert.Equal(new[] { 37.0, 37.0 }, box.LossDb.ToArray());
        Assert.Equal(LimitBoundary.Lower, box.Boundary);
    }
}
