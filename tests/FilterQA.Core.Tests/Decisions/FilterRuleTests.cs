using FilterQA.Core.Decisions;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;

namespace FilterQA.Core.Tests.Decisions;

// Each filter rule kind on hand-built piecewise-linear traces. Band edges are found by linear interpolation in dB
// against frequency (DOMAIN 4, fx = f1 + (X − A1)(f2 − f1)/(A2 − A1)), which is exact on a trace that is linear between
// the two straddling points, so the expected values below follow from the trace's corners alone.
public class FilterRuleTests
{
    private static readonly FrequencyGrid Grid = FrequencyGrid.Linear(255e3, 655e3, 2001); // 200 Hz step

    private static RuleResult One(LimitRule rule, Func<double, double> lossDb, DecisionRule decisionRule = DecisionRule.GuardedAcceptance,
        FrequencyGrid? grid = null, IReadOnlyList<double>? floor = null, double nominalHz = 455e3)
    {
        grid ??= Grid;
        LimitTemplate template = Units.Template(decisionRule, nominalHz, grid.StartHz, grid.StopHz, [rule]);
        return Units.Only(Units.Evaluate(template, Units.Scalar(lossDb, grid), floor: floor));
    }

    /// <summary>Symmetric about <paramref name="centreHz"/>, linear between (offset, loss) corners, flat beyond the last.</summary>
    private static Func<double, double> Piecewise(double centreHz, double[] offsetsHz, double[] lossDb) => hz =>
    {
        double d = Math.Abs(hz - centreHz);
        for (int k = 1; k < offsetsHz.Length; k++)
        {
            if (d <= offsetsHz[k])
            {
                return lossDb[k - 1] + (d - offsetsHz[k - 1]) * (lossDb[k] - lossDb[k - 1]) / (offsetsHz[k] - offsetsHz[k - 1]);
            }
        }
        return lossDb[^1];
    };

    [Fact]
    public void Centre_from_the_6_dB_edges_outside_its_tolerance_fails_with_the_margin_in_hertz()
    {
        // IL 4 dB flat ±5 kHz, rising 5 dB/kHz: the 6 dB points (10 dB loss) sit 5 + 6/5 = 6.2 kHz either side of 456.83 kHz.
        var rule = new CentreFrequencyRule("centre", "centre", 6, new FrequencyTolerance(1.5e3, ToleranceUnit.Hertz), CentreMethod.ArithmeticMean, 100);
        RuleResult r = One(rule, Units.Trapezoid(456.83e3, 5e3, 15e3, 4, 54));
        Assert.Equal(456.83e3, r.MeasuredValue!.Value, 1e-6);  // exact up to rounding: the straddling points lie on one skirt segment
        Assert.Equal(456.5e3, r.LimitValue);                   // deciding side: nominal + tolerance
        Assert.Equal(456.5e3 - 456.83e3, r.Margin!.Value, 1e-6); // −330 Hz, beyond w = 100 Hz
        Assert.Equal(RuleOutcome.Fail, r.Outcome);
        Assert.Equal("centre 456.83 kHz, limit 455.00 kHz ± 1.50 kHz", r.Message);
    }

    [Theory]
    [InlineData(455.0e3, RuleOutcome.Pass)]
    [InlineData(453.5e3, RuleOutcome.ConditionalPass)] // exactly TL on the low side
    [InlineData(453.45e3, RuleOutcome.ConditionalFail)]
    public void Centre_low_side_boundary_and_guard_band(double centreHz, RuleOutcome expected)
    {
        var rule = new CentreFrequencyRule("centre", "centre", 6, new FrequencyTolerance(1.5e3, ToleranceUnit.Hertz), CentreMethod.ArithmeticMean, 100);
        RuleResult r = One(rule, Units.Trapezoid(centreHz, 5e3, 15e3, 4, 54));
        Assert.Equal(expected, r.Outcome);
        // The nearer side decides: the margin is the smaller of (centre − 453.5 kHz) and (456.5 kHz − centre); 1e-6 Hz rounding.
        Assert.Equal(Math.Min(centreHz - 453.5e3, 456.5e3 - centreHz), r.Margin!.Value, 1e-6);
    }

    [Fact]
    public void Centre_tolerance_in_ppm_reports_the_deviation_in_ppm()
    {
        // Centre 455.0091 kHz: (455009.1 − 455000)/455000·10⁶ = 20.0 ppm; limit ±25 ppm → margin 5 ppm.
        var rule = new CentreFrequencyRule("centre", "centre", 6, new FrequencyTolerance(25, ToleranceUnit.PartsPerMillion), CentreMethod.ArithmeticMean, 1);
        RuleResult r = One(rule, Units.Trapezoid(455009.1, 5e3, 15e3, 4, 54));
        Assert.Equal(RuleUnit.PartsPerMillion, r.Unit);
        Assert.Equal(9.1 / 455000 * 1e6, r.MeasuredValue!.Value, 1e-6);
        Assert.Equal(25 - 9.1 / 455000 * 1e6, r.Margin!.Value, 1e-6);
        Assert.Equal(RuleOutcome.Pass, r.Outcome);
    }

    // A response that comes back up after its skirt: 2 dB flat to 5 kHz, 42 dB at 10 kHz, 45 dB at 12 kHz, down to 38 dB
    // at 14–16 kHz, 70 dB at 20 kHz. At 40 dB relative (42 dB loss) the innermost crossing is at 10 kHz (a sweep point),
    // the outermost at 16 + 4·(42 − 38)/(70 − 38) = 16.5 kHz.
    private static readonly Func<double, double> Lobed = Piecewise(455e3, [0, 5e3, 10e3, 12e3, 14e3, 16e3, 20e3], [2, 2, 42, 45, 38, 38, 70]);

    [Fact]
    public void Bandwidth_minimum_uses_the_innermost_crossings()
    {
        RuleResult r = One(new BandwidthRule("bw", "bw", 40, 21e3, null, 300), Lobed);
        Assert.Equal(20e3, r.MeasuredValue!.Value, 1e-6);
        Assert.Equal(-1e3, r.Margin!.Value, 1e-6); // 20 kHz against at least 21 kHz
        Assert.Equal(RuleOutcome.Fail, r.Outcome);
        Assert.Equal(LimitSense.AtLeast, r.Sense);
    }

    [Fact]
    public void Bandwidth_maximum_uses_the_outermost_crossings_and_a_two_sided_rule_reports_the_failing_side()
    {
        RuleResult r = One(new BandwidthRule("bw", "bw", 40, 15e3, 30e3, 300), Lobed);
        Assert.Equal(33e3, r.MeasuredValue!.Value, 1e-6); // 2 × 16.5 kHz
        Assert.Equal(30e3, r.LimitValue);
        Assert.Equal(-3e3, r.Margin!.Value, 1e-6);
        Assert.Equal(LimitSense.AtMost, r.Sense);
        Assert.Equal(RuleOutcome.Fail, r.Outcome);
    }

    [Fact]
    public void Bandwidth_whose_level_is_never_reached_is_not_verifiable()
    {
        RuleResult r = One(new BandwidthRule("bw", "bw", 80, 15e3, null, 300), Lobed); // 82 dB is never reached
        Assert.Equal(RuleOutcome.NotVerifiable, r.Outcome);
        Assert.Contains("neither edge at 80 dB", r.Message);
    }

    [Fact]
    public void Insertion_loss_at_nominal_is_interpolated_linearly_between_the_neighbouring_points()
    {
        // Loss (f/1 MHz)² dB on a 0.1 MHz grid; at 1.55 MHz the neighbours are 2.25 and 2.56 dB: linear 2.405 dB (true 2.4025).
        var grid = FrequencyGrid.Linear(1e6, 2e6, 11);
        RuleResult r = One(new InsertionLossRule("loss", "loss", 2.41, InsertionLossMeasure.AtNominal, null, 0.01),
            hz => (hz / 1e6) * (hz / 1e6), grid: grid, nominalHz: 1.55e6);
        Assert.Equal(2.405, r.MeasuredValue!.Value, 1e-12);
        Assert.Equal(0.005, r.Margin!.Value, 1e-12);
        Assert.Equal(RuleOutcome.ConditionalPass, r.Outcome); // inside TL by less than w = 0.01 dB
        Assert.Equal(1.55e6, r.AtHz);
    }

    [Fact]
    public void Insertion_loss_outside_the_sweep_is_not_verifiable()
    {
        var grid = FrequencyGrid.Linear(1e6, 2e6, 11);
        LimitTemplate template = Units.Template(DecisionRule.SimpleAcceptance, 1.5e6, 1e6, 2e6,
            [new InsertionLossRule("loss", "loss", 1, InsertionLossMeasure.AtFrequency, new AnchoredFrequency(FrequencyAnchor.MeasuredOffset, 2e6), 0.1)]);
        RuleResult r = Units.Only(Units.Evaluate(template, Units.Scalar(Units.Trapezoid(1.5e6, 0.1e6, 0.3e6, 1, 30), grid)));
        Assert.Equal(RuleOutcome.NotVerifiable, r.Outcome);
        Assert.Contains("outside the sweep", r.Message);
    }

    [Fact]
    public void Ripple_is_max_minus_min_over_the_band_points()
    {
        // 2 + 0.5·(Δf/5 kHz)² within ±5 kHz: the band's points include 455 kHz (2 dB) and ±5 kHz (2.5 dB), ripple 0.5 dB.
        RuleResult r = One(new PassbandRippleRule("ripple", "ripple", new FrequencyBand(FrequencyAnchor.NominalOffset, -5e3, 5e3), 0.45, 0.1),
            hz => 2 + 0.5 * Math.Pow((hz - 455e3) / 5e3, 2));
        Assert.Equal(0.5, r.MeasuredValue!.Value, 1e-9);
        Assert.Equal(-0.05, r.Margin!.Value, 1e-9);
        Assert.Equal(RuleOutcome.ConditionalFail, r.Outcome);
    }

    [Theory]
    [InlineData(LossReference.Relative, 34.0, RuleOutcome.ConditionalFail)] // 38 − 4 dB minimum loss; margin −1 = −w
    [InlineData(LossReference.Absolute, 38.0, RuleOutcome.Pass)]
    public void Stopband_rejection_relative_or_absolute(LossReference reference, double expected, RuleOutcome outcome)
    {
        double[] floor = Enumerable.Repeat(150.0, Grid.Count).ToArray(); // far below: no reading is near it
        RuleResult r = One(new StopbandRejectionRule("reject", "reject", new FrequencyBand(FrequencyAnchor.NominalOffset, -200e3, -100e3), 35, reference, 1),
            Units.Trapezoid(455e3, 5e3, 15e3, 4, 38), floor: floor);
        Assert.Equal(expected, r.MeasuredValue!.Value, 1e-12);
        Assert.Equal(expected - 35, r.Margin!.Value, 1e-12);
        Assert.Equal(outcome, r.Outcome);
        Assert.False(r.IsLowerBound);
        Assert.Equal(255e3, r.AtHz); // the first point of least loss in the band
        if (reference == LossReference.Relative)
        {
            Assert.Equal("rejection 34.0 dB at 255.00 kHz, limit 35 dB", r.Message);
        }
    }

    [Fact]
    public void Shape_factor_is_the_outermost_wide_bandwidth_over_the_innermost_narrow_one()
    {
        // 0 dB flat ±5 kHz, 10 dB/kHz skirt: BW(6 dB) = 2·5.6 = 11.2 kHz, BW(60 dB) = 2·11 = 22 kHz, ratio 1.9643.
        RuleResult r = One(new ShapeFactorRule("sf", "sf", 6, 60, 2.0, 0.05), Units.Trapezoid(455e3, 5e3, 15e3, 0, 100));
        Assert.Equal(22.0 / 11.2, r.MeasuredValue!.Value, 1e-9);
        Assert.Equal(2.0 - 22.0 / 11.2, r.Margin!.Value, 1e-9);
        Assert.Equal(RuleOutcome.ConditionalPass, r.Outcome);
    }

    [Fact]
    public void Spurious_response_is_measured_below_the_passband_and_the_skirt_is_not_one()
    {
        // 2 dB passband, 80 dB stopband with a response at +70 kHz reaching 57 dB loss: 55 dB below the passband.
        Func<double, double> filter = Units.Trapezoid(455e3, 5e3, 15e3, 2, 80);
        Func<double, double> spur = Units.Trapezoid(525e3, 0, 2e3, 57, 80);
        RuleResult r = One(new SpuriousResponseRule("spur", "spur", new FrequencyBand(FrequencyAnchor.NominalOffset, 12e3, 200e3), 60, 1.5),
            hz => Math.Min(filter(hz), spur(hz)), floor: Enumerable.Repeat(150.0, Grid.Count).ToArray());
        Assert.Equal(55, r.MeasuredValue!.Value, 1e-9);
        Assert.Equal(-5, r.Margin!.Value, 1e-9);
        Assert.Equal(525e3, r.AtHz);
        Assert.Equal(RuleOutcome.Fail, r.Outcome);
    }

    [Fact]
    public void Spurious_band_without_any_response_passes_with_nothing_measured()
    {
        RuleResult r = One(new SpuriousResponseRule("spur", "spur", new FrequencyBand(FrequencyAnchor.NominalOffset, 12e3, 200e3), 60, 1.5),
            Units.Trapezoid(455e3, 5e3, 15e3, 2, 80), floor: Enumerable.Repeat(150.0, Grid.Count).ToArray());
        Assert.Equal(RuleOutcome.Pass, r.Outcome);
        Assert.Null(r.MeasuredValue);
    }

    [Fact]
    public void Group_delay_variation_of_a_linear_delay_slope()
    {
        // φ(f) = −360°·τ0·(f − f0) − 180°·k·(f − f0)² gives τ = −(1/360°)·dφ/df = τ0 + k·(f − f0) (DOMAIN 4, τ = −dφ/dω).
        // A central difference is exact on a quadratic, so over ±450 kHz the variation is k·900 kHz = 45 ns.
        const double f0 = 70e6, tau0 = 1e-6, k = 50e-9 / 1e6;
        var grid = FrequencyGrid.Linear(60e6, 80e6, 2001);
        LimitTemplate template = Units.Template(DecisionRule.GuardedAcceptance, f0, 60e6, 80e6,
            [new GroupDelayVariationRule("gd", "gd", new FrequencyBand(FrequencyAnchor.NominalOffset, -450e3, 450e3), 60e-9, 100e3, 5e-9)], needsPhase: true);
        Sweep sweep = Units.Scalar(_ => 10, grid, hz => -360 * tau0 * (hz - f0) - 180 * k * (hz - f0) * (hz - f0));
        RuleResult r = Units.Only(Units.Evaluate(template, sweep));
        Assert.Equal(45e-9, r.MeasuredValue!.Value, 1e-12); // 0.001 ns: rounding of phases of up to 60 rad
        Assert.Equal(15e-9, r.Margin!.Value, 1e-12);
        Assert.Equal(RuleOutcome.Pass, r.Outcome);
        Assert.Equal(RuleUnit.Second, r.Unit);

        RuleResult noPhase = Units.Only(Units.Evaluate(template, Units.Scalar(_ => 10, grid)));
        Assert.Equal(RuleOutcome.NotVerifiable, noPhase.Outcome);
        Assert.Contains("no phase", noPhase.Message);
    }

    [Fact]
    public void Return_loss_per_port_and_missing_reflection()
    {
        // |S11| = |S22| = 0.2: RL = −20·log10(0.2) = 13.979 dB against at least 14 dB with U = 0.5 dB.
        var grid = FrequencyGrid.Linear(60e6, 80e6, 201);
        LimitTemplate template = Units.Template(DecisionRule.GuardedAcceptance, 70e6, 60e6, 80e6,
        [
            new ReturnLossRule("rl-in", "rl", new FrequencyBand(FrequencyAnchor.NominalOffset, -450e3, 450e3), 14, 1, 0.5),
            new ReturnLossRule("rl-out", "rl", new FrequencyBand(FrequencyAnchor.NominalOffset, -450e3, 450e3), 13, 2, 0.5),
        ], needsS11: true, needsS22: true);
        UnitEvaluation e = Units.Evaluate(template, Units.TwoPort(grid, _ => 0.9, _ => 0.2));
        double rl = -20 * Math.Log10(0.2);
        Assert.Equal(rl, e.Rules[0].MeasuredValue!.Value, 1e-9);
        Assert.Equal(rl - 14, e.Rules[0].Margin!.Value, 1e-9);
        Assert.Equal(RuleOutcome.ConditionalFail, e.Rules[0].Outcome);
        Assert.Equal(rl - 13, e.Rules[1].Margin!.Value, 1e-9);
        Assert.Equal(RuleOutcome.Pass, e.Rules[1].Outcome);

        UnitEvaluation scalar = Units.Evaluate(template, Units.Scalar(_ => 1, grid));
        Assert.All(scalar.Rules, r => Assert.Equal(RuleOutcome.NotVerifiable, r.Outcome));
        Assert.Contains("no S11", scalar.Rules[0].Message);
        Assert.Contains("no S22", scalar.Rules[1].Message);
    }

    [Fact]
    public void A_measured_offset_band_follows_the_measured_centre()
    {
        // Centre 458 kHz: a ripple band of ±5 kHz around it is flat (0 dB ripple), one around the nominal 455 kHz is not.
        Func<double, double> filter = Units.Trapezoid(458e3, 5e3, 15e3, 2, 52);
        var following = new PassbandRippleRule("r1", "r", new FrequencyBand(FrequencyAnchor.MeasuredOffset, -5e3, 5e3), 1, 0.1);
        var fixedBand = new PassbandRippleRule("r2", "r", new FrequencyBand(FrequencyAnchor.NominalOffset, -5e3, 5e3), 1, 0.1);
        LimitTemplate template = Units.Template(DecisionRule.GuardedAcceptance, 455e3, 255e3, 655e3, [following, fixedBand]);
        UnitEvaluation e = Units.Evaluate(template, Units.Scalar(filter, Grid));
        Assert.Equal(0, e.Rules[0].MeasuredValue!.Value, 1e-12);
        Assert.Equal(5 * 3, e.Rules[1].MeasuredValue!.Value, 1e-9); // 450 kHz is 3 kHz into the 5 dB/kHz skirt below 453 kHz
    }
}
