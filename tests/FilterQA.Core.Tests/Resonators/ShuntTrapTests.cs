using FilterQA.Core.Resonators;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Tests.Resonators;

/// <summary>The worked-example-1 LC as a trap shunted to ground: S21 = 2Z/(2Z + Z0).</summary>
public sealed class ShuntTrapTests
{
    private const double L = 2.2e-6, C = 100e-12, R = 1;
    private static readonly FrequencyGrid Grid = FrequencyGrid.Linear(5e6, 20e6, 2001);

    private static Sweep Trap() => ResonatorSweeps.TwoPort(Grid,
        f => ResonatorSweeps.ShuntS21(ResonatorSweeps.Admittance(f, 0, new MotionalArm(R, L, C))),
        f => ResonatorSweeps.ShuntS11(ResonatorSweeps.Admittance(f, 0, new MotionalArm(R, L, C))));

    private static double LossDb(double hz)
    {
        double w = 2 * Math.PI * hz;
        var z = new System.Numerics.Complex(R, w * L - 1 / (w * C));
        return -20 * Math.Log10((2 * z / (2 * z + ResonatorSweeps.Z0)).Magnitude); // shunt formula S21 = 2Z/(2Z + Z0)
    }

    [Fact]
    public void Trap_notch_is_at_f0_with_the_depth_of_R_to_ground()
    {
        TrapMeasurement t = TrapAnalyzer.Measure(Trap());
        double f0 = 1 / (2 * Math.PI * Math.Sqrt(L * C));
        // At f0, Z = R: S21 = 2R/(2R + Z0) = 2/52, an absolute loss of 28.30 dB.
        double notchLoss = -20 * Math.Log10(2 * R / (2 * R + ResonatorSweeps.Z0));

        // Step 7.5 kHz; the notch is ~1.9 MHz wide between its half-power points of 1 − S21, so the parabola on dB
        // lands within a small part of a step: limit 50 Hz. The loss curve near the bottom varies as
        // 10·log10(R² + X²), which the parabola follows to < 0.01 dB over ±1 step (X = ±0.2 ohm): limit 0.01 dB.
        Assert.Equal(f0, t.NotchHz, 50.0);
        Assert.Equal(notchLoss, t.NotchLossDb, 0.01);
    }

    [Fact]
    public void Trap_depth_is_the_notch_loss_minus_the_worse_shoulder()
    {
        TrapMeasurement t = TrapAnalyzer.Measure(Trap());
        // |S21| of the trap rises monotonically away from f0, so each shoulder's lowest loss is at a span end.
        double passband = Math.Max(LossDb(Grid.StartHz), LossDb(Grid.StopHz));

        Assert.Equal(passband, t.PassbandLossDb!.Value, 1e-9); // sampled points, no interpolation: rounding only
        Assert.Equal(t.NotchLossDb - passband, t.DepthDb!.Value, 1e-9);
        Assert.Empty(t.Warnings);
    }

    [Fact]
    public void Resonator_measurement_of_a_trap_gives_notch_fields_and_the_fitted_LC()
    {
        ResonatorMeasurement m = ResonatorAnalyzer.Measure(Trap(), ResonatorFixture.ShuntToGround);
        double f0 = 1 / (2 * Math.PI * Math.Sqrt(L * C));
        double notchLoss = -20 * Math.Log10(2 * R / (2 * R + ResonatorSweeps.Z0));

        Assert.Equal(f0, m.NotchHz!.Value, 50.0);               // as in the trap measurement
        Assert.Equal(notchLoss, m.NotchLossDb!.Value, 0.01);
        Assert.Equal(f0, m.SeriesHz!.Value, f0 * 1e-9);         // exact model data: solver tolerance
        Assert.Equal(R, m.R1Ohm!.Value, 1e-6 * R);
        // The trap sees the two Z0 ports in parallel: QL = 2π·f0·L/(R + Z0/2).
        double ql = Math.Sqrt(L / C) / (R + ResonatorSweeps.Z0 / 2);
        Assert.Equal(ql, m.LoadedQ!.Value, 1e-6 * ql);
        Assert.Null(m.C0F);
        Assert.Null(m.ParallelHz);
    }

    [Fact]
    public void Trap_whose_notch_is_outside_the_span_reports_no_depth()
    {
        var grid = FrequencyGrid.Linear(12e6, 20e6, 401); // above f0 = 10.73 MHz: the loss is largest at the first point
        var s21 = grid.Hz.ToArray().Select(f => ResonatorSweeps.ShuntS21(ResonatorSweeps.Admittance(f, 0, new MotionalArm(R, L, C)))).ToArray();
        ResponseTrace trace = ResponseTrace.FromComplex(grid, ResponsePath.Transmission, s21);

        TrapMeasurement t = TrapAnalyzer.Measure(trace);

        Assert.Null(t.DepthDb);
        Assert.Null(t.PassbandLossDb);
        Assert.Equal(ResonatorWarningCode.ResonanceAtSpanEdge, Assert.Single(t.Warnings).Code);
    }
}
