using System.Numerics;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Synthesis;

namespace FilterQA.Core.Tests.Synthesis;

public class TrapSynthesisTests
{
    private static readonly DemoPart Part = DemoParts.Get("TME-LC92-TRAP");

    // Near the notch |S21|² ≈ 4(R² + X²)/Z0² is quadratic in X (and X is nearly linear in f), so a parabola
    // through the three lowest points of |S21|² finds the notch.
    private static double NotchHz(FrequencyGrid grid, ReadOnlySpan<Complex> s21)
    {
        int best = 1;
        for (int i = 1; i < grid.Count - 1; i++)
        {
            best = s21[i].Magnitude < s21[best].Magnitude ? i : best;
        }
        double y0 = Math.Pow(s21[best - 1].Magnitude, 2), y1 = Math.Pow(s21[best].Magnitude, 2), y2 = Math.Pow(s21[best + 1].Magnitude, 2);
        double step = grid[best + 1] - grid[best];
        return grid[best] + step * (y0 - y2) / (2 * (y0 - 2 * y1 + y2));
    }

    [Fact]
    public void Shunt_trap_model_reproduces_the_worked_example()
    {
        // DOMAIN §9 worked example 1 (computed): L = 2.2 µH, C = 100 pF → f0 = 10.730 MHz. As a shunt across
        // 50 ohm the notch depth is −20·log10(2R/(2R + Z0)) (S21 = 2Z/(2Z + Z0) at Z = R), 28.30 dB for 1 ohm.
        const double l = 2.2e-6, c = 100e-12, r = 1;
        var grid = FrequencyGrid.Linear(10e6, 11.5e6, 1501);
        var s11 = new Complex[grid.Count];
        var s21 = new Complex[grid.Count];
        var s22 = new Complex[grid.Count];
        TrapResponse.Fill(grid.Hz, r, l, c, 50, s11, s21, s22);
        double f0 = 1 / (2 * Math.PI * Math.Sqrt(l * c));
        Assert.Equal(10.730e6, f0, 0.5e3); // printed to 1 kHz
        Assert.Equal(f0, NotchHz(grid, s21), 50.0); // 1 kHz grid; parabola on |S21|², residual ≪ 50 Hz
        double depthDb = -20 * Math.Log10(s21.Min(z => z.Magnitude));
        Assert.Equal(-20 * Math.Log10(2 * r / (2 * r + 50)), depthDb, 0.05); // nearest point within 0.5 kHz of f0
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(500)]
    public void The_notch_is_at_one_over_two_pi_root_LC_of_the_unit_and_within_the_scenario(int serial)
    {
        var synthesiser = new UnitSynthesiser(92);
        DeterministicRandom random = synthesiser.ParameterRandom(Part, serial);
        (_, double l, double c) = ((TrapDesign)Part.Design).Draw(ref random, DefectKind.None);
        double expected = 1 / (2 * Math.PI * Math.Sqrt(l * c));

        Sweep sweep = synthesiser.Unit(Part, serial);
        double notch = NotchHz(sweep.Grid, sweep.Network!.Trace(2, 1));
        Assert.Equal(expected, notch, 5e3); // 40 kHz grid; the tiny asymmetry of X(f) and noise stay < 5 kHz
        Assert.InRange(notch, 90e6, 94e6); // scenario: 92.0 MHz ±2 MHz
        ResponseTrace trace = ResponseTrace.Primary(sweep);
        Assert.True(trace.LossDb.ToArray().Max() >= 25); // scenario: notch depth ≥ 25 dB
    }

    [Fact]
    public void Defects_break_their_own_rule_only()
    {
        var synthesiser = new UnitSynthesiser(92);
        Sweep drift = synthesiser.Unit(Part, 3, DefectKind.CentreDrift);
        Assert.False(Math.Abs(NotchHz(drift.Grid, drift.Network!.Trace(2, 1)) - 92e6) <= 2e6);
        Assert.True(LossAt(drift, 80e6) <= 1 && LossAt(drift, 104e6) <= 1);

        double shallow = ResponseTrace.Primary(synthesiser.Unit(Part, 3, DefectKind.LowRejection)).LossDb.ToArray().Max();
        Assert.True(shallow < 25, $"notch depth {shallow} dB");

        Sweep lossy = synthesiser.Unit(Part, 3, DefectKind.HighLoss);
        Assert.True(LossAt(lossy, 80e6) > 1 && LossAt(lossy, 104e6) > 1);
        Assert.InRange(NotchHz(lossy.Grid, lossy.Network!.Trace(2, 1)), 90e6, 94e6);
    }

    private static double LossAt(Sweep sweep, double hz)
    {
        ResponseTrace trace = ResponseTrace.Primary(sweep);
        int i = 0;
        while (trace.Grid[i] < hz)
        {
            i++;
        }
        return trace.LossDb[i]; // 60 MHz + k·40 kHz hits 80 and 104 MHz exactly
    }
}
