using System.Numerics;
using FilterQA.Core.Decisions;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;

namespace FilterQA.Core.Tests.Decisions;

// Resonator and trap rules on responses written from their circuit models (DOMAIN 3): the series-through fixture
// S21 = 2Z0/(2Z0 + Z), S11 = Z/(2Z0 + Z); the shunt trap S21 = 2Z/(2Z + Z0). Crystal values of worked example 2:
// fs = 10.000000 MHz, C1 = 20 fF, C0 = 5 pF, R1 = 10 ohm → L1 = 12.665 mH, Q = 79 577.
public class ResonatorRuleTests
{
    private const double Fs = 10e6, C1 = 20e-15, R1 = 10, C0 = 5e-12, Z0 = 50;
    private static readonly double L1 = 1 / (Math.Pow(2 * Math.PI * Fs, 2) * C1);
    private static readonly double Q = 1 / (2 * Math.PI * Fs * C1 * R1);

    private static Complex Arm(double hz, double r, double l, double c)
    {
        double w = 2 * Math.PI * hz;
        return new Complex(r, w * l - 1 / (w * c));
    }

    /// <summary>The crystal (optionally with C0, optionally with an unwanted mode) in the series fixture.</summary>
    private static Sweep Crystal(FrequencyGrid grid, double c0F, (double Hz, double ROhm)? mode = null)
    {
        Complex Z(double hz)
        {
            Complex y = 1 / Arm(hz, R1, L1, C1) + new Complex(0, 2 * Math.PI * hz * c0F);
            if (mode is { } m)
            {
                // Same L1, C chosen to resonate at the mode's frequency.
                y += 1 / Arm(hz, m.ROhm, L1, 1 / (Math.Pow(2 * Math.PI * m.Hz, 2) * L1));
            }
            return 1 / y;
        }
        return Units.TwoPort(grid, hz => 2 * Z0 / (2 * Z0 + Z(hz)), hz => Z(hz) / (2 * Z0 + Z(hz)), Z0);
    }

    private static LimitTemplate CrystalTemplate(FrequencyGrid grid, params LimitRule[] rules) =>
        Units.Template(DecisionRule.GuardedAcceptance, Fs, grid.StartHz, grid.StopHz, rules, DeviceKind.Resonator,
            narrowestFeatureHz: 1000, pointsPerFeature: 10, needsPhase: true);

    [Fact]
    public void Crystal_rules_from_the_fitted_model()
    {
        var grid = FrequencyGrid.Linear(Fs - 20e3, Fs + 40e3, 3001); // 20 Hz step; fp = 10.019980 MHz inside
        LimitTemplate template = CrystalTemplate(grid,
            new SeriesResonanceRule("fs", "fs", new FrequencyTolerance(20, ToleranceUnit.PartsPerMillion), 0.5),
            new MotionalResistanceRule("r1", "r1", 9, 0.5),
            new ShuntCapacitanceRule("c0", "c0", 5.1e-12, 0.2e-12),
            new UnloadedQRule("q", "q", 80_000, 1500));
        UnitEvaluation e = Units.Evaluate(template, Crystal(grid, C0));

        // Tolerances: the fit on noise-free data recovers the model to about 1e-7 relative (the resonator tests hold it to
        // that); the tolerances here are looser still.
        RuleResult fs = e.Rules[0];
        Assert.Equal(0, fs.MeasuredValue!.Value, 0.01);    // ppm from nominal
        Assert.Equal(20, fs.Margin!.Value, 0.01);
        Assert.Equal(RuleOutcome.Pass, fs.Outcome);
        RuleResult r1 = e.Rules[1];
        Assert.Equal(R1, r1.MeasuredValue!.Value, 0.001);
        Assert.Equal(9 - R1, r1.Margin!.Value, 0.001);   // 1 ohm over, beyond w = 0.5 ohm
        Assert.Equal(RuleOutcome.Fail, r1.Outcome);
        RuleResult c0 = e.Rules[2];
        Assert.Equal(5.1e-12 - C0, c0.Margin!.Value, 1e-15);
        Assert.Equal(RuleOutcome.ConditionalPass, c0.Outcome); // 0.1 pF inside, w = 0.2 pF
        RuleResult q = e.Rules[3];
        Assert.Equal(Q - 80_000, q.Margin!.Value, 1.0);      // −422.5, inside w = 1500
        Assert.Equal(RuleOutcome.ConditionalFail, q.Outcome);
        Assert.Equal(UnitVerdict.NoGo, e.Verdict);
    }

    [Fact]
    public void Unwanted_mode_suppression_and_C0_without_antiresonance()
    {
        // No C0, so no antiresonance: C0 is not verifiable. A mode at fs + 100 kHz with 300 ohm lies
        // 20·log10((300 + 2Z0)/(R1 + 2Z0)) = 20·log10(400/110) = 11.21 dB below the main response (DOMAIN 3).
        var grid = FrequencyGrid.Linear(Fs - 20e3, Fs + 150e3, 6801); // 25 Hz step
        LimitTemplate template = CrystalTemplate(grid,
            new ShuntCapacitanceRule("c0", "c0", 5e-12, 0.2e-12),
            new UnwantedModesRule("modes", "modes", new FrequencyBand(FrequencyAnchor.MeasuredOffset, 0, 140e3), 12, 0.5));
        UnitEvaluation e = Units.Evaluate(template, Crystal(grid, 0, (Fs + 100e3, 300)));
        Assert.Equal(RuleOutcome.NotVerifiable, e.Rules[0].Outcome);
        Assert.Contains("no antiresonance", e.Rules[0].Message);
        RuleResult modes = e.Rules[1];
        double expected = 20 * Math.Log10(400.0 / 110.0);
        // 0.05 dB: the main arm's reactance (about 16 kohm at the mode) shifts the mode's peak by far less.
        Assert.Equal(expected, modes.MeasuredValue!.Value, 0.05);
        Assert.Equal(expected - 12, modes.Margin!.Value, 0.05);
        Assert.Equal(RuleOutcome.Fail, modes.Outcome);
        // 100 Hz: the main arm's parallel reactance pulls the mode's peak by tens of hertz (its 3 dB width is about 5 kHz).
        Assert.Equal(Fs + 100e3, modes.AtHz!.Value, 100.0);
    }

    [Fact]
    public void Trap_notch_frequency_and_depth()
    {
        // Series R-L-C shunt trap, f0 = 92 MHz, √(L/C) = 330 ohm, R = 0.825 ohm; |S21| at f0 = 2R/(2R + Z0).
        const double f0 = 92e6, x0 = 330, r = 0.825;
        double l = x0 / (2 * Math.PI * f0), c = 1 / (2 * Math.PI * f0 * x0);
        var grid = FrequencyGrid.Linear(70e6, 114e6, 881); // 50 kHz step, f0 on a point
        Complex S21(double hz)
        {
            Complex z = Arm(hz, r, l, c);
            return 2 * z / (2 * z + Z0);
        }
        LimitTemplate template = Units.Template(DecisionRule.SimpleAcceptance, f0, 70e6, 114e6,
        [
            new NotchFrequencyRule("notch", "notch", new FrequencyTolerance(2e6, ToleranceUnit.Hertz), 100e3),
            new NotchDepthRule("depth", "depth", 30, LossReference.Relative, 1),
            new NotchDepthRule("loss", "loss", 28, LossReference.Absolute, 1),
        ], DeviceKind.BandStop);
        UnitEvaluation e = Units.Evaluate(template, Units.TwoPort(grid, S21, hz => S21(hz) - 1));

        double notchLoss = -20 * Math.Log10(2 * r / (2 * r + Z0));
        // Worse shoulder: the larger of the two sides' least loss, from the model at the grid points.
        double below = double.PositiveInfinity, above = double.PositiveInfinity;
        for (int i = 0; i < grid.Count; i++)
        {
            double loss = -20 * Math.Log10(S21(grid[i]).Magnitude);
            if (grid[i] < f0) { below = Math.Min(below, loss); }
            if (grid[i] > f0) { above = Math.Min(above, loss); }
        }
        double depth = notchLoss - Math.Max(below, above);
        // Notch frequency within a tenth of the 50 kHz step (parabola refinement on a symmetric notch).
        Assert.Equal(f0, e.Rules[0].MeasuredValue!.Value, 5e3);
        Assert.Equal(RuleOutcome.Pass, e.Rules[0].Outcome);
        // Depth: 0.05 dB for the parabola vertex against the point value at f0.
        Assert.Equal(depth, e.Rules[1].MeasuredValue!.Value, 0.05);
        // About 29.9 dB against at least 30 dB, within w = U = 1 dB of TL: a conditional fail, which simple acceptance rejects.
        Assert.Equal(RuleOutcome.ConditionalFail, e.Rules[1].Outcome);
        Assert.Equal(UnitVerdict.NoGo, e.Verdict);
        Assert.Equal(notchLoss, e.Rules[2].MeasuredValue!.Value, 0.05);
        Assert.Equal(RuleOutcome.Pass, e.Rules[2].Outcome);
    }
}
