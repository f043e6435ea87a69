using System.Text;
using FilterQA.Core.Templates;

namespace FilterQA.Web.Ui.Services;

/// <summary>
/// The form's fields per section and rule kind, in the order of the template text (see limit-templates/README.md for
/// what each field means). The text reader stays the judge of validity; these specs give labels, units and the checks
/// made as a value is typed.
/// </summary>
public static class TemplateFieldSpecs
{
    private static readonly IReadOnlyList<(string, decimal)> None = [];
    private static readonly IReadOnlyList<string> NoWords = [];

    /// <summary>Editable top-level fields (part, revision, status and device are fixed by the draft being edited).</summary>
    public static readonly IReadOnlyList<FieldSpec> Header =
    [
        Text("description", "Description"),
        Quantity("nominal", "Nominal frequency", FieldUnits.Frequency, FieldSign.Positive),
        Text("author", "Author (optional; set when released)", optional: true),
        Word<DecisionRule>("decision-rule", "Decision rule (guarded: a pass needs a margin of at least the uncertainty)"),
    ];

    /// <summary>The sweep section: what a sweep must cover and hold to be judged.</summary>
    public static readonly IReadOnlyList<FieldSpec> Sweep =
    [
        Quantity("start", "Sweep must start at or below", FieldUnits.Frequency, FieldSign.NonNegative),
        Quantity("stop", "Sweep must stop at or above", FieldUnits.Frequency, FieldSign.Positive),
        Quantity("narrowest-feature", "Narrowest feature", FieldUnits.Frequency, FieldSign.Positive),
        new("points-per-feature", "Points across the narrowest feature", FieldType.Integer, None, NoWords, FieldSign.Positive),
        Quantity("max-thru-age", "Oldest thru accepted", FieldUnits.Duration, FieldSign.Positive),
        Flag("needs-phase", "Needs the transmission phase"),
        Flag("needs-s11", "Needs S11"),
        Flag("needs-s22", "Needs S22"),
    ];

    /// <summary>A limit line point's frequency (offset or absolute, by the rule's anchor).</summary>
    public static readonly FieldSpec PointFrequency = Quantity("frequency", "Frequency", FieldUnits.Frequency, FieldSign.Any);

    /// <summary>A limit line point's loss.</summary>
    public static readonly FieldSpec PointLoss = Quantity("loss", "Loss (dB, positive = attenuation)", FieldUnits.Level, FieldSign.NonNegative);

    /// <summary>The words a text field for the rule kind takes (as the text writes them).</summary>
    public static string WordOf<T>(T value) where T : struct, Enum => Hyphenate(value.ToString());

    /// <summary>The rule's fields after id and title, in the order of the text, the uncertainty last.</summary>
    public static IReadOnlyList<FieldSpec> For(RuleKind kind)
    {
        FieldSpec[] band =
        [
            Word<FrequencyAnchor>("anchor", "Frequencies are"),
            Quantity("start", "Band start", FieldUnits.Frequency, FieldSign.Any),
            Quantity("stop", "Band stop", FieldUnits.Frequency, FieldSign.Any),
        ];
        FieldSpec dbU = Quantity("uncertainty", "Uncertainty (dB)", FieldUnits.Level, FieldSign.NonNegative);
        FieldSpec toleranceU = Quantity("uncertainty", "Uncertainty (same unit as the tolerance)", FieldUnits.Tolerance, FieldSign.NonNegative);
        FieldSpec edge = Quantity("level", "Edge level (dB of loss below the passband minimum)", FieldUnits.Level, FieldSign.Positive);
        return kind switch
        {
            RuleKind.CentreFrequency =>
            [
                edge, Word<CentreMethod>("method", "Centre is the"),
                Quantity("tolerance", "Tolerance (±)", FieldUnits.Tolerance, FieldSign.Positive), toleranceU,
            ],
            RuleKind.Bandwidth =>
            [
                edge,
                Quantity("minimum", "Minimum bandwidth (optional)", FieldUnits.Frequency, FieldSign.Positive, optional: true),
                Quantity("maximum", "Maximum bandwidth (optional)", FieldUnits.Frequency, FieldSign.Positive, optional: true),
                Quantity("uncertainty", "Uncertainty", FieldUnits.Frequency, FieldSign.NonNegative),
            ],
            RuleKind.InsertionLoss =>
            [
                Word<InsertionLossMeasure>("measure", "Read the loss"),
                Word<FrequencyAnchor>("anchor", "Frequency is (only for at-frequency)", optional: true),
                Quantity("at", "At frequency (only for at-frequency)", FieldUnits.Frequency, FieldSign.Any, optional: true),
                Quantity("maximum", "Maximum insertion loss (dB, loss)", FieldUnits.Level, FieldSign.Positive), dbU,
            ],
            RuleKind.PassbandRipple => [.. band, Quantity("maximum", "Maximum ripple (dB of loss, peak to peak)", FieldUnits.Level, FieldSign.Positive), dbU],
            RuleKind.StopbandRejection =>
            [
                .. band, Word<LossReference>("reference", "Rejection is measured (relative: from the passband minimum loss)"),
                Quantity("minimum", "Minimum rejection (dB)", FieldUnits.Level, FieldSign.Positive), dbU,
            ],
            RuleKind.ShapeFactor =>
            [
                Quantity("pass-level", "Pass level (dB of loss below the minimum)", FieldUnits.Level, FieldSign.Positive),
                Quantity("stop-level", "Stop level (dB of loss below the minimum)", FieldUnits.Level, FieldSign.Positive),
                Quantity("maximum", "Maximum shape factor (ratio)", FieldUnits.Number, FieldSign.Positive),
                Quantity("uncertainty", "Uncertainty (ratio)", FieldUnits.Number, FieldSign.NonNegative),
            ],
            RuleKind.SpuriousResponse => [.. band, Quantity("minimum", "Minimum spurious suppression (dB, rejection)", FieldUnits.Level, FieldSign.Positive), dbU],
            RuleKind.GroupDelayVariation =>
            [
                .. band, Quantity("aperture", "Smoothing aperture", FieldUnits.Frequency, FieldSign.NonNegative),
                Quantity("maximum", "Maximum group-delay variation", FieldUnits.Time, FieldSign.Positive),
                Quantity("uncertainty", "Uncertainty", FieldUnits.Time, FieldSign.NonNegative),
            ],
            RuleKind.ReturnLoss =>
            [
                new("port", "Port (1 = S11, 2 = S22)", FieldType.Integer, None, NoWords, FieldSign.Positive),
                .. band, Quantity("minimum", "Minimum return loss (dB, loss)", FieldUnits.Level, FieldSign.Positive), dbU,
            ],
            RuleKind.SeriesResonance or RuleKind.NotchFrequency => [Quantity("tolerance", "Tolerance (±)", FieldUnits.Tolerance, FieldSign.Positive), toleranceU],
            RuleKind.MotionalResistance =>
            [
                Quantity("maximum", "Maximum motional resistance R1", FieldUnits.Resistance, FieldSign.Positive),
                Quantity("uncertainty", "Uncertainty", FieldUnits.Resistance, FieldSign.NonNegative),
            ],
            RuleKind.ShuntCapacitance =>
            [
                Quantity("maximum", "Maximum shunt capacitance C0", FieldUnits.Capacitance, FieldSign.Positive),
                Quantity("uncertainty", "Uncertainty", FieldUnits.Capacitance, FieldSign.NonNegative),
            ],
            RuleKind.UnloadedQ =>
            [
                Quantity("minimum", "Minimum unloaded Q", FieldUnits.Number, FieldSign.Positive),
                Quantity("uncertainty", "Uncertainty", FieldUnits.Number, FieldSign.NonNegative),
            ],
            RuleKind.UnwantedModes => [.. band, Quantity("minimum", "Minimum suppression of unwanted modes (dB, rejection)", FieldUnits.Level, FieldSign.Positive), dbU],
            RuleKind.NotchDepth =>
            [
                Word<LossReference>("reference", "Depth is measured (relative: from the passband minimum loss)"),
                Quantity("minimum", "Minimum notch depth (dB, rejection)", FieldUnits.Level, FieldSign.Positive), dbU,
            ],
            RuleKind.LimitLine =>
            [
                Word<LimitBoundary>("boundary", "The line is the (upper: maximum loss; lower: minimum loss)"),
                Word<FrequencyAnchor>("anchor", "Point frequencies are"),
                Word<LossReference>("reference", "Point losses are (relative: added to the passband minimum loss)"),
                dbU,
            ],
            _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, "not a rule kind"),
        };
    }

    /// <summary>The rule kinds that apply to a device, in the engine's order.</summary>
    public static IReadOnlyList<RuleKind> KindsFor(DeviceKind device) => device switch
    {
        DeviceKind.BandpassFilter => [RuleKind.CentreFrequency, RuleKind.Bandwidth, RuleKind.InsertionLoss, RuleKind.PassbandRipple, RuleKind.StopbandRejection,
            RuleKind.ShapeFactor, RuleKind.SpuriousResponse, RuleKind.GroupDelayVariation, RuleKind.ReturnLoss, RuleKind.LimitLine],
        DeviceKind.BandStop => [RuleKind.NotchFrequency, RuleKind.NotchDepth, RuleKind.InsertionLoss, RuleKind.GroupDelayVariation, RuleKind.ReturnLoss, RuleKind.LimitLine],
        _ => [RuleKind.SeriesResonance, RuleKind.MotionalResistance, RuleKind.ShuntCapacitance, RuleKind.UnloadedQ, RuleKind.UnwantedModes, RuleKind.ReturnLoss, RuleKind.LimitLine],
    };

    internal static string Hyphenate(string name)
    {
        var text = new StringBuilder(name.Length + 4);
        for (int i = 0; i < name.Length; i++)
        {
            if (char.IsUpper(name[i]) && i > 0)
            {
                text.Append('-');
            }
            text.Append(char.ToLowerInvariant(name[i]));
        }
        return text.ToString();
    }

    private static FieldSpec Text(string key, string label, bool optional = false) => new(key, label, FieldType.Text, None, NoWords, FieldSign.Any, optional);

    private static FieldSpec Flag(string key, string label) => new(key, label, FieldType.Flag, None, ["true", "false"]);

    private static FieldSpec Quantity(string key, string label, IReadOnlyList<(string, decimal)> units, FieldSign sign, bool optional = false) =>
        new(key, label, FieldType.Quantity, units, NoWords, sign, optional);

    private static FieldSpec Word<T>(string key, string label, bool optional = false) where T : struct, Enum =>
        new(key, label, FieldType.Word, None, Enum.GetValues<T>().Select(v => Hyphenate(v.ToString())).ToArray(), FieldSign.Any, optional);
}
