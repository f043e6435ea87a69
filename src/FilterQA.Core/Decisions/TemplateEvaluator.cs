using FilterQA.Core.Measurement;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;

namespace FilterQA.Core.Decisions;

/// <summary>
/// The decision engine: judges one measured unit against one template revision, rule by rule, and states the verdict.
/// </summary>
/// <remarks>
/// <para><b>Statement per rule</b> (ILAC-G8:09/2019 clause 4.2.3, non-binary, w = the rule's uncertainty U, which
/// <see cref="RuleResult.GuardBand"/> reports): pass when the margin is at least w; conditional pass when it is from 0 to w;
/// conditional fail from −w to 0; fail below −w; see <see cref="NonBinaryStatement"/>. The margin is signed in the rule's
/// unit, positive inside the limit. A two-sided rule reports the side that decides (the failing side with the smaller
/// margin, else a side that cannot be verified, else the side with the smaller margin).</para>
/// <para><b>Verdict</b>: a rule passes under simple acceptance when it is a pass or a conditional pass, under guarded
/// acceptance only when it is a pass (<see cref="UnitEvaluation.Passes"/>). If any rule that is not "not verifiable" does
/// not pass, the unit is no-go; else, if any rule is not verifiable, the unit is not verifiable; else it is go.</para>
/// <para><b>Not verifiable</b> (never a pass, never a plain fail): the value cannot be measured (an edge not reached, a band
/// outside the sweep or without a point, no phase for group delay, no S11/S22 for return loss, no resonator fit, no
/// antiresonance for C0, a notch at the sweep end); or a reading at the noise floor (less than
/// <see cref="NoiseFloor.MarginDb"/> above the floor trace or the estimated floor) whose lower bound, floor − margin, does
/// not meet the limit ("at least X dB" passes when X already meets it). Sweep requirements of the template make rules not
/// verifiable as well, keeping what was measured in the message: a sweep that does not cover the required span, a step
/// coarser than NarrowestFeature/PointsPerFeature, or a thru older than the maximum thru age make EVERY rule not
/// verifiable (the minimum loss every relative level refers to, the outermost edges and the floor estimate use the whole
/// span, and the thru underlies every loss). The step is checked over the whole sweep, except for a resonator, whose sweep
/// is usually segmented: there it is checked within ± NarrowestFeature of the main response. A template that needs the
/// phase makes the rules that need it (group delay) not verifiable when the sweep has none, and on a resonator template
/// every rule (its model is fitted to the complex response). A thru age that is not known (null) is not checked; a
/// warning says so.</para>
/// <para><b>Semantics of the rule kinds</b>. Relative loss = loss − the sampled minimum loss of the main trace; every
/// level (edges, centre, shape factor) is relative. Bandwidth: a minimum is checked on the innermost crossings, a maximum
/// on the outermost (<see cref="EdgeSearch"/>). Centre, series resonance, notch: within ± tolerance of the nominal; in Hz
/// the measured value is the frequency itself against nominal ± tolerance, in ppm it is the deviation
/// (f − nominal)/nominal·10⁶ against ± tolerance. Measured-offset bands follow the measured centre: the centre of the
/// template's first centre-frequency rule (its level and method), else the arithmetic centre of the 3 dB edges; for a
/// resonator the fitted series resonance; for a band-stop part the notch. Insertion loss: the sampled minimum, or the
/// loss at the nominal or a stated frequency by linear interpolation in dB. Stopband rejection: the least loss in the
/// band, relative or absolute per <see cref="LossReference"/>. Spurious responses: local loss minima in the band that
/// stand out by <see cref="SpuriousResponses.DefaultProminenceDb"/>; suppression = their relative loss; a band without one
/// passes with nothing measured. Group-delay variation: max − min over the band with the rule's aperture (0 = neighbouring
/// points). Return loss: the least return loss over the band at the rule's port. Resonator rules come from
/// <see cref="Resonators.ResonatorAnalyzer"/> (the sweep itself, or the thru-normalised trace when a thru was used);
/// unwanted modes in the window other than the main response, suppression = −relative level. Trap rules come from
/// <see cref="Resonators.TrapAnalyzer"/>; a relative notch depth is the depth below the worse shoulder, which is never more
/// than the depth below the minimum loss (conservative). Limit lines: every point inside the line's span against the line
/// interpolated there; the worst margin decides.</para>
/// <para>Mask lines for charts: every limit line and a lower boundary across each stopband at its minimum, in absolute
/// loss (see <see cref="MaskLine"/>).</para>
/// </remarks>
public static class TemplateEvaluator
{
    /// <summary>Relative tolerance on the largest step, as instruments round frequencies (the uniform-grid tolerance of <see cref="SweepAdequacy"/>).</summary>
    private const double StepTolerance = SweepAdequacy.UniformStepTolerance;

    /// <summary>Thru flatness above which a warning is given, dB (common practice, no published source).</summary>
    public const double ThruFlatnessWarningDb = 1.0;

    /// <summary>Judges one unit.</summary>
    /// <param name="template">The template revision.</param>
    /// <param name="input">The unit's measurement.</param>
    /// <returns>The verdict, one result per rule in template order, the warnings and the mask lines.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    public static UnitEvaluation Evaluate(LimitTemplate template, MeasurementInput input)
    {
        ArgumentNullException.ThrowIfNull(template);
        ArgumentNullException.ThrowIfNull(input);
        var c = new EvaluationContext(template, input);
        IReadOnlyList<LimitRule> rules = template.Rules;
        var results = new RuleResult[rules.Count];
        for (int i = 0; i < results.Length; i++)
        {
            results[i] = Judge(rules[i], c);
        }

        string? everyRule = SweepProblem(template.Sweep, c);
        bool noPhase = template.Sweep.NeedsPhase && !c.Trace.HasPhase;
        for (int i = 0; i < results.Length; i++)
        {
            if (everyRule is not null)
            {
                results[i] = RuleJudge.Block(results[i], everyRule);
            }
            else if (noPhase && (rules[i].NeedsPhase || template.Device == DeviceKind.Resonator) && results[i].Outcome != RuleOutcome.NotVerifiable)
            {
                results[i] = RuleJudge.Block(results[i], "the template needs the transmission phase and the sweep holds none");
            }
        }

        List<string> warnings = Warnings(template, c);
        return new UnitEvaluation(VerdictOf(results, template.DecisionRule), Array.AsReadOnly(results), warnings.AsReadOnly(),
            template.PartNumber, template.Revision, template.ContentHash, template.DecisionRule, MaskLines.Build(c));
    }

    /// <summary>If any rule that is verifiable does not pass under the decision rule → no-go; else if any is not verifiable → not verifiable; else go.</summary>
    public static UnitVerdict VerdictOf(IReadOnlyList<RuleResult> results, DecisionRule decisionRule)
    {
        ArgumentNullException.ThrowIfNull(results);
        bool unverifiable = false;
        foreach (RuleResult result in results)
        {
            if (result.Outcome == RuleOutcome.NotVerifiable)
            {
                unverifiable = true;
            }
            else if (!UnitEvaluation.Passes(result.Outcome, decisionRule))
            {
                return UnitVerdict.NoGo;
            }
        }
        return unverifiable ? UnitVerdict.NotVerifiable : UnitVerdict.Go;
    }

    private static RuleResult Judge(LimitRule rule, EvaluationContext c) => rule switch
    {
        CentreFrequencyRule r => FilterRules.Centre(r, c),
        BandwidthRule r => FilterRules.Bandwidth(r, c),
        InsertionLossRule r => FilterRules.InsertionLoss(r, c),
        PassbandRippleRule r => FilterRules.Ripple(r, c),
        StopbandRejectionRule r => FilterRules.Stopband(r, c),
        ShapeFactorRule r => FilterRules.ShapeFactor(r, c),
        SpuriousResponseRule r => FilterRules.Spurious(r, c),
        GroupDelayVariationRule r => FilterRules.GroupDelayVariation(r, c),
        ReturnLossRule r => FilterRules.ReturnLoss(r, c),
        SeriesResonanceRule r => ResonatorRules.SeriesResonance(r, c),
        MotionalResistanceRule r => ResonatorRules.MotionalResistance(r, c),
        ShuntCapacitanceRule r => ResonatorRules.ShuntCapacitance(r, c),
        UnloadedQRule r => ResonatorRules.UnloadedQ(r, c),
        UnwantedModesRule r => ResonatorRules.UnwantedModes(r, c),
        NotchFrequencyRule r => ResonatorRules.NotchFrequency(r, c),
        NotchDepthRule r => ResonatorRules.NotchDepth(r, c),
        LimitLineRule r => LimitLines.Evaluate(r, c),
        _ => throw new ArgumentException($"rule '{rule.Id}' is of a kind the engine does not know ({rule.Kind})", nameof(rule)),
    };

    /// <summary>The sweep requirements that make every rule not verifiable, in plain words; null when all are met.</summary>
    private static string? SweepProblem(SweepRequirements need, EvaluationContext c)
    {
        var problems = new List<string>(3);
        FrequencyGrid grid = c.Trace.Grid;
        if (!new Measurement.FrequencyBand(need.SpanStartHz, need.SpanStopHz).IsCoveredBy(grid.StartHz, grid.StopHz))
        {
            problems.Add($"the sweep {Say.Hz(grid.StartHz)} to {Say.Hz(grid.StopHz)} does not cover the required span {Say.Hz(need.SpanStartHz)} to {Say.Hz(need.SpanStopHz)}");
        }
        double step = c.Template.Device == DeviceKind.Resonator ? StepNearMainResponse(c, need.NarrowestFeatureHz) : grid.MaxStepHz;
        if (step > need.MaximumStepHz * (1 + StepTolerance))
        {
            string where = c.Template.Device == DeviceKind.Resonator ? " near the resonance" : "";
            problems.Add($"the step{where} is {Say.Hz(step)}, coarser than the {Say.Hz(need.MaximumStepHz)} the template allows (narrowest feature {Say.Hz(need.NarrowestFeatureHz)} / {Say.N(need.PointsPerFeature)} points)");
        }
        if (c.Input.ThruAge is { } age && age > TimeSpan.FromSeconds(need.MaximumThruAgeS))
        {
            problems.Add($"the thru is {Say.Hours(age)} old; the template allows {Say.Hours(TimeSpan.FromSeconds(need.MaximumThruAgeS))}");
        }
        return problems.Count == 0 ? null : string.Join("; ", problems);
    }

    /// <summary>Largest step that touches ± <paramref name="halfWidthHz"/> around the main response (peak of a transmission, dip of a reflection).</summary>
    private static double StepNearMainResponse(EvaluationContext c, double halfWidthHz)
    {
        ReadOnlySpan<double> f = c.Hz;
        if (f.Length < 2)
        {
            return double.PositiveInfinity;
        }
        int centre = c.MinIndex;
        if (!c.IsTransmission)
        {
            ReadOnlySpan<double> loss = c.LossDb;
            for (int i = 0; i < loss.Length; i++)
            {
                centre = loss[i] > loss[centre] ? i : centre;
            }
        }
        double low = f[centre] - halfWidthHz, high = f[centre] + halfWidthHz;
        int first = Math.Max(0, BandIndexRange.FirstAtOrAbove(f, low) - 1);
        int last = Math.Min(f.Length - 1, BandIndexRange.FirstAbove(f, high));
        double step = 0;
        for (int k = first; k < last; k++)
        {
            step = Math.Max(step, f[k + 1] - f[k]);
        }
        return step;
    }

    private static List<string> Warnings(LimitTemplate template, EvaluationContext c)
    {
        var warnings = new List<string>();
        MeasurementInput input = c.Input;
        if (input.ThruAge is null)
        {
            warnings.Add($"the thru age is not known (no thru given, or its age not recorded): the sweep is taken as normalised and the template's maximum thru age of {Say.Hours(TimeSpan.FromSeconds(template.Sweep.MaximumThruAgeS))} is not checked");
        }
        if (input.ThruFlatnessDb is { } flatness && flatness > ThruFlatnessWarningDb)
        {
            warnings.Add($"the thru itself varies by {Say.Db(flatness)} over the sweep (more than {Say.LimitDb(ThruFlatnessWarningDb)}); check the cables and fixture");
        }
        bool usesS11 = template.Rules.Any(r => r.ReflectionPort == 1), usesS22 = template.Rules.Any(r => r.ReflectionPort == 2);
        if (template.Sweep.NeedsS11 && input.InputReflection is null && !usesS11)
        {
            warnings.Add("the template asks for S11 and the sweep holds none");
        }
        if (template.Sweep.NeedsS22 && input.OutputReflection is null && !usesS22)
        {
            warnings.Add("the template asks for S22 and the sweep holds none");
        }
        if (template.Device == DeviceKind.BandpassFilter && c.IsTransmission)
        {
            SweepAdequacy.Check(c.Trace, c.Edges(3, EdgeSearch.Innermost), input.ResolutionBandwidthHz, c.Warnings);
        }
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (MeasurementWarning warning in c.Warnings)
        {
            if (seen.Add(warning.Message))
            {
                warnings.Add(warning.Message);
            }
        }
        if (template.Device == DeviceKind.Resonator)
        {
            warnings.AddRange(c.Resonator.Warnings.Select(w => w.Message));
        }
        else if (template.Device == DeviceKind.BandStop && c.IsTransmission)
        {
            warnings.AddRange(c.Trap.Warnings.Select(w => w.Message));
        }
        return warnings;
    }
}
