using System.Numerics;
using FilterQA.Core.Formats;
using FilterQA.Core.Normalisation;
using FilterQA.Core.Numerics;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Tests.Normalisation;

// The device and thru responses below are built from formulas in the test; the expected normalised
// response is the device formula alone. Loss in dB adds for cascaded two-ports when mismatch is
// ignored (definition of dB: 20·log10 of a product is the sum), and phase adds the same way.
public sealed class ThruNormaliserTests
{
    private const double CentreHz = 15e6;

    // Device: an attenuator of 6.0206 dB (20·log10 2) with a slope of 0.5 dB/MHz and 150 ns of delay.
    private static double DeviceLossDb(double f) => 20 * Math.Log10(2) + 0.5 * (f - CentreHz) / 1e6;

    private static double DevicePhaseRad(double f) => -2 * Math.PI * f * 150e-9;

    // Thru: 1 dB of cable loss with 0.3 dB of sinusoidal ripple every 2 MHz, and 100 ns of cable delay.
    private const double RippleDb = 0.3;
    private const double RipplePeriodHz = 2e6;

    private static double ThruLossDb(double f) => 1.0 + RippleDb * Math.Sin(2 * Math.PI * f / RipplePeriodHz);

    private static double ThruPhaseRad(double f) => -2 * Math.PI * f * 100e-9;

    private static ResponseTrace Trace(FrequencyGrid grid, Func<double, double> lossDb, Func<double, double>? phaseRad)
    {
        double[] hz = grid.Hz.ToArray();
        double[] loss = hz.Select(lossDb).ToArray();
        double[] phase = phaseRad is null ? [] : hz.Select(f => PhaseUnwrap.Wrap(phaseRad(f))).ToArray();
        return ResponseTrace.Create(grid, ResponsePath.Transmission, loss, phase);
    }

    [Fact]
    public void Thru_on_the_same_grid_is_removed_exactly_in_loss_and_phase()
    {
        FrequencyGrid grid = FrequencyGrid.Linear(10e6, 20e6, 101);
        ResponseTrace dut = Trace(grid, f => DeviceLossDb(f) + ThruLossDb(f), f => DevicePhaseRad(f) + ThruPhaseRad(f));
        ResponseTrace thru = Trace(grid, ThruLossDb, ThruPhaseRad);

        NormalisedResponse result = ThruNormaliser.Normalise(dut, thru, "thru-0611.s2p");

        Assert.True(result.Response.HasPhase);
        for (int i = 0; i < grid.Count; i++)
        {
            // Tolerance 1e-12 dB: one addition and one subtraction of values below 10 dB in binary64.
            Assert.Equal(DeviceLossDb(grid[i]), result.Response.LossDb[i], 1e-12);
            // Tolerance 1e-9 rad: phases up to 19 rad wrapped and subtracted; compared modulo 2π.
            Assert.Equal(0.0, PhaseUnwrap.Wrap(result.Response.PhaseRad[i] - DevicePhaseRad(grid[i])), 1e-9);
        }
        Assert.Equal("thru-0611.s2p", result.ThruFileName);
    }

    [Fact]
    public void Thru_on_its_own_finer_grid_is_removed_within_the_linear_interpolation_bound()
    {
        FrequencyGrid dutGrid = FrequencyGrid.Linear(10.05e6, 19.95e6, 67);
        FrequencyGrid thruGrid = FrequencyGrid.Linear(9e6, 21e6, 1001);
        ResponseTrace dut = Trace(dutGrid, f => DeviceLossDb(f) + ThruLossDb(f), f => DevicePhaseRad(f) + ThruPhaseRad(f));
        ResponseTrace thru = Trace(thruGrid, ThruLossDb, ThruPhaseRad);

        NormalisedResponse result = ThruNormaliser.Normalise(dut, thru, "thru.csv");

        // Linear interpolation error bound |g − p| ≤ h²/8 · max|g''| (standard numerical-analysis result);
        // for the ripple g'' peaks at RippleDb·(2π/P)². Plus 1e-12 dB for rounding.
        double h = thruGrid.MaxStepHz;
        double bound = h * h / 8 * RippleDb * Math.Pow(2 * Math.PI / RipplePeriodHz, 2) + 1e-12;
        for (int i = 0; i < dutGrid.Count; i++)
        {
            Assert.Equal(DeviceLossDb(dutGrid[i]), result.Response.LossDb[i], bound);
            // The thru phase is linear in f once unwrapped, so interpolation is exact up to rounding
            // (tolerance 1e-9 rad for phases up to 13 rad, compared modulo 2π).
            Assert.Equal(0.0, PhaseUnwrap.Wrap(result.Response.PhaseRad[i] - DevicePhaseRad(dutGrid[i])), 1e-9);
        }
        Assert.Equal(9e6, result.ThruStartHz);
        Assert.Equal(21e6, result.ThruStopHz);
    }

    [Fact]
    public void Thru_flatness_is_the_ripple_over_the_device_span_only()
    {
        // Thru grid 8–22 MHz and device grid 10–20 MHz share every 100 kHz point, so no interpolation.
        // Ripple 0.25·sin(2π(f − 10 MHz)/4 MHz) peaks at 11 MHz and dips at 13 MHz: flatness 2·0.25 = 0.5 dB.
        // A 5 dB fixture resonance outside 10–20 MHz must not count.
        FrequencyGrid dutGrid = FrequencyGrid.Linear(10e6, 20e6, 101);
        FrequencyGrid thruGrid = FrequencyGrid.Linear(8e6, 22e6, 141);
        static double Thru(double f) => 0.8 + 0.25 * Math.Sin(2 * Math.PI * (f - 10e6) / 4e6) + (f < 10e6 || f > 20e6 ? 5.0 : 0.0);
        ResponseTrace thru = Trace(thruGrid, Thru, null);
        ResponseTrace dut = Trace(dutGrid, f => 3.0 + Thru(f), null);

        NormalisedResponse result = ThruNormaliser.Normalise(dut, thru, "thru.csv");

        // Tolerance 1e-12 dB: sin(π/2) and sin(3π/2) are ±1 to within 1e-16 in binary64.
        Assert.Equal(0.5, result.ThruFlatnessDb, 1e-12);
        Assert.Equal(Thru(11e6), result.ThruLossDb[10], 1e-12);
        Assert.All(result.Response.LossDb.ToArray(), loss => Assert.Equal(3.0, loss, 1e-12));
        Assert.False(result.Response.HasPhase);
    }

    [Fact]
    public void Thru_that_does_not_cover_the_sweep_is_refused_naming_both_spans()
    {
        ResponseTrace thru = Trace(FrequencyGrid.Linear(10e6, 20e6, 11), ThruLossDb, null);
        ResponseTrace dut = Trace(FrequencyGrid.Linear(9e6, 20e6, 12), ThruLossDb, null);

        var error = Assert.Throws<SweepReadException>(() => ThruNormaliser.Normalise(dut, thru, "thru-short.csv"));

        Assert.Equal(("thru-short.csv", 0, 0), (error.FileName, error.Line, error.Column));
        Assert.Contains("covers 10000000\u201320000000 Hz but the sweep needs 9000000\u201320000000 Hz", error.Problem, StringComparison.Ordinal);
    }

    [Fact]
    public void Reflection_thru_is_refused_and_reflection_device_is_a_usage_error()
    {
        FrequencyGrid grid = FrequencyGrid.Linear(10e6, 20e6, 3);
        ResponseTrace transmission = Trace(grid, ThruLossDb, null);
        ResponseTrace reflection = ResponseTrace.Create(grid, ResponsePath.InputReflection, [10.0, 12.0, 14.0]);

        var error = Assert.Throws<SweepReadException>(() => ThruNormaliser.Normalise(transmission, reflection, "open.s1p"));
        Assert.Contains("reflection trace", error.Problem, StringComparison.Ordinal);
        Assert.Throws<ArgumentException>(() => ThruNormaliser.Normalise(reflection, transmission, "thru.s2p"));
    }

    [Fact]
    public void One_port_thru_sweep_is_refused()
    {
        FrequencyGrid grid = FrequencyGrid.Linear(10e6, 20e6, 3);
        var s = new Complex[3, 1, 1];
        Sweep onePort = Sweep.FromNetwork(NetworkData.Create(grid, s, [50.0]), SweepSource.Of("load.s1p", SweepFormat.Touchstone1));
        Sweep dut = Sweep.FromScalar(ScalarTrace.Create(grid, ScalarQuantity.GainDb, [-1.0, -2.0, -3.0]), SweepSource.Of("dut.csv", SweepFormat.DelimitedText));

        var error = Assert.Throws<SweepReadException>(() => ThruNormaliser.Normalise(dut, onePort));

        Assert.Equal("load.s1p", error.FileName);
    }

    [Fact]
    public void Phase_is_present_only_when_both_traces_have_it()
    {
        FrequencyGrid grid = FrequencyGrid.Linear(10e6, 20e6, 5);
        ResponseTrace withPhase = Trace(grid, ThruLossDb, ThruPhaseRad);
        ResponseTrace without = Trace(grid, ThruLossDb, null);

        Assert.False(ThruNormaliser.Normalise(withPhase, without, "t").Response.HasPhase);
        Assert.False(ThruNormaliser.Normalise(without, withPhase, "t").Response.HasPhase);
        Assert.True(ThruNormaliser.Normalise(withPhase, withPhase, "t").Response.HasPhase);
    }

    [Fact]
    public void Stepped_generator_dBm_trace_normalised_by_a_dBm_thru_gives_the_relative_gain()
    {
        // Stepped source and spectrum analyser in max-hold (DOMAIN section 4): the analyser reads
        // P = P_source − cable − device. Source level −10 dBm with 0.4 dB of flatness error, 0.5 dB of
        // cable; device: a band-pass of 3 dB insertion loss at 70 MHz rising 0.1 dB per (100 kHz)².
        FrequencyGrid grid = FrequencyGrid.Linear(69e6, 71e6, 21);
        static double SourceDbm(double f) => -10 + 0.4 * Math.Cos(2 * Math.PI * f / 1.3e6);
        static double DeviceLossDb(double f) => 3 + 0.1 * Math.Pow((f - 70e6) / 100e3, 2);
        double[] hz = grid.Hz.ToArray();
        double[] thruDbm = hz.Select(f => SourceDbm(f) - 0.5).ToArray();
        double[] dutDbm = hz.Select(f => SourceDbm(f) - 0.5 - DeviceLossDb(f)).ToArray();
        Sweep thru = Sweep.FromScalar(ScalarTrace.Create(grid, ScalarQuantity.PowerDbm, thruDbm), SweepSource.Of("thru-sa.csv", SweepFormat.DelimitedText));
        Sweep dut = Sweep.FromScalar(ScalarTrace.Create(grid, ScalarQuantity.PowerDbm, dutDbm), SweepSource.Of("unit-0042-sa.csv", SweepFormat.DelimitedText));

        NormalisedResponse result = ThruNormaliser.Normalise(dut, thru);

        for (int i = 0; i < grid.Count; i++)
        {
            // Relative loss (−P_dut) − (−P_thru) = device loss. Tolerance 1e-12 dB: two subtractions of values below 25.
            Assert.Equal(DeviceLossDb(hz[i]), result.Response.LossDb[i], 1e-12);
        }
        Assert.Equal("thru-sa.csv", result.ThruFileName);
    }

    [Fact]
    public void Power_trace_with_a_gain_thru_is_refused()
    {
        FrequencyGrid grid = FrequencyGrid.Linear(69e6, 71e6, 3);
        Sweep gainThru = Sweep.FromScalar(ScalarTrace.Create(grid, ScalarQuantity.GainDb, [-0.5, -0.5, -0.5]), SweepSource.Of("thru.csv", SweepFormat.DelimitedText));
        Sweep powerDut = Sweep.FromScalar(ScalarTrace.Create(grid, ScalarQuantity.PowerDbm, [-20.0, -13.0, -20.0]), SweepSource.Of("dut.csv", SweepFormat.DelimitedText));

        var error = Assert.Throws<SweepReadException>(() => ThruNormaliser.Normalise(powerDut, gainThru));
        var reverse = Assert.Throws<SweepReadException>(() => ThruNormaliser.Normalise(gainThru, powerDut));

        Assert.Contains("power trace in dBm but the thru reference is a gain", error.Problem, StringComparison.Ordinal);
        Assert.Contains("thru reference is a power trace", reverse.Problem, StringComparison.Ordinal);
    }
}
