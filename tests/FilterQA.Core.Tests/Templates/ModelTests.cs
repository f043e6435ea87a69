using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;
using FilterQA.Core.Templates.Text;

namespace FilterQA.Core.Tests.Templates;

/// <summary>The model's own arithmetic and its validation when made.</summary>
public sealed class ModelTests
{
    [Fact]
    public void Ppm_tolerance_converts_to_hertz_at_the_nominal()
    {
        // Definition of ppm: 1e-6 of the reference; 20 ppm of 24 MHz.
        double expectedHz = 20 * 1e-6 * 24e6;

        double actual = new FrequencyTolerance(20, ToleranceUnit.PartsPerMillion).ToHz(24e6);

        Assert.Equal(expectedHz, actual, 1e-9); // 1e-9 Hz: only rounding of the two products differs
    }

    [Fact]
    public void Band_resolves_against_its_anchor()
    {
        var band = new FrequencyBand(FrequencyAnchor.MeasuredOffset, -5e3, 5e3);
        var nominal = new FrequencyBand(FrequencyAnchor.NominalOffset, -5e3, 5e3);
        var absolute = new FrequencyBand(FrequencyAnchor.Absolute, 450e3, 460e3);

        // Exact: each is one addition of numbers that are exact in binary (multiples of 500 Hz below 2^53).
        Assert.Equal((450.5e3, 460.5e3), band.Resolve(455e3, 455.5e3));
        Assert.Equal((450e3, 460e3), nominal.Resolve(455e3, 455.5e3));
        Assert.Equal((450e3, 460e3), absolute.Resolve(1, 2));
    }

    [Theory]
    [InlineData(FrequencyAnchor.Absolute, 10.0, 10.0)]
    [InlineData(FrequencyAnchor.Absolute, 11.0, 10.0)]
    [InlineData(FrequencyAnchor.Absolute, -1.0, 10.0)]
    [InlineData(FrequencyAnchor.NominalOffset, double.NaN, 10.0)]
    [InlineData(FrequencyAnchor.NominalOffset, 0.0, double.PositiveInfinity)]
    public void Band_that_breaks_a_rule_cannot_be_made(FrequencyAnchor anchor, double startHz, double stopHz)
    {
        Assert.Throws<ArgumentException>(() => new FrequencyBand(anchor, startHz, stopHz));
    }

    [Fact]
    public void Guard_band_is_the_uncertainty_under_guarded_acceptance_and_zero_under_simple()
    {
        // ILAC-G8:09/2019, worked example 8 of DOMAIN section 9: IL <= 4.0 dB, U = 0.25 dB -> acceptance limit 3.75 dB.
        LimitTemplate guarded = TemplateSamples.EveryRuleKind()[0];
        var rule = new InsertionLossRule("il", "IL", 4.0, InsertionLossMeasure.MinimumLoss, null, 0.25);
        LimitTemplate simple = guarded.NewRevision(edit => edit.DecisionRule = DecisionRule.SimpleAcceptance);

        Assert.Equal(3.75, rule.MaximumDb - guarded.GuardBandFor(rule), 1e-12); // 1e-12 dB: one subtraction of exact binary fractions
        Assert.Equal(0, simple.GuardBandFor(rule));
    }

    [Fact]
    public void Limit_line_interpolates_linearly_in_dB_and_is_undefined_outside()
    {
        var line = new LimitLineRule("mask", "Mask", LimitBoundary.Upper, FrequencyAnchor.NominalOffset, LossReference.Relative,
            [-20e3, -10e3, 10e3, 20e3], [40, 3, 3, 40], 0.5);
        // Linear interpolation a1 + (f - f1)(a2 - a1)/(f2 - f1): at -15 kHz between (-20 kHz, 40) and (-10 kHz, 3).
        double expected = 40 + (-15e3 - -20e3) * (3 - 40) / (-10e3 - -20e3);

        Assert.Equal(expected, line.BoundaryDbAt(-15e3), 1e-12); // 1e-12 dB: same formula, rounding only
        Assert.Equal(3, line.BoundaryDbAt(0), 1e-12);
        Assert.Equal(40, line.BoundaryDbAt(20e3), 1e-12);
        Assert.True(double.IsNaN(line.BoundaryDbAt(20.001e3)));
        Assert.True(double.IsNaN(line.BoundaryDbAt(double.NaN)));
    }

    [Fact]
    public void Limit_line_equality_compares_the_points()
    {
        LimitLineRule Make(double last) => new("mask", "Mask", LimitBoundary.Lower, FrequencyAnchor.Absolute, LossReference.Absolute,
            [1e6, 2e6], [0.5, last], 0.1);

        Assert.Equal(Make(1), Make(1));
        Assert.Equal(Make(1).GetHashCode(), Make(1).GetHashCode());
        Assert.NotEqual(Make(1), Make(2));
    }

    [Fact]
    public void Sweep_requirements_give_the_largest_step()
    {
        var sweep = new SweepRequirements(255e3, 655e3, 10e3, 50, 8 * 3600, false, false, false);

        Assert.Equal(10e3 / 50, sweep.MaximumStepHz);
    }

    [Fact]
    public void Rule_validation_names_what_is_wrong()
    {
        Assert.Contains("minimum, a maximum or both", Assert.Throws<ArgumentException>(() => new BandwidthRule("bw", "BW", 3, null, null, 0)).Message, StringComparison.Ordinal);
        Assert.Contains("above the maximum", Assert.Throws<ArgumentException>(() => new BandwidthRule("bw", "BW", 3, 2e3, 1e3, 0)).Message, StringComparison.Ordinal);
        Assert.Contains("above the pass level", Assert.Throws<ArgumentException>(() => new ShapeFactorRule("sf", "SF", 60, 6, 2, 0)).Message, StringComparison.Ordinal);
        Assert.Contains("needs that frequency", Assert.Throws<ArgumentException>(() => new InsertionLossRule("il", "IL", 1, InsertionLossMeasure.AtFrequency, null, 0)).Message, StringComparison.Ordinal);
        Assert.Contains("port 1 (S11) or port 2", Assert.Throws<ArgumentException>(() => new ReturnLossRule("rl", "RL", new FrequencyBand(FrequencyAnchor.Absolute, 1, 2), 10, 3, 0)).Message, StringComparison.Ordinal);
        Assert.Contains("short name", Assert.Throws<ArgumentException>(() => new UnloadedQRule("Q U", "Q", 1, 0)).Message, StringComparison.Ordinal);
        Assert.Contains("must not be empty", Assert.Throws<ArgumentException>(() => new UnloadedQRule("qu", " ", 1, 0)).Message, StringComparison.Ordinal);
        Assert.Contains("zero or more", Assert.Throws<ArgumentException>(() => new MotionalResistanceRule("r1", "R1", 40, -1)).Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Every_rule_kind_has_a_file_word_and_a_field_list()
    {
        foreach (RuleKind kind in Enum.GetValues<RuleKind>())
        {
            Assert.True(Words.TryRead(Words.Of(kind), out RuleKind back));
            Assert.Equal(kind, back);
            Assert.True(RuleKeys.ByKind.ContainsKey(kind), kind.ToString());
        }
        Assert.Equal("unloaded-q", Words.Of(RuleKind.UnloadedQ));
        Assert.Equal("bandpass-filter", Words.Of(DeviceKind.BandpassFilter));
    }
}
