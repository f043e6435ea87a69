using FilterQA.Core.Measurement;
using FilterQA.Core.Resonators;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;
using MeasurementBand = FilterQA.Core.Measurement.FrequencyBand;

namespace FilterQA.Core.Decisions;

/// <summary>The rules read from the resonator fit (<see cref="ResonatorAnalyzer"/>) and the trap analysis (<see cref="TrapAnalyzer"/>).</summary>
internal static class ResonatorRules
{
    public static RuleResult SeriesResonance(SeriesResonanceRule rule, EvaluationContext c)
    {
        ResonatorMeasurement m = c.Resonator;
        return m.SeriesHz is { } fs
            ? FilterRules.Tolerance(rule, rule.Tolerance, fs, c.Template.NominalHz, "series resonance")
            : RuleJudge.NotVerifiable(rule, rule.Tolerance.Value, LimitSense.AtMost, NotFitted(m, "the series resonance"));
    }

    public static RuleResult MotionalResistance(MotionalResistanceRule rule, EvaluationContext c)
    {
        ResonatorMeasurement m = c.Resonator;
        return m.R1Ohm is { } r1
            ? RuleJudge.Judge(rule, new Reading(r1, rule.MaximumOhm, LimitSense.AtMost, m.SeriesHz, false,
                $"R1 {Say.Value(r1, RuleUnit.Ohm)}, limit {Say.N(rule.MaximumOhm)} ohm"))
            : RuleJudge.NotVerifiable(rule, rule.MaximumOhm, LimitSense.AtMost, NotFitted(m, "R1"));
    }

    public static RuleResult ShuntCapacitance(ShuntCapacitanceRule rule, EvaluationContext c)
    {
        ResonatorMeasurement m = c.Resonator;
        if (m.C0F is { } c0)
        {
            return RuleJudge.Judge(rule, new Reading(c0, rule.MaximumF, LimitSense.AtMost, m.ParallelHz, false,
                $"C0 {Say.Value(c0, RuleUnit.Farad)}, limit {Say.Value(rule.MaximumF, RuleUnit.Farad)}"));
        }
        return RuleJudge.NotVerifiable(rule, rule.MaximumF, LimitSense.AtMost, m.SeriesHz is null
            ? NotFitted(m, "C0")
            : "the span holds no antiresonance, so C0 is not measured");
    }

    public static RuleResult UnloadedQ(UnloadedQRule rule, EvaluationContext c)
    {
        ResonatorMeasurement m = c.Resonator;
        return m.UnloadedQ is { } q
            ? RuleJudge.Judge(rule, new Reading(q, rule.MinimumQ, LimitSense.AtLeast, m.SeriesHz, false,
                $"unloaded Q {Say.Value(q, RuleUnit.Ratio)}, limit {Say.Value(rule.MinimumQ, RuleUnit.Ratio)}"))
            : RuleJudge.NotVerifiable(rule, rule.MinimumQ, LimitSense.AtLeast, NotFitted(m, "the unloaded Q"));
    }

    public static RuleResult UnwantedModes(UnwantedModesRule rule, EvaluationContext c)
    {
        MeasurementBand? window = c.Resolve(rule.Window);
        if (window is null)
        {
            return RuleJudge.NotVerifiable(rule, rule.MinimumSuppressionDb, LimitSense.AtLeast, rule.Window.Anchor == FrequencyAnchor.MeasuredOffset
                ? NotFitted(c.Resonator, "the series resonance the window follows")
                : "the window lies below 0 Hz");
        }
        ReadOnlySpan<double> f = c.Hz;
        if (!window.IsCoveredBy(f[0], f[^1]))
        {
            return RuleJudge.NotVerifiable(rule, rule.MinimumSuppressionDb, LimitSense.AtLeast,
                $"the window {Say.PreciseHz(window.StartHz)} to {Say.PreciseHz(window.StopHz)} reaches beyond the sweep {Say.Hz(f[0])} to {Say.Hz(f[^1])}");
        }
        UnwantedMode? worst = null;
        foreach (UnwantedMode mode in c.Resonator.UnwantedModes)
        {
            if (window.Contains(mode.Hz) && (worst is null || mode.RelativeDb > worst.RelativeDb))
            {
                worst = mode;
            }
        }
        if (worst is null)
        {
            return FilterRules.NoResponse(rule, rule.MinimumSuppressionDb,
                $"no unwanted mode in {Say.PreciseHz(window.StartHz)} to {Say.PreciseHz(window.StopHz)}, limit {Say.LimitDb(rule.MinimumSuppressionDb)} below the main response");
        }
        double suppression = -worst.RelativeDb;
        return RuleJudge.Judge(rule, new Reading(suppression, rule.MinimumSuppressionDb, LimitSense.AtLeast, worst.Hz, false,
            $"strongest unwanted mode {Say.Db(suppression)} below the main response at {Say.PreciseHz(worst.Hz)}, limit {Say.LimitDb(rule.MinimumSuppressionDb)}"));
    }

    public static RuleResult NotchFrequency(NotchFrequencyRule rule, EvaluationContext c)
    {
        if (!c.IsTransmission)
        {
            return RuleJudge.NotVerifiable(rule, rule.Tolerance.Value, LimitSense.AtMost, "the sweep is a one-port reflection; a notch is read in transmission");
        }
        TrapMeasurement t = c.Trap;
        return t.DepthDb is null
            ? RuleJudge.NotVerifiable(rule, rule.Tolerance.Value, LimitSense.AtMost, AtEdge(t))
            : FilterRules.Tolerance(rule, rule.Tolerance, t.NotchHz, c.Template.NominalHz, "notch");
    }

    public static RuleResult NotchDepth(NotchDepthRule rule, EvaluationContext c)
    {
        if (!c.IsTransmission)
        {
            return RuleJudge.NotVerifiable(rule, rule.MinimumDb, LimitSense.AtLeast, "the sweep is a one-port reflection; a notch is read in transmission");
        }
        TrapMeasurement t = c.Trap;
        if (t.DepthDb is not { } depth || t.PassbandLossDb is not { } shoulder)
        {
            return RuleJudge.NotVerifiable(rule, rule.MinimumDb, LimitSense.AtLeast, AtEdge(t));
        }
        bool relative = rule.Reference == LossReference.Relative;
        int index = Nearest(c.Hz, t.NotchHz);
        if (c.FloorAt(index) is { } floor && NoiseFloor.IsFloorLimited(t.NotchLossDb, floor))
        {
            double bound = Math.Min(t.NotchLossDb, NoiseFloor.VerifiableLossDb(floor));
            double value = relative ? bound - shoulder : bound;
            return RuleJudge.Judge(rule, new Reading(value, rule.MinimumDb, LimitSense.AtLeast, t.NotchHz, true,
                $"notch at the noise floor at {Say.Hz(t.NotchHz)}: depth at least {Say.Db(value)}, limit {Say.LimitDb(rule.MinimumDb)}"));
        }
        double measured = relative ? depth : t.NotchLossDb;
        string what = relative ? $"notch depth {Say.Db(measured)} below the passband ({Say.Db(shoulder)} loss on the worse side)" : $"notch loss {Say.Db(measured)}";
        return RuleJudge.Judge(rule, new Reading(measured, rule.MinimumDb, LimitSense.AtLeast, t.NotchHz, false,
            $"{what} at {Say.Hz(t.NotchHz)}, limit {Say.LimitDb(rule.MinimumDb)}"));
    }

    private static string AtEdge(TrapMeasurement t) =>
        $"the largest loss is at the end of the sweep ({Say.Hz(t.NotchHz)}); the notch may lie outside the span";

    private static string NotFitted(ResonatorMeasurement m, string what)
    {
        string why = m.Warnings.Count > 0 ? ": " + m.Warnings[0].Message : "";
        return $"{what} could not be measured; the resonator model was not fitted{why}";
    }

    private static int Nearest(ReadOnlySpan<double> f, double hz)
    {
        int i = BandIndexRange.FirstAtOrAbove(f, hz);
        if (i >= f.Length)
        {
            return f.Length - 1;
        }
        return i > 0 && hz - f[i - 1] < f[i] - hz ? i - 1 : i;
    }
}
