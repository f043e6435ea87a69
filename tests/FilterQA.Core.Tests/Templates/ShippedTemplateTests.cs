using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;
using FilterQA.Core.Templates.Text;

namespace FilterQA.Core.Tests.Templates;

/// <summary>The six demo templates in limit-templates/ load, round-trip and state the scenario's demo limits.</summary>
public sealed class ShippedTemplateTests
{
    public static TheoryData<string> Parts => new(TemplateSamples.ShippedParts);

    [Theory]
    [MemberData(nameof(Parts))]
    public void Shipped_template_loads_with_no_problems_and_is_released_by_the_quality_engineer(string part)
    {
        TemplateReadResult result = LimitTemplateReader.ReadFile(TemplateSamples.ShippedPath(part));

        Assert.Empty(result.Problems);
        LimitTemplate template = result.Template!;
        Assert.Equal(part, template.PartNumber);
        Assert.Equal(TemplateStatus.Released, template.Status);
        Assert.Equal("J. Lindqvist", template.Author);
        Assert.NotNull(template.ReleaseDate);
    }

    [Theory]
    [MemberData(nameof(Parts))]
    public void Shipped_template_round_trips_through_the_writer(string part)
    {
        LimitTemplate original = LimitTemplateReader.ReadFile(TemplateSamples.ShippedPath(part)).Template!;

        TemplateReadResult again = LimitTemplateReader.Read(LimitTemplateWriter.Write(original));

        Assert.Empty(again.Problems);
        Assert.Equal(original.Rules, again.Template!.Rules);
        Assert.Equal(original.Sweep, again.Template.Sweep);
        Assert.Equal(original.ContentHash, again.Template.ContentHash);
    }

    [Fact]
    public void There_is_one_file_per_demo_part_and_no_other()
    {
        string[] files = Directory.GetFiles(TemplateSamples.Folder, "*.yaml").Select(Path.GetFileNameWithoutExtension).Order(StringComparer.Ordinal).ToArray()!;

        Assert.Equal(TemplateSamples.ShippedParts.Order(StringComparer.Ordinal), files);
    }

    // Expected values are the demo limits of the scenario's part table (SCENARIO.md, "Part numbers and their
    // specifications"), written here in SI units. Compared exactly: the reader scales the decimal text before one
    // conversion to double, so it yields the double nearest the written value, which is what the literal is.
    public static TheoryData<string, string, string, double> ScenarioLimits => new()
    {
        { "TME-CF455-15", "centre", "tolerance", 1.5e3 },
        { "TME-CF455-15", "centre", "level", 6 },
        { "TME-CF455-15", "bw-6db", "minimum", 15e3 },
        { "TME-CF455-15", "bw-40db", "maximum", 30e3 },
        { "TME-CF455-15", "loss", "maximum", 6 },
        { "TME-CF455-15", "ripple", "maximum", 2 },
        { "TME-CF455-15", "ripple", "stop", 5e3 },
        { "TME-CF455-15", "reject-low", "stop", -100e3 },
        { "TME-CF455-15", "reject-high", "start", 100e3 },
        { "TME-CF455-15", "reject-high", "minimum", 35 },
        { "TME-XF21M4-15", "bw-3db", "minimum", 15e3 },
        { "TME-XF21M4-15", "bw-40db", "maximum", 50e3 },
        { "TME-XF21M4-15", "loss", "maximum", 3 },
        { "TME-XF21M4-15", "ripple", "maximum", 1 },
        { "TME-XF21M4-15", "ripple", "stop", 6e3 },
        { "TME-XF21M4-15", "reject-high", "minimum", 70 },
        { "TME-XF21M4-15", "reject-high", "start", 100e3 },
        { "TME-XF21M4-15", "spurious", "minimum", 60 },
        { "TME-XF21M4-15", "spurious", "stop", 1e6 },
        { "TME-SF70M-1M2", "bw-1db", "minimum", 1.0e6 },
        { "TME-SF70M-1M2", "bw-3db", "minimum", 1.1e6 },
        { "TME-SF70M-1M2", "bw-3db", "maximum", 1.4e6 },
        { "TME-SF70M-1M2", "loss", "maximum", 22 },
        { "TME-SF70M-1M2", "ripple", "maximum", 0.8 },
        { "TME-SF70M-1M2", "ripple", "stop", 0.45e6 },
        { "TME-SF70M-1M2", "group-delay", "maximum", 60e-9 },
        { "TME-SF70M-1M2", "group-delay", "stop", 0.45e6 },
        { "TME-SF70M-1M2", "reject-high", "start", 3e6 },
        { "TME-SF70M-1M2", "reject-high", "minimum", 45 },
        { "TME-SF70M-1M2", "return-loss-in", "minimum", 10 },
        { "TME-SF70M-1M2", "return-loss-out", "minimum", 10 },
        { "TME-SF162-AIS", "bw-3db", "minimum", 2.0e6 },
        { "TME-SF162-AIS", "loss", "maximum", 3.5 },
        { "TME-SF162-AIS", "ripple", "start", 161.5e6 },
        { "TME-SF162-AIS", "ripple", "stop", 162.5e6 },
        { "TME-SF162-AIS", "ripple", "maximum", 1 },
        { "TME-SF162-AIS", "reject-marine", "start", 156.0e6 },
        { "TME-SF162-AIS", "reject-marine", "stop", 157.5e6 },
        { "TME-SF162-AIS", "reject-marine", "minimum", 40 },
        { "TME-SF162-AIS", "reject-high", "start", 170e6 },
        { "TME-SF162-AIS", "reject-high", "minimum", 45 },
        { "TME-XR24M-18", "fs", "tolerance", 20 },
        { "TME-XR24M-18", "r1", "maximum", 40 },
        { "TME-XR24M-18", "c0", "maximum", 5e-12 },
        { "TME-XR24M-18", "q-unloaded", "minimum", 30000 },
        { "TME-XR24M-18", "unwanted-modes", "minimum", 6 },
        { "TME-XR24M-18", "unwanted-modes", "stop", 500e3 },
        { "TME-LC92-TRAP", "notch", "tolerance", 2e6 },
        { "TME-LC92-TRAP", "depth", "minimum", 25 },
        { "TME-LC92-TRAP", "loss-80", "maximum", 1 },
        { "TME-LC92-TRAP", "loss-80", "at", 80e6 },
        { "TME-LC92-TRAP", "loss-104", "maximum", 1 },
        { "TME-LC92-TRAP", "loss-104", "at", 104e6 },
    };

    [Theory]
    [MemberData(nameof(ScenarioLimits))]
    public void Shipped_template_states_the_scenario_demo_limit(string part, string ruleId, string field, double expected)
    {
        LimitTemplate template = LimitTemplateReader.ReadFile(TemplateSamples.ShippedPath(part)).Template!;
        LimitRule rule = template.FindRule(ruleId) ?? throw new InvalidOperationException($"{part} has no rule {ruleId}");

        double actual = (rule, field) switch
        {
            (CentreFrequencyRule r, "tolerance") => r.Tolerance.Value,
            (CentreFrequencyRule r, "level") => r.LevelDb,
            (BandwidthRule r, "minimum") => r.MinimumHz!.Value,
            (BandwidthRule r, "maximum") => r.MaximumHz!.Value,
            (InsertionLossRule r, "maximum") => r.MaximumDb,
            (InsertionLossRule r, "at") => r.At!.ValueHz,
            (PassbandRippleRule r, "maximum") => r.MaximumDb,
            (PassbandRippleRule r, "start") => r.Band.StartHz,
            (PassbandRippleRule r, "stop") => r.Band.StopHz,
            (StopbandRejectionRule r, "minimum") => r.MinimumDb,
            (StopbandRejectionRule r, "start") => r.Band.StartHz,
            (StopbandRejectionRule r, "stop") => r.Band.StopHz,
            (SpuriousResponseRule r, "minimum") => r.MinimumSuppressionDb,
            (SpuriousResponseRule r, "stop") => r.Band.StopHz,
            (GroupDelayVariationRule r, "maximum") => r.MaximumS,
            (GroupDelayVariationRule r, "stop") => r.Band.StopHz,
            (ReturnLossRule r, "minimum") => r.MinimumDb,
            (SeriesResonanceRule r, "tolerance") => r.Tolerance.Value,
            (MotionalResistanceRule r, "maximum") => r.MaximumOhm,
            (ShuntCapacitanceRule r, "maximum") => r.MaximumF,
            (UnloadedQRule r, "minimum") => r.MinimumQ,
            (UnwantedModesRule r, "minimum") => r.MinimumSuppressionDb,
            (UnwantedModesRule r, "stop") => r.Window.StopHz,
            (NotchFrequencyRule r, "tolerance") => r.Tolerance.Value,
            (NotchDepthRule r, "minimum") => r.MinimumDb,
            _ => throw new InvalidOperationException($"no accessor for {rule.GetType().Name}.{field}"),
        };

        Assert.Equal(expected, actual);
    }

    [Fact]
    public void Demo_nominal_frequencies_and_tolerance_units_match_the_scenario()
    {
        // SCENARIO.md part table: 455 kHz, 21.4 MHz, 70 MHz, 162.0 MHz, 24.000 MHz, 92 MHz; the resonator is ±20 ppm.
        double[] expected = [455e3, 21.4e6, 70e6, 162e6, 24e6, 92e6];
        double[] nominal = TemplateSamples.ShippedParts.Select(part => LimitTemplateReader.ReadFile(TemplateSamples.ShippedPath(part)).Template!.NominalHz).ToArray();

        Assert.Equal(expected, nominal);
        var resonator = LimitTemplateReader.ReadFile(TemplateSamples.ShippedPath("TME-XR24M-18")).Template!;
        Assert.Equal(ToleranceUnit.PartsPerMillion, ((SeriesResonanceRule)resonator.FindRule("fs")!).Tolerance.Unit);
    }

    [Fact]
    public void Crystal_resonator_sweep_resolves_its_narrowest_resonance_to_a_tenth()
    {
        // Series fixture, DOMAIN section 3: QL = Qu·R1/(R1 + 2·Z0) with Z0 = 50 ohm; at the template's own limits
        // Qu = 30 000 and R1 = 40 ohm, B = fs/QL. Peak error stays small for a step of B/10 or less (DOMAIN section 4).
        LimitTemplate template = LimitTemplateReader.ReadFile(TemplateSamples.ShippedPath("TME-XR24M-18")).Template!;
        double loadedQ = 30000 * 40 / (40 + 100.0);
        double bandwidthHz = 24e6 / loadedQ;

        Assert.True(template.Sweep.MaximumStepHz <= bandwidthHz / 10, $"step {template.Sweep.MaximumStepHz} Hz against B/10 = {bandwidthHz / 10} Hz");
        Assert.True(template.Sweep.NeedsPhase);
    }

    [Fact]
    public void Ceramic_filter_sweep_spans_255_to_655_kHz()
    {
        LimitTemplate template = LimitTemplateReader.ReadFile(TemplateSamples.ShippedPath("TME-CF455-15")).Template!;

        Assert.Equal(255e3, template.Sweep.SpanStartHz);
        Assert.Equal(655e3, template.Sweep.SpanStopHz);
    }
}
