using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;

namespace FilterQA.Core.Decisions;

/// <summary>
/// A template's limit lines placed for one stored response, for charts that overlay many units: lines anchored to a
/// measured centre or to the least loss move from unit to unit, so an overlay draws them as for one unit.
/// </summary>
public static class MaskPlacement
{
    /// <summary>
    /// The limit lines of <paramref name="template"/> resolved for <paramref name="trace"/> (loss in dB, positive for
    /// attenuation), judged as a scalar gain trace named <paramref name="label"/>. Empty when the template has none.
    /// </summary>
    /// <exception cref="ArgumentException">The trace cannot be judged against the template (the message says why).</exception>
    public static IReadOnlyList<MaskLine> ForTrace(LimitTemplate template, ResponseTrace trace, string label)
    {
        ArgumentNullException.ThrowIfNull(template);
        ArgumentNullException.ThrowIfNull(trace);
        var gainDb = new double[trace.Grid.Count];
        ReadOnlySpan<double> loss = trace.LossDb;
        for (int i = 0; i < gainDb.Length; i++)
        {
            gainDb[i] = -loss[i]; // a gain trace is the negative of the loss
        }
        Sweep sweep = Sweep.FromScalar(ScalarTrace.Create(trace.Grid, ScalarQuantity.GainDb, gainDb), SweepSource.Of(label, SweepFormat.Synthetic));
        return TemplateEvaluator.Evaluate(template, MeasurementInput.FromSweep(sweep, null, null)).MaskLines;
    }
}
