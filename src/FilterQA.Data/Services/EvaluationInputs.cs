using FilterQA.Core.Decisions;
using FilterQA.Core.Formats;
using FilterQA.Core.Normalisation;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;

namespace FilterQA.Data.Services;

/// <summary>
/// The one way a stored or received sweep becomes the input of an evaluation, shared by the intake (which judges a
/// new sweep) and the what-if (which judges stored ones again), so that both see the same response.
/// </summary>
internal static class EvaluationInputs
{
    /// <summary>
    /// The input the intake judges: the sweep normalised by <paramref name="thru"/> when one applies, else the sweep as
    /// it is (a calibrated network analyser, or a reflection measurement).
    /// </summary>
    /// <exception cref="SweepReadException">The thru cannot be used for this sweep, or the sweep cannot be evaluated.</exception>
    internal static MeasurementInput FromSweep(Sweep sweep, Sweep? thru, TimeSpan? thruAge, string fileName)
    {
        try
        {
            NormalisedResponse? normalised = thru is null ? null : ThruNormaliser.Normalise(sweep, thru);
            return MeasurementInput.FromSweep(sweep, normalised, thruAge);
        }
        catch (ArgumentException e)
        {
            throw new SweepReadException(fileName, 0, 0, $"the sweep cannot be evaluated: {e.Message}", e);
        }
    }

    /// <summary>
    /// An input from a stored compact trace (the response the recorded evaluation used, already normalised): read as a
    /// gain trace (gain = −loss), which the engine turns back into the same loss. It has no S11/S22 and no complex
    /// network data, so it serves only templates for which <see cref="WhyOriginalNeeded"/> is null.
    /// </summary>
    internal static MeasurementInput FromCompactTrace(ResponseTrace trace, TimeSpan? thruAge, string what)
    {
        ReadOnlySpan<double> loss = trace.LossDb;
        var gainDb = new double[loss.Length];
        for (int i = 0; i < gainDb.Length; i++)
        {
            gainDb[i] = -loss[i];
        }
        double[]? phaseDeg = null;
        if (trace.HasPhase)
        {
            ReadOnlySpan<double> rad = trace.PhaseRad;
            phaseDeg = new double[rad.Length];
            for (int i = 0; i < phaseDeg.Length; i++)
            {
                phaseDeg[i] = rad[i] * (180.0 / Math.PI);
            }
        }
        Sweep sweep = Sweep.FromScalar(ScalarTrace.Create(trace.Grid, ScalarQuantity.GainDb, gainDb, phaseDeg), SweepSource.Of(what, SweepFormat.Synthetic));
        return MeasurementInput.FromSweep(sweep, null, thruAge);
    }

    /// <summary>
    /// Null when the compact trace (transmission loss and phase only) is all <paramref name="template"/> needs; else why
    /// the original sweep file must be read: a resonator template fits its model to the complex response and its
    /// reference impedance, and a return-loss rule needs S11 or S22.
    /// </summary>
    internal static string? WhyOriginalNeeded(LimitTemplate template)
    {
        if (template.Device == DeviceKind.Resonator)
        {
            return "a resonator template fits its model to the complex network data of the original sweep";
        }
        return template.Rules.FirstOrDefault(r => r.ReflectionPort is not null) is { } rule
            ? $"rule '{rule.Id}' reads the reflection at port {rule.ReflectionPort}, which only the original sweep holds"
            : null;
    }
}
