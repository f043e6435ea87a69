using FilterQA.Core.Formats;
using FilterQA.Core.Numerics;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Normalisation;

/// <summary>
/// Divides a thru reference out of a device measurement (in dB: subtracts its loss), on the device's
/// grid: the thru is interpolated linearly in dB onto the device frequencies, its phase unwrapped
/// first. The thru must be measured with the same settings and cover the device's span.
/// </summary>
/// <remarks>
/// Works the same for dBm power traces of a stepped generator with a spectrum analyser:
/// <see cref="ResponseTrace.Primary"/> reads a power trace as loss = −P (dBm), so
/// (−P<sub>dut</sub>) − (−P<sub>thru</sub>) is the device's loss relative to the thru, in dB.
/// A thru that cannot be used is reported with <see cref="SweepReadException"/> (file name = the thru's,
/// line and column 0): the exception is reused for "a file that cannot be used", not only "cannot be read".
/// </remarks>
public static class ThruNormaliser
{
    /// <summary>Normalises a device transmission trace by a thru transmission trace.</summary>
    /// <param name="dut">The device trace; must be a transmission path.</param>
    /// <param name="thru">The thru reference; must be a transmission path covering the device's span.</param>
    /// <param name="thruFileName">Name of the thru file, used in errors and kept in the result.</param>
    /// <returns>The normalised trace on the device grid, the thru loss on that grid and its flatness.</returns>
    /// <exception cref="SweepReadException">The thru is a reflection trace, or does not cover the device's span (within 1e-9 relative).</exception>
    /// <exception cref="ArgumentException"><paramref name="dut"/> is a reflection trace: a thru normalises transmission only.</exception>
    public static NormalisedResponse Normalise(ResponseTrace dut, ResponseTrace thru, string thruFileName)
    {
        ArgumentNullException.ThrowIfNull(dut);
        ArgumentNullException.ThrowIfNull(thru);
        ArgumentNullException.ThrowIfNull(thruFileName);
        if (dut.Path != ResponsePath.Transmission)
        {
            throw new ArgumentException($"a thru normalises transmission only; the device trace is {dut.Path}", nameof(dut));
        }
        if (thru.Path != ResponsePath.Transmission)
        {
            throw new SweepReadException(thruFileName, 0, 0,
                $"the thru reference is a reflection trace ({thru.Path}); expected a transmission measurement (S21 of a two-port, or a scalar trace)");
        }
        FrequencyGrid grid = dut.Grid;
        var thruLoss = new double[grid.Count];
        if (!LinearResampler.TryResample(thru.Grid, thru.LossDb, grid, thruLoss))
        {
            throw new SweepReadException(thruFileName, 0, 0, LinearResampler.CoverageProblem("the thru reference", thru.Grid, grid)
                + "; measure the thru over at least the sweep's span with the same settings");
        }
        ReadOnlySpan<double> dutLoss = dut.LossDb;
        var loss = new double[grid.Count];
        for (int i = 0; i < loss.Length; i++)
        {
            loss[i] = dutLoss[i] - thruLoss[i];
        }
        double[]? phase = null;
        if (dut.HasPhase && thru.HasPhase)
        {
            // Interpolating a wrapped phase across a ±π jump would give nonsense; unwrap on the thru grid first.
            double[] thruPhase = LinearResampler.Resample(thru.Grid, PhaseUnwrap.Unwrap(thru.PhaseRad), grid);
            ReadOnlySpan<double> dutPhase = dut.PhaseRad;
            phase = new double[grid.Count];
            for (int i = 0; i < phase.Length; i++)
            {
                phase[i] = PhaseUnwrap.Wrap(dutPhase[i] - thruPhase[i]);
            }
        }
        return new NormalisedResponse(ResponseTrace.Own(grid, ResponsePath.Transmission, loss, phase), thruLoss, thru.Grid.StartHz, thru.Grid.StopHz, thruFileName);
    }

    /// <summary>
    /// Normalises the primary path of <paramref name="dut"/> (see <see cref="ResponseTrace.Primary"/>) by that
    /// of <paramref name="thru"/>, after checking that both are of one kind: a dBm power trace needs a dBm
    /// thru, and a gain (network data or a dB trace) needs a gain thru.
    /// </summary>
    /// <exception cref="SweepReadException">The thru is of the other kind, is a one-port (reflection), or does not cover the device's span.</exception>
    /// <exception cref="ArgumentException">The device sweep is a one-port (reflection).</exception>
    public static NormalisedResponse Normalise(Sweep dut, Sweep thru)
    {
        ArgumentNullException.ThrowIfNull(dut);
        ArgumentNullException.ThrowIfNull(thru);
        bool dutIsPower = dut.Scalar?.Quantity == ScalarQuantity.PowerDbm;
        bool thruIsPower = thru.Scalar?.Quantity == ScalarQuantity.PowerDbm;
        if (dutIsPower != thruIsPower)
        {
            throw new SweepReadException(thru.Source.FileName, 0, 0, dutIsPower
                ? "the sweep is a power trace in dBm but the thru reference is a gain; expected a dBm thru taken with the same source and analyser settings"
                : "the thru reference is a power trace in dBm but the sweep is a gain; expected a gain (dB or network) thru");
        }
        return Normalise(ResponseTrace.Primary(dut), ResponseTrace.Primary(thru), thru.Source.FileName);
    }
}
