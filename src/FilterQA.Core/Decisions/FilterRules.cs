using FilterQA.Core.Measurement;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;
using MeasurementBand = FilterQA.Core.Measurement.FrequencyBand;

namespace FilterQA.Core.Decisions;

/// <summary>The rules read from a transmission trace: centre, bandwidth, loss, ripple, rejection, shape factor, spurious, group delay, return loss.</summary>
internal static class FilterRules
{
    private const string OnePort = "the sweep is a one-port reflection; this rule needs the transmission";

    public static RuleResult Centre(CentreFrequencyRule rule, EvaluationContext c)
    {
        if (!c.IsTransmission)
        {
            return RuleJudge.NotVerifiable(rule, rule.Tolerance.Value, LimitSense.AtMost, OnePort);
        }
        LevelBandwidth edges = c.Edges(rule.LevelDb, EdgeSearch.Innermost);
        double? centre = rule.Method == CentreMethod.GeometricMean ? edges.GeometricCentreHz : edges.CentreHz;
        if (centre is not { } hz)
        {
            return RuleJudge.NotVerifiable(rule, rule.Tolerance.Value, LimitSense.AtMost, MissingEdges(edges, EdgeSearch.Innermost));
        }
        return Tolerance(rule, rule.Tolerance, hz, c.Template.NominalHz, "centre");
    }

    /// <summary>
    /// A ± tolerance around the nominal. In hertz the readings are the absolute frequency against nominal ± tolerance;
    /// in ppm they are the deviation (f − nominal)/nominal·10⁶ against ± tolerance.
    /// </summary>
    public static RuleResult Tolerance(LimitRule rule, FrequencyTolerance tolerance, double measuredHz, double nominalHz, string name)
    {
        if (tolerance.Unit == ToleranceUnit.PartsPerMillion)
        {
            double ppm = (measuredHz - nominalHz) / nominalHz * 1e6;
            string text = Say.Text($"{name} {Say.PreciseHz(measuredHz)} ({Say.Value(ppm, RuleUnit.PartsPerMillion)}), limit {Say.PreciseHz(nominalHz)} ± {Say.N(tolerance.Value)} ppm");
            return RuleJudge.Judge(rule,
                new Reading(ppm, tolerance.Value, LimitSense.AtMost, measuredHz, false, text),
                new Reading(ppm, -tolerance.Value, LimitSense.AtLeast, measuredHz, false, text));
        }
        string hzText = $"{name} {Say.Hz(measuredHz)}, limit {Say.Hz(nominalHz)} ± {Say.Hz(tolerance.Value)}";
        return RuleJudge.Judge(rule,
            new Reading(measuredHz, nominalHz + tolerance.Value, LimitSense.AtMost, measuredHz, false, hzText),
            new Reading(measuredHz, nominalHz - tolerance.Value, LimitSense.AtLeast, measuredHz, false, hzText));
    }

    public static RuleResult Bandwidth(BandwidthRule rule, EvaluationContext c)
    {
        if (!c.IsTransmission)
        {
            return RuleJudge.NotVerifiable(rule, rule.MinimumHz ?? rule.MaximumHz, rule.MinimumHz is null ? LimitSense.AtMost : LimitSense.AtLeast, OnePort);
        }
        Reading? min = rule.MinimumHz is { } minimum ? Side(rule, c, EdgeSearch.Innermost, minimum, LimitSense.AtLeast) : null;
        Reading? max = rule.MaximumHz is { } maximum ? Side(rule, c, EdgeSearch.Outermost, maximum, LimitSense.AtMost) : null;
        return min is { } low ? RuleJudge.Judge(rule, low, max) : RuleJudge.Judge(rule, max!.Value);
    }

    private static Reading Side(BandwidthRule rule, EvaluationContext c, EdgeSearch search, double limit, LimitSense sense)
    {
        LevelBandwidth edges = c.Edges(rule.LevelDb, search);
        string words = sense == LimitSense.AtLeast ? "at least" : "at most";
        if (edges.BandwidthHz is not { } width)
        {
            return Reading.Missing(limit, sense, MissingEdges(edges, search));
        }
        string which = search == EdgeSearch.Innermost ? "innermost" : "outermost";
        return new Reading(width, limit, sense, null, false,
            $"{Say.N(rule.LevelDb)} dB bandwidth {Say.Hz(width)} ({which} edges {Say.Hz(edges.LowerHz!.Value)} and {Say.Hz(edges.UpperHz!.Value)}), limit {words} {Say.Hz(limit)}");
    }

    private static string MissingEdges(LevelBandwidth edges, EdgeSearch search)
    {
        string side = edges.LowerHz is null && edges.UpperHz is null ? "neither edge" : edges.LowerHz is null ? "the lower edge" : "the upper edge";
        string how = search == EdgeSearch.Innermost ? "is reached in the sweep" : "is held to the sweep end";
        return $"{side} at {Say.N(edges.LevelDb)} dB below the minimum loss {how}";
    }

    public static RuleResult InsertionLoss(InsertionLossRule rule, EvaluationContext c)
    {
        if (!c.IsTransmission)
        {
            return RuleJudge.NotVerifiable(rule, rule.MaximumDb, LimitSense.AtMost, OnePort);
        }
        ReadOnlySpan<double> f = c.Hz;
        double hz;
        double lossDb;
        string where;
        switch (rule.Measure)
        {
            case InsertionLossMeasure.MinimumLoss:
                hz = f[c.MinIndex];
                lossDb = c.MinLossDb;
                where = "minimum loss";
                break;
            default:
                hz = rule.Measure == InsertionLossMeasure.AtNominal ? c.Template.NominalHz : rule.At!.Resolve(c.Template.NominalHz, c.MeasuredCentreHz);
                if (!(hz >= f[0] && hz <= f[^1]))
                {
                    string at = double.IsFinite(hz) ? Say.Hz(hz) : "the measured centre, which could not be measured,";
                    return RuleJudge.NotVerifiable(rule, rule.MaximumDb, LimitSense.AtMost, $"the loss is read at {at} outside the sweep {Say.Hz(f[0])} to {Say.Hz(f[^1])}");
                }
                lossDb = Loss.Interpolate(f, c.LossDb, hz);
                where = "loss";
                break;
        }
        return RuleJudge.Judge(rule, new Reading(lossDb, rule.MaximumDb, LimitSense.AtMost, hz, false,
            $"{where} {Say.Db(lossDb)} at {Say.Hz(hz)}, limit {Say.LimitDb(rule.MaximumDb)}"));
    }

    public static RuleResult Ripple(PassbandRippleRule rule, EvaluationContext c)
    {
        if (!c.IsTransmission)
        {
            return RuleJudge.NotVerifiable(rule, rule.MaximumDb, LimitSense.AtMost, OnePort);
        }
        MeasurementBand? band = c.Resolve(rule.Band);
        if (c.BandProblem(rule.Band, band, "ripple band") is { } problem)
        {
            return RuleJudge.NotVerifiable(rule, rule.MaximumDb, LimitSense.AtMost, problem);
        }
        BandIndexRange range = BandIndexRange.Of(c.Hz, band!);
        double ripple = PassbandRipple.Over(c.LossDb, range)!.Value;
        return RuleJudge.Judge(rule, new Reading(ripple, rule.MaximumDb, LimitSense.AtMost, null, false,
            $"ripple {Say.Db(ripple)} over {Say.Hz(band!.StartHz)} to {Say.Hz(band.StopHz)}, limit {Say.LimitDb(rule.MaximumDb)}"));
    }

    public static RuleResult Stopband(StopbandRejectionRule rule, EvaluationContext c)
    {
        if (!c.IsTransmission)
        {
            return RuleJudge.NotVerifiable(rule, rule.MinimumDb, LimitSense.AtLeast, OnePort);
        }
        MeasurementBand? band = c.Resolve(rule.Band);
        if (c.BandProblem(rule.Band, band, "stopband") is { } problem)
        {
            return RuleJudge.NotVerifiable(rule, rule.MinimumDb, LimitSense.AtLeast, problem);
        }
        NoiseFloorEstimate? estimate = c.Input.HasFloor ? null : c.EstimatedFloor;
        StopbandResult r = StopbandRejection.Over(c.Hz, c.LossDb, c.MinLossDb, band!, c.Input.FloorLossDb, estimate, c.Warnings);
        bool relative = rule.Reference == LossReference.Relative;
        double lossDb = r.AbsoluteLossDb!.Value;
        string name = relative ? "rejection" : "loss";
        if (r.FloorLimited && r.FloorLossDb is { } floor)
        {
            // At the floor the reading is noise: only floor − margin can be claimed (the verifiable dynamic range).
            double bound = Math.Min(lossDb, NoiseFloor.VerifiableLossDb(floor));
            double value = relative ? bound - c.MinLossDb : bound;
            return RuleJudge.Judge(rule, new Reading(value, rule.MinimumDb, LimitSense.AtLeast, r.AtHz, true,
                $"{name} at least {Say.Db(value)} at {Say.Hz(r.AtHz!.Value)} (the reading {Say.Db(relative ? lossDb - c.MinLossDb : lossDb)} is at the noise floor, {Say.Db(floor)} loss, less than {Say.N(NoiseFloor.MarginDb)} dB margin), limit {Say.LimitDb(rule.MinimumDb)}"));
        }
        double measured = relative ? r.MinRejectionDb!.Value : lossDb;
        return RuleJudge.Judge(rule, new Reading(measured, rule.MinimumDb, LimitSense.AtLeast, r.AtHz, false,
            $"{name} {Say.Db(measured)} at {Say.Hz(r.AtHz!.Value)}, limit {Say.LimitDb(rule.MinimumDb)}"));
    }

    public static RuleResult ShapeFactor(ShapeFactorRule rule, EvaluationContext c)
    {
        if (!c.IsTransmission)
        {
            return RuleJudge.NotVerifiable(rule, rule.Maximum, LimitSense.AtMost, OnePort);
        }
        LevelBandwidth narrow = c.Edges(rule.PassLevelDb, EdgeSearch.Innermost);
        LevelBandwidth wide = c.Edges(rule.StopLevelDb, EdgeSearch.Outermost);
        if (narrow.BandwidthHz is not { } narrowHz || narrowHz <= 0)
        {
            return RuleJudge.NotVerifiable(rule, rule.Maximum, LimitSense.AtMost, MissingEdges(narrow, EdgeSearch.Innermost));
        }
        if (wide.BandwidthHz is not { } wideHz)
        {
            return RuleJudge.NotVerifiable(rule, rule.Maximum, LimitSense.AtMost, MissingEdges(wide, EdgeSearch.Outermost));
        }
        double ratio = wideHz / narrowHz;
        return RuleJudge.Judge(rule, new Reading(ratio, rule.Maximum, LimitSense.AtMost, null, false,
            $"shape factor {Say.Value(ratio, RuleUnit.Ratio)} ({Say.N(rule.StopLevelDb)} dB bandwidth {Say.Hz(wideHz)} / {Say.N(rule.PassLevelDb)} dB bandwidth {Say.Hz(narrowHz)}), limit {Say.N(rule.Maximum)}"));
    }

    public static RuleResult Spurious(SpuriousResponseRule rule, EvaluationContext c)
    {
        if (!c.IsTransmission)
        {
            return RuleJudge.NotVerifiable(rule, rule.MinimumSuppressionDb, LimitSense.AtLeast, OnePort);
        }
        MeasurementBand? band = c.Resolve(rule.Band);
        if (c.BandProblem(rule.Band, band, "spurious search band") is { } problem)
        {
            return RuleJudge.NotVerifiable(rule, rule.MinimumSuppressionDb, LimitSense.AtLeast, problem);
        }
        BandIndexRange range = BandIndexRange.Of(c.Hz, band!);
        Reading? worst = null;
        foreach (int peak in LocalResponses.Find(c.LossDb, range.First, range.End, SpuriousResponses.DefaultProminenceDb))
        {
            double loss = c.LossDb[peak];
            bool atFloor = c.FloorAt(peak) is { } floor && NoiseFloor.IsFloorLimited(loss, floor);
            double bound = atFloor ? Math.Min(loss, NoiseFloor.VerifiableLossDb(c.FloorAt(peak)!.Value)) : loss;
            double suppression = bound - c.MinLossDb;
            if (worst is null || suppression < worst.Value.Value)
            {
                string f = Say.Hz(c.Hz[peak]);
                worst = new Reading(suppression, rule.MinimumSuppressionDb, LimitSense.AtLeast, c.Hz[peak], atFloor, atFloor
                    ? $"spurious response at the noise floor at {f}: at least {Say.Db(suppression)} below the passband, limit {Say.LimitDb(rule.MinimumSuppressionDb)}"
                    : $"spurious response {Say.Db(suppression)} below the passband at {f}, limit {Say.LimitDb(rule.MinimumSuppressionDb)}");
            }
        }
        if (worst is { } reading)
        {
            return RuleJudge.Judge(rule, reading);
        }
        return NoResponse(rule, rule.MinimumSuppressionDb, $"no spurious response stands out by {Say.N(SpuriousResponses.DefaultProminenceDb)} dB in {Say.Hz(band!.StartHz)} to {Say.Hz(band.StopHz)}, limit {Say.LimitDb(rule.MinimumSuppressionDb)} below the passband");
    }

    /// <summary>A "every response at least …" rule whose band holds no response: a pass with nothing measured.</summary>
    public static RuleResult NoResponse(LimitRule rule, double limit, string text) =>
        new(rule.Id, rule.Kind, rule.Title, rule.Unit, null, limit, LimitSense.AtLeast, null, rule.Uncertainty, RuleOutcome.Pass, false, null, text);

    public static RuleResult GroupDelayVariation(GroupDelayVariationRule rule, EvaluationContext c)
    {
        if (!c.IsTransmission)
        {
            return RuleJudge.NotVerifiable(rule, rule.MaximumS, LimitSense.AtMost, OnePort);
        }
        if (!c.Trace.HasPhase)
        {
            return RuleJudge.NotVerifiable(rule, rule.MaximumS, LimitSense.AtMost, "the sweep holds no phase, so group delay cannot be measured");
        }
        MeasurementBand? band = c.Resolve(rule.Band);
        if (c.BandProblem(rule.Band, band, "group-delay band") is { } problem)
        {
            return RuleJudge.NotVerifiable(rule, rule.MaximumS, LimitSense.AtMost, problem);
        }
        // An aperture of 0 means neighbouring points: the smallest positive aperture makes GroupDelay use one step.
        double aperture = rule.ApertureHz > 0 ? rule.ApertureHz : double.Epsilon;
        Measurement.GroupDelayVariation? v = GroupDelay.Variation(c.Trace, band!, aperture, c.Warnings);
        if (v is null)
        {
            return RuleJudge.NotVerifiable(rule, rule.MaximumS, LimitSense.AtMost, "group delay could not be measured in the band");
        }
        return RuleJudge.Judge(rule, new Reading(v.VariationS, rule.MaximumS, LimitSense.AtMost, v.MaxAtHz, false,
            $"group-delay variation {Say.Seconds(v.VariationS)} over {Say.Hz(band!.StartHz)} to {Say.Hz(band.StopHz)} ({Say.Seconds(v.MinDelayS)} at {Say.Hz(v.MinAtHz)} to {Say.Seconds(v.MaxDelayS)} at {Say.Hz(v.MaxAtHz)}), limit {Say.Seconds(rule.MaximumS)}"));
    }

    public static RuleResult ReturnLoss(ReturnLossRule rule, EvaluationContext c)
    {
        ResponseTrace? reflection = rule.Port == 1 ? c.Input.InputReflection : c.Input.OutputReflection;
        string name = rule.Port == 1 ? "input return loss (S11)" : "output return loss (S22)";
        if (reflection is null)
        {
            return RuleJudge.NotVerifiable(rule, rule.MinimumDb, LimitSense.AtLeast,
                $"the sweep holds no S{rule.Port}{rule.Port} (a scalar trace{(rule.Port == 2 ? " or a one-port" : "")}), so the {name} cannot be measured");
        }
        MeasurementBand? band = c.Resolve(rule.Band);
        if (c.BandProblem(rule.Band, band, "return-loss band") is { } problem)
        {
            return RuleJudge.NotVerifiable(rule, rule.MinimumDb, LimitSense.AtLeast, problem);
        }
        ReturnLossResult r = Measurement.ReturnLoss.OverBand(reflection, band!, c.Warnings)!;
        return RuleJudge.Judge(rule, new Reading(r.MinReturnLossDb, rule.MinimumDb, LimitSense.AtLeast, r.AtHz, false,
            $"{name} {Say.Db(r.MinReturnLossDb)} at {Say.Hz(r.AtHz)}, limit {Say.LimitDb(rule.MinimumDb)}"));
    }
}
