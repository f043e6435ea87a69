using System.Collections.Immutable;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;
using FilterQA.Core.Tests.Conventions;

namespace FilterQA.Core.Tests.Templates;

/// <summary>Shared inputs for the template tests: the shipped files and small templates built in code.</summary>
internal static class TemplateSamples
{
    internal static readonly string[] ShippedParts =
        ["TME-CF455-15", "TME-XF21M4-15", "TME-SF70M-1M2", "TME-SF162-AIS", "TME-XR24M-18", "TME-LC92-TRAP"];

    internal static string Folder => Path.Combine(DependencyDirectionTests.RepositoryRoot(), "limit-templates");

    internal static string ShippedPath(string part) => Path.Combine(Folder, part + ".yaml");

    /// <summary>A valid draft text; each malformed-template row changes one line of it.</summary>
    internal const string ValidDraft = """
        format-version: 1
        part: TEST-BP-1
        revision: 3
        description: Test bandpass filter
        device: bandpass-filter
        nominal: 10.7 MHz
        status: draft
        author: Test Author
        decision-rule: guarded-acceptance
        sweep:
          start: 9.7 MHz
          stop: 11.7 MHz
          narrowest-feature: 100 kHz
          points-per-feature: 20
          max-thru-age: 8 h
          needs-phase: true
          needs-s11: true
          needs-s22: false
        rules:
          - id: centre
            kind: centre-frequency
            title: Centre frequency within 30 kHz
            level: 3 dB
            method: arithmetic-mean
            tolerance: 30 kHz
            uncertainty: 2 kHz
          - id: bw-3db
            kind: bandwidth
            title: 3 dB bandwidth 200 kHz to 300 kHz
            level: 3 dB
            minimum: 200 kHz
            maximum: 300 kHz
            uncertainty: 5 kHz
          - id: ripple
            kind: passband-ripple
            title: Ripple at most 1 dB within 50 kHz of nominal
            anchor: nominal-offset
            start: -50 kHz
            stop: 50 kHz
            maximum: 1 dB
            uncertainty: 0.1 dB
          - id: reject
            kind: stopband-rejection
            title: Rejection at least 30 dB below 10.2 MHz
            anchor: absolute
            start: 9.7 MHz
            stop: 10.2 MHz
            reference: relative
            minimum: 30 dB
            uncertainty: 1 dB
          - id: gd
            kind: group-delay-variation
            title: Group-delay variation at most 200 ns in band
            anchor: measured-offset
            start: -50 kHz
            stop: 50 kHz
            aperture: 10 kHz
            maximum: 200 ns
            uncertainty: 10 ns
          - id: rl
            kind: return-loss
            title: Input return loss at least 12 dB in band
            port: 1
            anchor: nominal-offset
            start: -50 kHz
            stop: 50 kHz
            minimum: 12 dB
            uncertainty: 0.5 dB
          - id: mask
            kind: limit-line
            title: Upper mask of the skirts
            boundary: upper
            anchor: measured-offset
            reference: relative
            points:
              - [-150 kHz, 60 dB]
              - [-100 kHz, 3 dB]
              - [100 kHz, 3 dB]
              - [150 kHz, 60 dB]
            uncertainty: 0.5 dB

        """;

    private static SweepRequirements WideSweep(double startHz, double stopHz, bool phase = true) =>
        new(startHz, stopHz, 1e3, 10, 3600, phase, true, true);

    /// <summary>Three templates that together hold every rule kind (each kind fits only some devices).</summary>
    internal static LimitTemplate[] EveryRuleKind()
    {
        var bandpass = LimitTemplate.Create("RT-BP", 1, "Round-trip bandpass: every filter rule", DeviceKind.BandpassFilter, 21.4e6,
            TemplateStatus.Released, "J. Lindqvist", new DateOnly(2025, 10, 1), WideSweep(20e6, 23e6), DecisionRule.GuardedAcceptance,
        [
            new CentreFrequencyRule("centre", "Centre: title with a colon: and # hash", 6, new FrequencyTolerance(1.5e3, ToleranceUnit.Hertz), CentreMethod.GeometricMean, 100),
            new CentreFrequencyRule("centre-ppm", "Centre in ppm", 3, new FrequencyTolerance(25, ToleranceUnit.PartsPerMillion), CentreMethod.ArithmeticMean, 0.5),
            new BandwidthRule("bw-min", "Minimum only", 3, 15e3, null, 100),
            new BandwidthRule("bw-max", "Maximum only", 40, null, 50e3, 300),
            new BandwidthRule("bw-both", "Both limits", 1, 1.1e6, 1.4e6, 1e4),
            new InsertionLossRule("il-min", "Minimum loss", 3, InsertionLossMeasure.MinimumLoss, null, 0.2),
            new InsertionLossRule("il-nom", "Loss at nominal", 3.5, InsertionLossMeasure.AtNominal, null, 0.2),
            new InsertionLossRule("il-at", "Loss at an offset", 4, InsertionLossMeasure.AtFrequency, new AnchoredFrequency(FrequencyAnchor.NominalOffset, -12.5e3), 0.25),
            new PassbandRippleRule("ripple", "Ripple", new FrequencyBand(FrequencyAnchor.NominalOffset, -6e3, 6e3), 1, 0.1),
            new StopbandRejectionRule("rej-rel", "Relative rejection", new FrequencyBand(FrequencyAnchor.Absolute, 20e6, 21.3e6), 70, LossReference.Relative, 1.5),
            new StopbandRejectionRule("rej-abs", "Absolute rejection", new FrequencyBand(FrequencyAnchor.MeasuredOffset, 100e3, 1e6), 72.5, LossReference.Absolute, 1.5),
            new ShapeFactorRule("shape", "Shape factor 60/6", 6, 60, 2.5, 0.05),
            new SpuriousResponseRule("spur", "Spurious", new FrequencyBand(FrequencyAnchor.NominalOffset, 25e3, 1e6), 60, 1.5),
            new GroupDelayVariationRule("gd", "Group delay", new FrequencyBand(FrequencyAnchor.NominalOffset, -4.5e3, 4.5e3), 60e-6, 125, 5e-9),
            new GroupDelayVariationRule("gd-raw", "Group delay, no smoothing", new FrequencyBand(FrequencyAnchor.NominalOffset, -4.5e3, 4.5e3), 1.25e-7, 0, 0),
            new ReturnLossRule("rl-1", "Input return loss", new FrequencyBand(FrequencyAnchor.NominalOffset, -5e3, 5e3), 10, 1, 0.5),
            new ReturnLossRule("rl-2", "Output return loss", new FrequencyBand(FrequencyAnchor.NominalOffset, -5e3, 5e3), 14, 2, 0.5),
            new LimitLineRule("upper", "Upper mask", LimitBoundary.Upper, FrequencyAnchor.MeasuredOffset, LossReference.Relative,
                [-50e3, -10e3, 10e3, 50e3], [60, 3, 3, 60], 0.5),
            new LimitLineRule("lower", "Lower mask, absolute", LimitBoundary.Lower, FrequencyAnchor.Absolute, LossReference.Absolute,
                [21.3e6, 21.5e6], [0, 0.3], 0.2),
        ]);
        var bandStop = LimitTemplate.Create("RT-BS", 2, "Round-trip trap: every band-stop rule", DeviceKind.BandStop, 92e6,
            TemplateStatus.Draft, null, null, WideSweep(70e6, 114e6), DecisionRule.SimpleAcceptance,
        [
            new NotchFrequencyRule("notch", "Notch frequency", new FrequencyTolerance(2e6, ToleranceUnit.Hertz), 1e5),
            new NotchFrequencyRule("notch-ppm", "Notch frequency in ppm", new FrequencyTolerance(15000, ToleranceUnit.PartsPerMillion), 500),
            new NotchDepthRule("depth", "Depth relative", 25, LossReference.Relative, 1),
            new NotchDepthRule("depth-abs", "Depth absolute", 26.5, LossReference.Absolute, 1),
            new InsertionLossRule("loss-80", "Loss at 80 MHz", 1, InsertionLossMeasure.AtFrequency, new AnchoredFrequency(FrequencyAnchor.Absolute, 80e6), 0.15),
            new GroupDelayVariationRule("gd", "Group delay in the pass band", new FrequencyBand(FrequencyAnchor.Absolute, 70e6, 80e6), 2e-9, 1e6, 1e-10),
        ]);
        var resonator = LimitTemplate.Create("RT-XR", 1, "Round-trip resonator: every resonator rule", DeviceKind.Resonator, 24e6,
            TemplateStatus.Withdrawn, "S. Petrova", new DateOnly(2024, 2, 29), WideSweep(23.9e6, 24.6e6), DecisionRule.GuardedAcceptance,
        [
            new SeriesResonanceRule("fs", "Series resonance ±20 ppm (25 °C)", new FrequencyTolerance(20, ToleranceUnit.PartsPerMillion), 0.5),
            new SeriesResonanceRule("fs-hz", "Series resonance ±480 Hz", new FrequencyTolerance(480, ToleranceUnit.Hertz), 12.5),
            new MotionalResistanceRule("r1", "R1", 40, 1.5),
            new ShuntCapacitanceRule("c0", "C0", 5e-12, 2e-13),
            new UnloadedQRule("qu", "Qu", 30000, 1500),
            new UnwantedModesRule("modes", "Unwanted modes", new FrequencyBand(FrequencyAnchor.MeasuredOffset, 0, 500e3), 6, 0.5),
            new ReturnLossRule("rl", "Return loss", new FrequencyBand(FrequencyAnchor.Absolute, 23.9e6, 24.1e6), 3, 1, 0.3),
            new LimitLineRule("line", "A line", LimitBoundary.Upper, FrequencyAnchor.NominalOffset, LossReference.Absolute,
                ImmutableArray.Create(-1e3, 1e3).AsSpan(), ImmutableArray.Create(3.0, 3.0).AsSpan(), 0.1),
        ]);
        return [bandpass, bandStop, resonator];
    }

    /// <summary>1-based number of the last line of <paramref name="text"/> that contains <paramref name="fragment"/>.</summary>
    internal static int LastLineOf(string text, string fragment)
    {
        string[] lines = text.Split('\n');
        for (int i = lines.Length - 1; i >= 0; i--)
        {
            if (lines[i].Contains(fragment, StringComparison.Ordinal))
            {
                return i + 1;
            }
        }
        throw new ArgumentException($"'{fragment}' is not in the text");
    }

    /// <summary>1-based number of the first line of <paramref name="text"/> that contains <paramref name="fragment"/>.</summary>
    internal static int LineOf(string text, string fragment)
    {
        string[] lines = text.Split('\n');
        for (int i = 0; i < lines.Length; i++)
        {
            if (lines[i].Contains(fragment, StringComparison.Ordinal))
            {
                return i + 1;
            }
        }
        throw new ArgumentException($"'{fragment}' is not in the text");
    }
}
