using System.Globalization;
using System.Text.RegularExpressions;
using FilterQA.Core.Templates.Rules;
using YamlDotNet.Core;
using YamlDotNet.RepresentationModel;

namespace FilterQA.Core.Templates.Text;

/// <summary>
/// One reading of a template text. Walks the YAML node tree (not a deserializer) because every node keeps
/// its position and a walk can go on after a problem, so all problems are reported at once.
/// </summary>
internal sealed partial class TemplateTextSession
{
    private const int FormatVersion = 1;

    /// <summary>Sweep requirements used only to run the template checks when the sweep section itself has problems.</summary>
    private static readonly SweepRequirements Permissive = new(0, double.MaxValue, 1, 1, 1, true, true, true);

    private readonly List<(long Line, long Column, int Order, string Message)> _problems = [];
    private readonly Dictionary<string, Mark> _places = new(StringComparer.Ordinal);
    private Mark _root = Mark.Empty;

    internal void Report(YamlNode node, string message) => Report(node.Start, message);

    internal void Report(Mark at, string message) => _problems.Add((at.Line, at.Column, _problems.Count, message));

    internal void Place(string field, YamlNode node) => _places[field] = node.Start;

    internal TemplateReadResult Run(string text)
    {
        YamlMappingNode? root = Parse(text);
        LimitTemplate? template = root is null ? null : ReadTemplate(root);
        TemplateProblem[] problems = _problems
            .OrderBy(p => p.Line).ThenBy(p => p.Column).ThenBy(p => p.Order)
            .Select(p => new TemplateProblem((int)Math.Min(p.Line, int.MaxValue), (int)Math.Min(p.Column, int.MaxValue), p.Message))
            .ToArray();
        return new TemplateReadResult(problems.Length == 0 ? template : null, problems);
    }

    private YamlMappingNode? Parse(string text)
    {
        var stream = new YamlStream();
        var parser = new TrackingParser(new Parser(new StringReader(text)));
        try
        {
            stream.Load(parser);
        }
        catch (YamlException problem)
        {
            Report(problem.Start, $"YAML syntax error: {problem.Message}");
            return null;
        }
        catch (InvalidOperationException)
        {
            // YamlDotNet gives no position when the text ends inside an open flow collection or quote.
            Report(parser.LastGood, "YAML syntax error: a bracket '[', brace '{' or quote opened here or after is never closed");
            return null;
        }
        if (stream.Documents.Count == 0)
        {
            Report(new Mark(0, 1, 1), "the text holds no template; expected fields such as part, revision, device, sweep and rules");
            return null;
        }
        if (stream.Documents.Count > 1)
        {
            Report(stream.Documents[1].RootNode, "a template file holds one template; remove the second document (after '---')");
        }
        if (stream.Documents[0].RootNode is not YamlMappingNode root)
        {
            Report(stream.Documents[0].RootNode, "a template is a set of fields (part: ..., revision: ...), not a single value or a list");
            return null;
        }
        _root = root.Start;
        return root;
    }

    private LimitTemplate? ReadTemplate(YamlMappingNode root)
    {
        var top = new Fields(this, root, "the template", "");
        top.RejectUnknown(RuleKeys.TopLevel);
        int? format = top.Integer("format-version", required: true, minimum: 1);
        if (format is not null and not FormatVersion)
        {
            top.Report("format-version", string.Create(CultureInfo.InvariantCulture,
                $"format-version {format} is not known; this reader knows format-version {FormatVersion}"));
        }
        string? part = top.Text("part", required: true);
        int? revision = top.Integer("revision", required: true, minimum: 1);
        string? description = top.Text("description", required: true);
        DeviceKind? device = top.Word<DeviceKind>("device", required: true, "device kind");
        double? nominal = top.Quantity("nominal", QuantityKind.Frequency, required: true, Sign.Positive);
        TemplateStatus? status = top.Word<TemplateStatus>("status", required: true, "status");
        string? author = top.Text("author", required: false);
        DateOnly? releaseDate = top.Date("release-date", required: false);
        string? hash = top.Text("content-hash", required: false);
        if (hash is not null && !HashPattern().IsMatch(hash))
        {
            top.Report("content-hash", $"content-hash '{hash}' must be 'sha256:' followed by 64 lower-case hex digits");
        }
        DecisionRule? decision = top.Word<DecisionRule>("decision-rule", required: true, "decision rule");
        YamlMappingNode? sweepNode = top.Mapping("sweep", required: true);
        SweepRequirements? sweep = sweepNode is null ? null : ReadSweep(sweepNode);
        YamlSequenceNode? ruleNodes = top.Sequence("rules", required: true);
        if (ruleNodes is not null)
        {
            _places["rules"] = ruleNodes.Start;
        }

        int before = _problems.Count;
        var rules = new List<(int Index, LimitRule Rule)>();
        if (ruleNodes is not null)
        {
            for (int i = 0; i < ruleNodes.Children.Count; i++)
            {
                if (ReadRule(ruleNodes.Children[i], i) is { } rule)
                {
                    rules.Add((i, rule));
                }
            }
        }
        bool everyRuleRead = _problems.Count == before;

        ReportTemplateIssues(part, revision, description, device, nominal, status, author, releaseDate, sweep, decision, rules, everyRuleRead);
        if (_problems.Count > 0)
        {
            return null;
        }

        LimitTemplate template = LimitTemplate.Create(part!, revision!.Value, description!, device!.Value, nominal!.Value, status!.Value,
            author, releaseDate, sweep!, decision!.Value, rules.Select(r => r.Rule));
        if (hash is not null && hash != template.ContentHash)
        {
            top.Report("content-hash", "the content no longer matches its content-hash: the text was changed after it was sealed; "
                + "a released revision must not be edited (make a new revision as a draft instead)");
        }
        if (hash is null && template.Status != TemplateStatus.Draft)
        {
            top.Report("status", $"a {Words.Of(template.Status)} template carries the content-hash line that seals its text; "
                + "a template is released by releasing its draft in FilterQA, which writes that line, not by editing the status by hand");
        }
        return template;
    }

    private void ReportTemplateIssues(string? part, int? revision, string? description, DeviceKind? device, double? nominal,
        TemplateStatus? status, string? author, DateOnly? releaseDate, SweepRequirements? sweep, DecisionRule? decision,
        List<(int Index, LimitRule Rule)> rules, bool everyRuleRead)
    {
        // Fields that could not be read are replaced by harmless stand-ins so the remaining checks still run;
        // issues that only the stand-ins could cause are dropped.
        List<TemplateIssue> issues = LimitTemplate.FindIssues(part ?? "X", revision ?? 1, description ?? "x",
            device ?? DeviceKind.BandpassFilter, nominal ?? 1, status ?? TemplateStatus.Draft, author, releaseDate,
            sweep ?? Permissive, decision ?? DecisionRule.SimpleAcceptance, rules.Select(r => r.Rule).ToArray());
        foreach (TemplateIssue issue in issues)
        {
            string field = issue.Field;
            bool standIn = (field == "part" && part is null)
                || (field == "description" && description is null)
                || (field is "author" or "release-date" && status is null)
                || (field == "rules" && !everyRuleRead)
                || (field.EndsWith(".kind", StringComparison.Ordinal) && device is null)
                || (field.EndsWith(".start", StringComparison.Ordinal) && (sweep is null || nominal is null))
                || (field.StartsWith("sweep.", StringComparison.Ordinal) && sweep is null);
            if (standIn)
            {
                continue;
            }
            Match index = RuleIndex().Match(field);
            if (index.Success)
            {
                // The checks number the rules that were read; point at the rule's place in the text.
                int original = rules[int.Parse(index.Groups[1].Value, CultureInfo.InvariantCulture)].Index;
                field = string.Create(CultureInfo.InvariantCulture, $"rules[{original}]") + field[index.Length..];
            }
            Report(Where(field), issue.Message);
        }
    }

    private Mark Where(string field)
    {
        string? current = field;
        while (current is not null)
        {
            if (_places.TryGetValue(current, out Mark mark))
            {
                return mark;
            }
            if (current is "author" or "release-date")
            {
                current = "status";
                continue;
            }
            int dot = current.LastIndexOf('.');
            current = dot > 0 ? current[..dot] : current.StartsWith("rules[", StringComparison.Ordinal) ? "rules" : null;
        }
        return _root;
    }

    private SweepRequirements? ReadSweep(YamlMappingNode node)
    {
        _places["sweep"] = node.Start;
        var fields = new Fields(this, node, "the sweep section", "sweep.");
        fields.RejectUnknown(RuleKeys.Sweep);
        int before = _problems.Count;
        double? start = fields.Quantity("start", QuantityKind.Frequency, true, Sign.NonNegative, FrequencyAnchor.Absolute);
        double? stop = fields.Quantity("stop", QuantityKind.Frequency, true, Sign.Positive, FrequencyAnchor.Absolute);
        double? feature = fields.Quantity("narrowest-feature", QuantityKind.Frequency, true, Sign.Positive);
        int? points = fields.Integer("points-per-feature", true, 1);
        double? age = fields.Quantity("max-thru-age", QuantityKind.Duration, true, Sign.Positive);
        bool? phase = fields.Bool("needs-phase", true);
        bool? s11 = fields.Bool("needs-s11", true);
        bool? s22 = fields.Bool("needs-s22", true);
        if (_problems.Count != before)
        {
            return null;
        }
        return fields.Make("start", () => new SweepRequirements(start!.Value, stop!.Value, feature!.Value, points!.Value, age!.Value,
            phase!.Value, s11!.Value, s22!.Value));
    }

    private LimitRule? ReadRule(YamlNode node, int index)
    {
        string prefix = string.Create(CultureInfo.InvariantCulture, $"rules[{index}]");
        _places[prefix] = node.Start;
        string ordinal = string.Create(CultureInfo.InvariantCulture, $"rule {index + 1}");
        if (node is not YamlMappingNode mapping)
        {
            Report(node, $"{ordinal} must be a set of fields (id, kind, title, ...)");
            return null;
        }
        var f = new Fields(this, mapping, ordinal, prefix + ".");
        int before = _problems.Count;
        string? id = f.Text("id", required: true);
        if (id is not null && f.Make("id", () => Checks.RuleId(id)) is not null)
        {
            f.Context = $"rule '{id}'";
        }
        RuleKind? kind = f.Word<RuleKind>("kind", required: true, "rule kind");
        if (kind is null)
        {
            return null;
        }
        f.RejectUnknown(RuleKeys.AllFor(kind.Value));
        string? title = f.Text("title", required: true);
        if (title is not null)
        {
            f.Make("title", () => Checks.Text(title, "a rule title"));
        }
        Func<LimitRule>? make = kind.Value switch
        {
            RuleKind.CentreFrequency => CentreFrequency(f, id!, title!),
            RuleKind.Bandwidth => Bandwidth(f, id!, title!),
            RuleKind.InsertionLoss => InsertionLoss(f, id!, title!),
            RuleKind.PassbandRipple => WithBand(f, band => Db(f, "maximum", Sign.Positive) is { } max && Db(f, "uncertainty", Sign.NonNegative) is { } u
                ? () => new PassbandRippleRule(id!, title!, band, max, u) : null),
            RuleKind.StopbandRejection => WithBand(f, band => f.Word<LossReference>("reference", true, "loss reference") is { } reference
                && Db(f, "minimum", Sign.Positive) is { } min && Db(f, "uncertainty", Sign.NonNegative) is { } u
                ? () => new StopbandRejectionRule(id!, title!, band, min, reference, u) : null),
            RuleKind.ShapeFactor => ShapeFactor(f, id!, title!),
            RuleKind.SpuriousResponse => WithBand(f, band => Db(f, "minimum", Sign.Positive) is { } min && Db(f, "uncertainty", Sign.NonNegative) is { } u
                ? () => new SpuriousResponseRule(id!, title!, band, min, u) : null),
            RuleKind.GroupDelayVariation => WithBand(f, band => f.Quantity("aperture", QuantityKind.Frequency, true, Sign.NonNegative) is { } aperture
                && f.Quantity("maximum", QuantityKind.Time, true, Sign.Positive) is { } max
                && f.Quantity("uncertainty", QuantityKind.Time, true, Sign.NonNegative) is { } u
                ? () => new GroupDelayVariationRule(id!, title!, band, max, aperture, u) : null),
            RuleKind.ReturnLoss => WithBand(f, band => Port(f) is { } port && Db(f, "minimum", Sign.Positive) is { } min
                && Db(f, "uncertainty", Sign.NonNegative) is { } u
                ? () => new ReturnLossRule(id!, title!, band, min, port, u) : null),
            RuleKind.SeriesResonance => f.Tolerance("tolerance") is var tolerance && f.ToleranceUncertainty("uncertainty", tolerance) is { } su && tolerance is not null
                ? () => new SeriesResonanceRule(id!, title!, tolerance, su) : null,
            RuleKind.MotionalResistance => f.Quantity("maximum", QuantityKind.Resistance, true, Sign.Positive) is { } r1
                && f.Quantity("uncertainty", QuantityKind.Resistance, true, Sign.NonNegative) is { } ru
                ? () => new MotionalResistanceRule(id!, title!, r1, ru) : null,
            RuleKind.ShuntCapacitance => f.Quantity("maximum", QuantityKind.Capacitance, true, Sign.Positive) is { } c0
                && f.Quantity("uncertainty", QuantityKind.Capacitance, true, Sign.NonNegative) is { } cu
                ? () => new ShuntCapacitanceRule(id!, title!, c0, cu) : null,
            RuleKind.UnloadedQ => f.Quantity("minimum", QuantityKind.Number, true, Sign.Positive) is { } q
                && f.Quantity("uncertainty", QuantityKind.Number, true, Sign.NonNegative) is { } qu
                ? () => new UnloadedQRule(id!, title!, q, qu) : null,
            RuleKind.UnwantedModes => WithBand(f, band => Db(f, "minimum", Sign.Positive) is { } min && Db(f, "uncertainty", Sign.NonNegative) is { } u
                ? () => new UnwantedModesRule(id!, title!, band, min, u) : null),
            RuleKind.NotchFrequency => f.Tolerance("tolerance") is var notch && f.ToleranceUncertainty("uncertainty", notch) is { } nu && notch is not null
                ? () => new NotchFrequencyRule(id!, title!, notch, nu) : null,
            RuleKind.NotchDepth => f.Word<LossReference>("reference", true, "loss reference") is { } depthReference
                && Db(f, "minimum", Sign.Positive) is { } depth && Db(f, "uncertainty", Sign.NonNegative) is { } du
                ? () => new NotchDepthRule(id!, title!, depth, depthReference, du) : null,
            RuleKind.LimitLine => LimitLine(f, id!, title!),
            _ => null,
        };
        if (make is null || _problems.Count != before)
        {
            return null;
        }
        return f.Make("id", make);
    }

    private static double? Db(Fields f, string key, Sign sign) => f.Quantity(key, QuantityKind.Level, true, sign);

    /// <summary>Reads anchor, start and stop, then the rest of the rule; every field is read even when the band fails.</summary>
    private static Func<LimitRule>? WithBand(Fields f, Func<FrequencyBand, Func<LimitRule>?> rest)
    {
        FrequencyBand? band = Band(f);
        // The rest is read against a stand-in band when the real one failed, so its problems are reported too.
        Func<LimitRule>? make = rest(band ?? new FrequencyBand(FrequencyAnchor.Absolute, 0, double.MaxValue));
        return band is null ? null : make;
    }

    private static FrequencyBand? Band(Fields f)
    {
        FrequencyAnchor? anchor = f.Word<FrequencyAnchor>("anchor", true, "frequency anchor");
        double? start = f.Quantity("start", QuantityKind.Frequency, true, Sign.Any, anchor);
        double? stop = f.Quantity("stop", QuantityKind.Frequency, true, Sign.Any, anchor);
        if (anchor is null || start is null || stop is null)
        {
            return null;
        }
        return f.Make("start", () => new FrequencyBand(anchor.Value, start.Value, stop.Value));
    }

    private static int? Port(Fields f)
    {
        int? port = f.Integer("port", true, 1);
        if (port is > 2)
        {
            f.Report("port", string.Create(CultureInfo.InvariantCulture, $"'port' must be 1 (S11) or 2 (S22); got {port}"));
            return null;
        }
        return port;
    }

    private static Func<LimitRule>? CentreFrequency(Fields f, string id, string title)
    {
        double? level = Db(f, "level", Sign.Positive);
        CentreMethod method = CentreMethod.ArithmeticMean;
        if (f.Has("method"))
        {
            if (f.Word<CentreMethod>("method", true, "centre method") is not { } written)
            {
                return null;
            }
            method = written;
        }
        FrequencyTolerance? tolerance = f.Tolerance("tolerance");
        double? u = f.ToleranceUncertainty("uncertainty", tolerance);
        return level is null || tolerance is null || u is null ? null
            : () => new CentreFrequencyRule(id, title, level.Value, tolerance, method, u.Value);
    }

    private static Func<LimitRule>? Bandwidth(Fields f, string id, string title)
    {
        double? level = Db(f, "level", Sign.Positive);
        double? min = f.Quantity("minimum", QuantityKind.Frequency, false, Sign.Positive);
        double? max = f.Quantity("maximum", QuantityKind.Frequency, false, Sign.Positive);
        double? u = f.Quantity("uncertainty", QuantityKind.Frequency, true, Sign.NonNegative);
        if (!f.Has("minimum") && !f.Has("maximum"))
        {
            f.Report("kind", $"{f.Context} has no 'minimum' and no 'maximum'; a bandwidth rule needs at least one limit");
            return null;
        }
        if (min > max)
        {
            f.Report("minimum", $"the minimum bandwidth in {f.Context} is above its maximum");
            return null;
        }
        return level is null || u is null ? null : () => new BandwidthRule(id, title, level.Value, min, max, u.Value);
    }

    private static Func<LimitRule>? InsertionLoss(Fields f, string id, string title)
    {
        InsertionLossMeasure? measure = f.Word<InsertionLossMeasure>("measure", true, "insertion-loss measure");
        double? max = Db(f, "maximum", Sign.Positive);
        double? u = Db(f, "uncertainty", Sign.NonNegative);
        AnchoredFrequency? at = null;
        if (measure == InsertionLossMeasure.AtFrequency)
        {
            FrequencyAnchor? anchor = f.Word<FrequencyAnchor>("anchor", true, "frequency anchor");
            double? value = f.Quantity("at", QuantityKind.Frequency, true, Sign.Any, anchor);
            if (anchor is null || value is null)
            {
                return null;
            }
            at = f.Make("at", () => new AnchoredFrequency(anchor.Value, value.Value));
            if (at is null)
            {
                return null;
            }
        }
        else if (measure is not null)
        {
            foreach (string key in new[] { "anchor", "at" })
            {
                if (f.Has(key))
                {
                    f.Report(key, $"'{key}' is given only with measure: at-frequency");
                    return null;
                }
            }
        }
        return measure is null || max is null || u is null ? null : () => new InsertionLossRule(id, title, max.Value, measure.Value, at, u.Value);
    }

    private static Func<LimitRule>? ShapeFactor(Fields f, string id, string title)
    {
        double? pass = Db(f, "pass-level", Sign.Positive);
        double? stop = Db(f, "stop-level", Sign.Positive);
        double? max = f.Quantity("maximum", QuantityKind.Number, true, Sign.Positive);
        double? u = f.Quantity("uncertainty", QuantityKind.Number, true, Sign.NonNegative);
        if (stop <= pass)
        {
            f.Report("stop-level", $"the stop level of {f.Context} must be above its pass level");
            return null;
        }
        return pass is null || stop is null || max is null || u is null ? null
            : () => new ShapeFactorRule(id, title, pass.Value, stop.Value, max.Value, u.Value);
    }

    private Func<LimitRule>? LimitLine(Fields f, string id, string title)
    {
        LimitBoundary? boundary = f.Word<LimitBoundary>("boundary", true, "boundary");
        FrequencyAnchor? anchor = f.Word<FrequencyAnchor>("anchor", true, "frequency anchor");
        LossReference? reference = f.Word<LossReference>("reference", true, "loss reference");
        double? u = Db(f, "uncertainty", Sign.NonNegative);
        YamlSequenceNode? list = f.Sequence("points", required: true);
        if (list is null)
        {
            return null;
        }
        int before = _problems.Count;
        var frequencies = new List<double>();
        var losses = new List<double>();
        foreach (YamlNode item in list.Children)
        {
            if (item is not YamlSequenceNode pair || pair.Children.Count != 2
                || pair.Children[0] is not YamlScalarNode fNode || pair.Children[1] is not YamlScalarNode aNode)
            {
                Report(item, $"each point of {f.Context} is a pair [frequency, loss], e.g. [-10 kHz, 3 dB]");
                continue;
            }
            string fText = fNode.Value ?? "", aText = aNode.Value ?? "";
            if (!Quantities.TryRead(fText, QuantityKind.Frequency, out double hz, out bool isPpm, out string? fError))
            {
                Report(fNode, isPpm && anchor == FrequencyAnchor.Absolute
                    ? $"'{fText}' is in ppm, a relative unit, but this rule's frequencies are absolute (anchor: absolute); write Hz, kHz, MHz or GHz"
                    : $"point frequency: {fError}");
            }
            if (!Quantities.TryRead(aText, QuantityKind.Level, out double db, out _, out string? aError))
            {
                Report(aNode, $"point loss: {aError}");
            }
            else if (db < 0)
            {
                Report(aNode, $"point loss '{aText}' is negative; limit lines are written as loss, positive for attenuation");
            }
            if (frequencies.Count > 0 && hz <= frequencies[^1])
            {
                Report(fNode, $"point frequency '{fText}' is not above the point before it; points must be in increasing frequency");
            }
            frequencies.Add(hz);
            losses.Add(db);
        }
        if (_problems.Count != before || boundary is null || anchor is null || reference is null || u is null)
        {
            return null;
        }
        if (frequencies.Count < 2)
        {
            f.Report("points", $"{f.Context} needs at least two points");
            return null;
        }
        double[] hzArray = [.. frequencies], dbArray = [.. losses];
        return () => new LimitLineRule(id, title, boundary.Value, anchor.Value, reference.Value, hzArray, dbArray, u.Value);
    }

    [GeneratedRegex("^sha256:[0-9a-f]{64}$", RegexOptions.CultureInvariant)]
    private static partial Regex HashPattern();

    [GeneratedRegex(@"^rules\[(\d+)\]", RegexOptions.CultureInvariant)]
    private static partial Regex RuleIndex();
}
