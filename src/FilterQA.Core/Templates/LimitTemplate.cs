using System.Collections.ObjectModel;
using FilterQA.Core.Templates.Rules;
using FilterQA.Core.Templates.Text;

namespace FilterQA.Core.Templates;

/// <summary>
/// One revision of the limits for one part number: identity, sweep requirements, decision rule and rules.
/// Immutable: no member changes it, so a released revision cannot be modified. A change is made with
/// <see cref="NewRevision"/>, which returns a draft with the next revision number; <see cref="Release"/>
/// and <see cref="Withdraw"/> return the same revision in its next life-cycle state.
/// </summary>
public sealed class LimitTemplate
{
    private LimitTemplate(string partNumber, int revision, string description, DeviceKind device, double nominalHz,
        TemplateStatus status, string? author, DateOnly? releaseDate, SweepRequirements sweep, DecisionRule decisionRule,
        ReadOnlyCollection<LimitRule> rules)
    {
        PartNumber = partNumber;
        Revision = revision;
        Description = description;
        Device = device;
        NominalHz = nominalHz;
        Status = status;
        Author = author;
        ReleaseDate = releaseDate;
        Sweep = sweep;
        DecisionRule = decisionRule;
        Rules = rules;
        CanonicalText = LimitTemplateWriter.WriteCanonical(this);
        ContentHash = TemplateHash.Of(CanonicalText);
    }

    /// <summary>Part number, e.g. "TME-CF455-15": 1–40 letters, digits, '.', '_', '/', '-'.</summary>
    public string PartNumber { get; }

    /// <summary>Revision number, 1 or more; each change makes the next one.</summary>
    public int Revision { get; }

    /// <summary>What the part is, in plain words (one line).</summary>
    public string Description { get; }

    /// <summary>Kind of part; decides which rule kinds are allowed.</summary>
    public DeviceKind Device { get; }

    /// <summary>Nominal (centre, series-resonance or notch) frequency, Hz; above zero.</summary>
    public double NominalHz { get; }

    /// <summary>Draft, released or withdrawn.</summary>
    public TemplateStatus Status { get; }

    /// <summary>Who wrote (and for a released revision, released) the template; required unless a draft.</summary>
    public string? Author { get; }

    /// <summary>Date of release; present exactly when the status is released or withdrawn.</summary>
    public DateOnly? ReleaseDate { get; }

    /// <summary>What a sweep must offer before this template may judge it.</summary>
    public SweepRequirements Sweep { get; }

    /// <summary>How uncertainty enters go/no-go.</summary>
    public DecisionRule DecisionRule { get; }

    /// <summary>The rules, in the order written; ids are unique.</summary>
    public IReadOnlyList<LimitRule> Rules { get; }

    /// <summary>
    /// The canonical text: what <see cref="LimitTemplateWriter"/> writes without the content-hash line,
    /// LF line endings, UTF-8. Comments, blank lines, key spacing and the way a quantity was written in a
    /// file (455 kHz or 0.455 MHz) do not change it; any change of content does.
    /// </summary>
    public string CanonicalText { get; }

    /// <summary>"sha256:" followed by the lower-case hex SHA-256 of the UTF-8 bytes of <see cref="CanonicalText"/>.</summary>
    public string ContentHash { get; }

    /// <summary>
    /// The guard band w for <paramref name="rule"/>, in the rule's unit: its uncertainty U under guarded
    /// acceptance, 0 under simple acceptance (ILAC-G8:09/2019).
    /// </summary>
    public double GuardBandFor(LimitRule rule)
    {
        ArgumentNullException.ThrowIfNull(rule);
        return DecisionRule == DecisionRule.GuardedAcceptance ? rule.Uncertainty : 0;
    }

    /// <summary>Finds a rule by id; null when there is none.</summary>
    public LimitRule? FindRule(string id) => Rules.FirstOrDefault(rule => rule.Id == id);

    /// <summary>Makes a template; every field is checked.</summary>
    /// <param name="partNumber">Part number (see <see cref="PartNumber"/>).</param>
    /// <param name="revision">1 or more.</param>
    /// <param name="description">Plain words, one line.</param>
    /// <param name="device">Kind of part.</param>
    /// <param name="nominalHz">Nominal frequency, Hz, above zero.</param>
    /// <param name="status">Life-cycle state.</param>
    /// <param name="author">Required for released and withdrawn templates.</param>
    /// <param name="releaseDate">Required for released and withdrawn templates; must be null for a draft.</param>
    /// <param name="sweep">Sweep requirements; must ask for phase, S11 and S22 where a rule needs them, and cover every band stated in absolute terms or from the nominal.</param>
    /// <param name="decisionRule">Simple or guarded acceptance.</param>
    /// <param name="rules">At least one rule; unique ids; every rule must fit <paramref name="device"/>.</param>
    /// <exception cref="ArgumentException">The fields do not form a template; the message lists every problem.</exception>
    public static LimitTemplate Create(string partNumber, int revision, string description, DeviceKind device, double nominalHz,
        TemplateStatus status, string? author, DateOnly? releaseDate, SweepRequirements sweep, DecisionRule decisionRule,
        IEnumerable<LimitRule> rules)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        ArgumentNullException.ThrowIfNull(rules);
        LimitRule[] copy = rules.ToArray();
        List<TemplateIssue> issues = FindIssues(partNumber, revision, description, device, nominalHz, status, author, releaseDate, sweep, decisionRule, copy);
        if (issues.Count > 0)
        {
            throw new ArgumentException("the template is not valid: " + string.Join("; ", issues.Select(issue => $"{issue.Field}: {issue.Message}")));
        }
        return new LimitTemplate(partNumber, revision, description, device, nominalHz, status, author, releaseDate, sweep, decisionRule,
            new ReadOnlyCollection<LimitRule>(copy));
    }

    /// <summary>
    /// A draft of the next revision (<see cref="Revision"/> + 1, no release date) with the same content,
    /// changed by <paramref name="change"/>. This template is not touched.
    /// </summary>
    /// <exception cref="ArgumentException">The changed fields do not form a template.</exception>
    public LimitTemplate NewRevision(Action<TemplateEditor> change)
    {
        ArgumentNullException.ThrowIfNull(change);
        var editor = new TemplateEditor(this);
        change(editor);
        return Create(PartNumber, Revision + 1, editor.Description, editor.Device, editor.NominalHz, TemplateStatus.Draft,
            editor.Author, null, editor.Sweep, editor.DecisionRule, editor.Rules);
    }

    /// <summary>This draft released by <paramref name="author"/> on <paramref name="date"/>: same revision, status released.</summary>
    /// <exception cref="InvalidOperationException">The template is not a draft.</exception>
    /// <exception cref="ArgumentException">The author is empty.</exception>
    public LimitTemplate Release(string author, DateOnly date)
    {
        if (Status != TemplateStatus.Draft)
        {
            throw new InvalidOperationException($"revision {Revision} of {PartNumber} is {Status}; only a draft can be released");
        }
        return Create(PartNumber, Revision, Description, Device, NominalHz, TemplateStatus.Released, author, date, Sweep, DecisionRule, Rules);
    }

    /// <summary>This released revision marked withdrawn (content, author and release date kept).</summary>
    /// <exception cref="InvalidOperationException">The template is not released.</exception>
    public LimitTemplate Withdraw()
    {
        if (Status != TemplateStatus.Released)
        {
            throw new InvalidOperationException($"revision {Revision} of {PartNumber} is {Status}; only a released template can be withdrawn");
        }
        return Create(PartNumber, Revision, Description, Device, NominalHz, TemplateStatus.Withdrawn, Author, ReleaseDate, Sweep, DecisionRule, Rules);
    }

    /// <summary>Every reason the fields cannot form a template (empty when they can); shared with the text reader.</summary>
    internal static List<TemplateIssue> FindIssues(string? partNumber, int revision, string? description, DeviceKind device, double nominalHz,
        TemplateStatus status, string? author, DateOnly? releaseDate, SweepRequirements sweep, DecisionRule decisionRule,
        IReadOnlyList<LimitRule> rules)
    {
        var issues = new List<TemplateIssue>();
        if (partNumber is null || !Checks.PartNumberPattern().IsMatch(partNumber))
        {
            issues.Add(new("part", $"part number '{partNumber}' must be 1 to 40 letters, digits, '.', '_', '/' or '-', starting with a letter or digit"));
        }
        if (revision < 1)
        {
            issues.Add(new("revision", Checks.Say($"revision must be 1 or more; got {revision}")));
        }
        Collect(issues, "description", () => Checks.Text(description, "the description"));
        Collect(issues, "device", () => Checks.Defined(device, "the device kind"));
        Collect(issues, "nominal", () => Checks.Positive(nominalHz, "the nominal frequency"));
        Collect(issues, "status", () => Checks.Defined(status, "the status"));
        Collect(issues, "decision-rule", () => Checks.Defined(decisionRule, "the decision rule"));
        if (status is TemplateStatus.Released or TemplateStatus.Withdrawn)
        {
            string state = status == TemplateStatus.Released ? "released" : "withdrawn";
            if (string.IsNullOrWhiteSpace(author))
            {
                issues.Add(new("author", $"a {state} template needs an author"));
            }
            if (releaseDate is null)
            {
                issues.Add(new("release-date", $"a {state} template needs a release date"));
            }
        }
        else if (releaseDate is not null)
        {
            issues.Add(new("release-date", "a draft has no release date; remove it, or set the status to released"));
        }
        if (author is not null)
        {
            Collect(issues, "author", () => Checks.Text(author, "the author"));
        }
        if (rules.Count == 0)
        {
            issues.Add(new("rules", "a template needs at least one rule"));
        }
        var seen = new HashSet<string>(StringComparer.Ordinal);
        for (int i = 0; i < rules.Count; i++)
        {
            LimitRule rule = rules[i];
            if (!seen.Add(rule.Id))
            {
                issues.Add(new($"rules[{i}].id", $"rule id '{rule.Id}' is used by an earlier rule; ids must be unique"));
            }
            if (!rule.FitsDevice(device))
            {
                issues.Add(new($"rules[{i}].kind", $"a {Words.Of(rule.Kind)} rule does not apply to a {Words.Of(device)}"));
            }
            if (rule.NeedsPhase && !sweep.NeedsPhase)
            {
                issues.Add(new("sweep.needs-phase", $"rule '{rule.Id}' needs the transmission phase; set needs-phase: true"));
            }
            if (rule.ReflectionPort == 1 && !sweep.NeedsS11)
            {
                issues.Add(new("sweep.needs-s11", $"rule '{rule.Id}' needs S11; set needs-s11: true"));
            }
            if (rule.ReflectionPort == 2 && !sweep.NeedsS22)
            {
                issues.Add(new("sweep.needs-s22", $"rule '{rule.Id}' needs S22; set needs-s22: true"));
            }
            if (rule.Extent is { } extent && extent.Anchor != FrequencyAnchor.MeasuredOffset && double.IsFinite(nominalHz))
            {
                double reference = extent.Anchor == FrequencyAnchor.NominalOffset ? nominalHz : 0;
                double low = reference + extent.StartHz, high = reference + extent.StopHz;
                // A relative tolerance keeps rounding in decimal units (e.g. 21.4 MHz + 1 MHz) from tripping the check.
                double slack = 1e-9 * Math.Max(sweep.SpanStopHz, 1);
                if (low < sweep.SpanStartHz - slack || high > sweep.SpanStopHz + slack)
                {
                    issues.Add(new($"rules[{i}].start", Checks.Say(
                        $"rule '{rule.Id}' looks at {low:R} Hz to {high:R} Hz, outside the required sweep span {sweep.SpanStartHz:R} Hz to {sweep.SpanStopHz:R} Hz")));
                }
            }
        }
        return issues;
    }

    private static void Collect(List<TemplateIssue> issues, string field, Action check)
    {
        try
        {
            check();
        }
        catch (ArgumentException problem)
        {
            issues.Add(new(field, problem.Message));
        }
    }

    private static void Collect<T>(List<TemplateIssue> issues, string field, Func<T> check) => Collect(issues, field, () => { check(); });
}
