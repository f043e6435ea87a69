using FilterQA.Core.Measurement;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;

namespace FilterQA.Core.Decisions;

/// <summary>
/// Free limit lines: every sweep point inside the line's span is compared with the line interpolated linearly there;
/// the point with the worst margin decides. An upper boundary is a maximum loss, a lower boundary a minimum loss; a
/// relative line is compared with loss − minimum loss. On a lower boundary a point at the noise floor counts only as
/// floor − margin (a lower bound), as for stopband rejection.
/// </summary>
internal static class LimitLines
{
    public static RuleResult Evaluate(LimitLineRule rule, EvaluationContext c)
    {
        LimitSense sense = rule.Boundary == LimitBoundary.Upper ? LimitSense.AtMost : LimitSense.AtLeast;
        if (!c.IsTransmission)
        {
            return RuleJudge.NotVerifiable(rule, null, sense, "the sweep is a one-port reflection; a limit line is read in transmission");
        }
        double reference = Reference(rule.Anchor, c);
        if (!double.IsFinite(reference))
        {
            return RuleJudge.NotVerifiable(rule, null, sense, "the line follows the measured centre, which could not be measured on this unit");
        }
        ReadOnlySpan<double> f = c.Hz;
        ReadOnlySpan<double> loss = c.LossDb;
        ReadOnlySpan<double> lineHz = rule.FrequenciesHz.AsSpan();
        ReadOnlySpan<double> lineDb = rule.LossDb.AsSpan();
        double startHz = lineHz[0] + reference, stopHz = lineHz[^1] + reference;
        var span = startHz >= 0 ? new Measurement.FrequencyBand(startHz, stopHz) : null;
        if (span is null || !span.IsCoveredBy(f[0], f[^1]))
        {
            return RuleJudge.NotVerifiable(rule, null, sense,
                $"the line {Say.Hz(startHz)} to {Say.Hz(stopHz)} reaches beyond the sweep {Say.Hz(f[0])} to {Say.Hz(f[^1])}");
        }
        BandIndexRange range = BandIndexRange.Of(f, span);
        bool relative = rule.Reference == LossReference.Relative;
        bool upper = rule.Boundary == LimitBoundary.Upper;
        int segment = 1;
        double worstMargin = double.PositiveInfinity, worstValue = 0, worstLimit = 0;
        int worstAt = -1;
        bool worstBound = false;
        for (int i = range.First; i < range.End; i++)
        {
            // Clamp to the line's ends: a point admitted by the band's rounding tolerance reads the end value.
            double x = Math.Clamp(f[i] - reference, lineHz[0], lineHz[^1]);
            while (segment < lineHz.Length - 1 && lineHz[segment] < x)
            {
                segment++;
            }
            double f1 = lineHz[segment - 1], f2 = lineHz[segment];
            double limit = lineDb[segment - 1] + (x - f1) * (lineDb[segment] - lineDb[segment - 1]) / (f2 - f1);
            double value = loss[i];
            bool bound = false;
            if (!upper && c.FloorAt(i) is { } floor && NoiseFloor.IsFloorLimited(value, floor))
            {
                value = Math.Min(value, NoiseFloor.VerifiableLossDb(floor));
                bound = true;
            }
            if (relative)
            {
                value -= c.MinLossDb;
            }
            double margin = upper ? limit - value : value - limit;
            if (margin < worstMargin)
            {
                (worstMargin, worstValue, worstLimit, worstAt, worstBound) = (margin, value, limit, i, bound);
            }
        }
        string name = relative ? "relative loss" : "loss";
        string side = upper ? "upper (maximum-loss)" : "lower (minimum-loss)";
        string measured = worstBound ? $"at least {Say.Db(worstValue)} (at the noise floor)" : Say.Db(worstValue);
        return RuleJudge.Judge(rule, new Reading(worstValue, worstLimit, sense, f[worstAt], worstBound,
            $"{name} {measured} at {Say.Hz(f[worstAt])}, {side} limit line {Say.Db(worstLimit)} there"));
    }

    /// <summary>What the line's frequencies are offsets from: 0, the nominal, or the measured centre (NaN when unknown).</summary>
    public static double Reference(FrequencyAnchor anchor, EvaluationContext c) => anchor switch
    {
        FrequencyAnchor.Absolute => 0,
        FrequencyAnchor.NominalOffset => c.Template.NominalHz,
        _ => c.MeasuredCentreHz,
    };
}
