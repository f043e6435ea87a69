using System.Globalization;
using FilterQA.Core.Templates.Rules;
using YamlDotNet.Core;
using YamlDotNet.Core.Events;

namespace FilterQA.Core.Templates.Text;

/// <summary>
/// Writes a template in the text format of the limit-templates folder (YAML, UTF-8, LF line endings).
/// Every field is written, in a fixed order, quantities with units (see the folder's README); so the text
/// is canonical: the same template always gives the same text, and <see cref="LimitTemplateReader"/> reads
/// it back to an equal template.
/// </summary>
public static class LimitTemplateWriter
{
    /// <summary>
    /// The file text: the canonical text plus, for a released or withdrawn template, the content-hash line
    /// that seals it.
    /// </summary>
    public static string Write(LimitTemplate template)
    {
        ArgumentNullException.ThrowIfNull(template);
        return Compose(template, includeHash: template.Status != TemplateStatus.Draft);
    }

    /// <summary>Writes <see cref="Write"/>'s text to <paramref name="path"/> (UTF-8 without byte-order mark).</summary>
    /// <exception cref="IOException">The file cannot be written.</exception>
    public static void WriteFile(LimitTemplate template, string path) =>
        File.WriteAllText(path, Write(template), new System.Text.UTF8Encoding(false));

    /// <summary>The canonical text (no content-hash line) the content hash is computed from.</summary>
    internal static string WriteCanonical(LimitTemplate template) => Compose(template, includeHash: false);

    private static string Compose(LimitTemplate template, bool includeHash)
    {
        using var text = new StringWriter(CultureInfo.InvariantCulture) { NewLine = "\n" };
        var yaml = new Output(new Emitter(text, new EmitterSettings().WithBestWidth(100_000).WithIndentedSequences()));
        yaml.Emit(new StreamStart());
        yaml.Emit(new DocumentStart());
        yaml.Emit(new MappingStart());
        yaml.Pair("format-version", "1");
        yaml.Pair("part", template.PartNumber);
        yaml.Pair("revision", template.Revision.ToString(CultureInfo.InvariantCulture));
        yaml.Pair("description", template.Description);
        yaml.Pair("device", Words.Of(template.Device));
        yaml.Pair("nominal", Quantities.Write(template.NominalHz, QuantityKind.Frequency));
        yaml.Pair("status", Words.Of(template.Status));
        if (template.Author is { } author)
        {
            yaml.Pair("author", author);
        }
        if (template.ReleaseDate is { } date)
        {
            yaml.Pair("release-date", date.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture));
        }
        if (includeHash)
        {
            yaml.Pair("content-hash", template.ContentHash);
        }
        yaml.Pair("decision-rule", Words.Of(template.DecisionRule));
        WriteSweep(yaml, template.Sweep);
        yaml.Key("rules");
        yaml.Emit(new SequenceStart(null, null, false, SequenceStyle.Block));
        foreach (LimitRule rule in template.Rules)
        {
            WriteRule(yaml, rule);
        }
        yaml.Emit(new SequenceEnd());
        yaml.Emit(new MappingEnd());
        yaml.Emit(new DocumentEnd(true));
        yaml.Emit(new StreamEnd());
        return text.ToString().Replace("\r\n", "\n", StringComparison.Ordinal);
    }

    private static void WriteSweep(Output yaml, SweepRequirements sweep)
    {
        yaml.Key("sweep");
        yaml.Emit(new MappingStart());
        yaml.Pair("start", Quantities.Write(sweep.SpanStartHz, QuantityKind.Frequency));
        yaml.Pair("stop", Quantities.Write(sweep.SpanStopHz, QuantityKind.Frequency));
        yaml.Pair("narrowest-feature", Quantities.Write(sweep.NarrowestFeatureHz, QuantityKind.Frequency));
        yaml.Pair("points-per-feature", sweep.PointsPerFeature.ToString(CultureInfo.InvariantCulture));
        yaml.Pair("max-thru-age", Quantities.Write(sweep.MaximumThruAgeS, QuantityKind.Duration));
        yaml.Pair("needs-phase", Bool(sweep.NeedsPhase));
        yaml.Pair("needs-s11", Bool(sweep.NeedsS11));
        yaml.Pair("needs-s22", Bool(sweep.NeedsS22));
        yaml.Emit(new MappingEnd());
    }

    private static void WriteRule(Output yaml, LimitRule rule)
    {
        yaml.Emit(new MappingStart());
        yaml.Pair("id", rule.Id);
        yaml.Pair("kind", Words.Of(rule.Kind));
        yaml.Pair("title", rule.Title);
        string uncertainty;
        switch (rule)
        {
            case CentreFrequencyRule r:
                yaml.Pair("level", Db(r.LevelDb));
                yaml.Pair("method", Words.Of(r.Method));
                yaml.Pair("tolerance", Quantities.WriteTolerance(r.Tolerance.Value, r.Tolerance.Unit));
                uncertainty = Quantities.WriteTolerance(r.Uncertainty, r.Tolerance.Unit);
                break;
            case BandwidthRule r:
                yaml.Pair("level", Db(r.LevelDb));
                if (r.MinimumHz is { } min)
                {
                    yaml.Pair("minimum", Hz(min));
                }
                if (r.MaximumHz is { } max)
                {
                    yaml.Pair("maximum", Hz(max));
                }
                uncertainty = Hz(r.Uncertainty);
                break;
            case InsertionLossRule r:
                yaml.Pair("measure", Words.Of(r.Measure));
                if (r.At is { } at)
                {
                    yaml.Pair("anchor", Words.Of(at.Anchor));
                    yaml.Pair("at", Hz(at.ValueHz));
                }
                yaml.Pair("maximum", Db(r.MaximumDb));
                uncertainty = Db(r.Uncertainty);
                break;
            case PassbandRippleRule r:
                Band(yaml, r.Band);
                yaml.Pair("maximum", Db(r.MaximumDb));
                uncertainty = Db(r.Uncertainty);
                break;
            case StopbandRejectionRule r:
                Band(yaml, r.Band);
                yaml.Pair("reference", Words.Of(r.Reference));
                yaml.Pair("minimum", Db(r.MinimumDb));
                uncertainty = Db(r.Uncertainty);
                break;
            case ShapeFactorRule r:
                yaml.Pair("pass-level", Db(r.PassLevelDb));
                yaml.Pair("stop-level", Db(r.StopLevelDb));
                yaml.Pair("maximum", Quantities.Write(r.Maximum, QuantityKind.Number));
                uncertainty = Quantities.Write(r.Uncertainty, QuantityKind.Number);
                break;
            case SpuriousResponseRule r:
                Band(yaml, r.Band);
                yaml.Pair("minimum", Db(r.MinimumSuppressionDb));
                uncertainty = Db(r.Uncertainty);
                break;
            case GroupDelayVariationRule r:
                Band(yaml, r.Band);
                yaml.Pair("aperture", Hz(r.ApertureHz));
                yaml.Pair("maximum", Quantities.Write(r.MaximumS, QuantityKind.Time));
                uncertainty = Quantities.Write(r.Uncertainty, QuantityKind.Time);
                break;
            case ReturnLossRule r:
                yaml.Pair("port", r.Port.ToString(CultureInfo.InvariantCulture));
                Band(yaml, r.Band);
                yaml.Pair("minimum", Db(r.MinimumDb));
                uncertainty = Db(r.Uncertainty);
                break;
            case SeriesResonanceRule r:
                yaml.Pair("tolerance", Quantities.WriteTolerance(r.Tolerance.Value, r.Tolerance.Unit));
                uncertainty = Quantities.WriteTolerance(r.Uncertainty, r.Tolerance.Unit);
                break;
            case MotionalResistanceRule r:
                yaml.Pair("maximum", Quantities.Write(r.MaximumOhm, QuantityKind.Resistance));
                uncertainty = Quantities.Write(r.Uncertainty, QuantityKind.Resistance);
                break;
            case ShuntCapacitanceRule r:
                yaml.Pair("maximum", Quantities.Write(r.MaximumF, QuantityKind.Capacitance));
                uncertainty = Quantities.Write(r.Uncertainty, QuantityKind.Capacitance);
                break;
            case UnloadedQRule r:
                yaml.Pair("minimum", Quantities.Write(r.MinimumQ, QuantityKind.Number));
                uncertainty = Quantities.Write(r.Uncertainty, QuantityKind.Number);
                break;
            case UnwantedModesRule r:
                Band(yaml, r.Window);
                yaml.Pair("minimum", Db(r.MinimumSuppressionDb));
                uncertainty = Db(r.Uncertainty);
                break;
            case NotchFrequencyRule r:
                yaml.Pair("tolerance", Quantities.WriteTolerance(r.Tolerance.Value, r.Tolerance.Unit));
                uncertainty = Quantities.WriteTolerance(r.Uncertainty, r.Tolerance.Unit);
                break;
            case NotchDepthRule r:
                yaml.Pair("reference", Words.Of(r.Reference));
                yaml.Pair("minimum", Db(r.MinimumDb));
                uncertainty = Db(r.Uncertainty);
                break;
            case LimitLineRule r:
                yaml.Pair("boundary", Words.Of(r.Boundary));
                yaml.Pair("anchor", Words.Of(r.Anchor));
                yaml.Pair("reference", Words.Of(r.Reference));
                yaml.Key("points");
                yaml.Emit(new SequenceStart(null, null, false, SequenceStyle.Block));
                for (int i = 0; i < r.FrequenciesHz.Length; i++)
                {
                    yaml.Emit(new SequenceStart(null, null, false, SequenceStyle.Flow));
                    yaml.Key(Hz(r.FrequenciesHz[i]));
                    yaml.Key(Db(r.LossDb[i]));
                    yaml.Emit(new SequenceEnd());
                }
                yaml.Emit(new SequenceEnd());
                uncertainty = Db(r.Uncertainty);
                break;
            default:
                throw new ArgumentException($"the writer does not know the rule type {rule.GetType().Name}", nameof(rule));
        }
        yaml.Pair("uncertainty", uncertainty);
        yaml.Emit(new MappingEnd());
    }

    private static void Band(Output yaml, FrequencyBand band)
    {
        yaml.Pair("anchor", Words.Of(band.Anchor));
        yaml.Pair("start", Hz(band.StartHz));
        yaml.Pair("stop", Hz(band.StopHz));
    }

    private static string Hz(double value) => Quantities.Write(value, QuantityKind.Frequency);

    private static string Db(double value) => Quantities.Write(value, QuantityKind.Level);

    private static string Bool(bool value) => value ? "true" : "false";

    /// <summary>Thin helper over the emitter so each field is one line of code.</summary>
    private sealed class Output(IEmitter emitter)
    {
        internal void Emit(ParsingEvent item) => emitter.Emit(item);

        internal void Key(string text) => emitter.Emit(new Scalar(text));

        internal void Pair(string key, string value)
        {
            emitter.Emit(new Scalar(key));
            emitter.Emit(new Scalar(value));
        }
    }
}
