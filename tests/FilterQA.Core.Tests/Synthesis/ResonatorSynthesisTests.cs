using System.Numerics;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Synthesis;

namespace FilterQA.Core.Tests.Synthesis;

public class ResonatorSynthesisTests
{
    private static readonly DemoPart Part = DemoParts.Get("TME-XR24M-18");

    // Near a series resonance 1/|S21|² = ((R1 + 2Z0)² + X²)/(2Z0)² is exactly quadratic in the reactance, so a
    // parabola through the top three points of 1/|S21|² finds the peak without the bias of fitting dB.
    private static double PeakHz(FrequencyGrid grid, ReadOnlySpan<Complex> s21, double fromHz, double toHz)
    {
        int best = -1;
        for (int i = 0; i < grid.Count; i++)
        {
            if (grid[i] >= fromHz && grid[i] <= toHz && (best < 0 || s21[i].Magnitude > s21[best].Magnitude))
            {
                best = i;
            }
        }
        double x0 = grid[best - 1], x1 = grid[best], x2 = grid[best + 1];
        double y0 = 1 / Math.Pow(s21[best - 1].Magnitude, 2), y1 = 1 / Math.Pow(s21[best].Magnitude, 2), y2 = 1 / Math.Pow(s21[best + 1].Magnitude, 2);
        // Vertex of the parabola through three (possibly unequally spaced) points.
        double numerator = (x1 - x0) * (x1 - x0) * (y1 - y2) - (x1 - x2) * (x1 - x2) * (y1 - y0);
        double denominator = (x1 - x0) * (y1 - y2) - (x1 - x2) * (y1 - y0);
        return x1 - 0.5 * numerator / denominator;
    }

    [Fact]
    public void Series_fixture_model_reproduces_the_worked_example()
    {
        // DOMAIN §9 worked examples 2 and 3 (computed): fs = 10 MHz, C1 = 20 fF, C0 = 5 pF, R1 = 20 ohm in a
        // 2·50 ohm series fixture → |S21| peak 2Z0/(2Z0 + R1) = 0.8333, B3dB = fs/QL = 1 508 Hz.
        const double fs = 10e6, c1 = 20e-15, r1 = 20, c0 = 5e-12;
        double l1 = 1 / (Math.Pow(2 * Math.PI * fs, 2) * c1);
        Assert.Equal(12.665e-3, l1, 0.001e-3); // worked example 2: L1 = 12.665 mH, to its printed digits
        var grid = FrequencyGrid.Linear(fs - 5e3, fs + 5e3, 10_001);
        var s11 = new Complex[grid.Count];
        var s21 = new Complex[grid.Count];
        var s22 = new Complex[grid.Count];
        ResonatorResponse.Fill(grid.Hz, c0, [new MotionalArm(r1, l1, c1)], 50, s11, s21, s22);

        double peak = s21.Max(z => z.Magnitude);
        Assert.Equal(100.0 / 120.0, peak, 1e-4); // C0 (−j3.2 kohm) shifts it by < 1e-5; 1 Hz grid at the top
        double halfPower = peak / Math.Sqrt(2);
        double[] above = [.. grid.Hz.ToArray().Where((f, i) => s21[i].Magnitude >= halfPower)];
        Assert.Equal(1508, above[^1] - above[0], 3.0); // 1 Hz grid: ±1 Hz per edge, printed to 4 digits
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(77)]
    public void The_S21_peak_sits_at_fs_of_the_units_own_BVD_parameters(int serial)
    {
        var synthesiser = new UnitSynthesiser(2544);
        DeterministicRandom random = synthesiser.ParameterRandom(Part, serial);
        (double c0, MotionalArm[] arms) = ((ResonatorDesign)Part.Design).Draw(ref random, DefectKind.None);
        MotionalArm main = arms[0];
        double fs = 1 / (2 * Math.PI * Math.Sqrt(main.LH * main.CF)); // BVD: fs = 1/(2π√(L1C1))

        // In the series fixture the |S21| peak is pulled below fs by the susceptance B in parallel with the main
        // arm (C0 and the unwanted-mode arms, all capacitive at fs). Derived here to first order in B·R1:
        // maximising |2Z0/(2Z0 + Z)|² with Z = (R1 + jX)/(1 + jB(R1 + jX)) gives X = −B·R1·(4Z0 + R1), and
        // X = 4π·L1·Δf near fs, so Δf = −B·R1·(4Z0 + R1)/(4π·L1) (about −10 Hz here).
        double omega = 2 * Math.PI * fs;
        double susceptance = omega * c0;
        foreach (MotionalArm mode in arms.Skip(1))
        {
            susceptance += (Complex.One / new Complex(mode.ROhm, omega * mode.LH - 1 / (omega * mode.CF))).Imaginary;
        }
        double expectedPeak = fs - susceptance * main.ROhm * (4 * 50 + main.ROhm) / (4 * Math.PI * main.LH);

        Sweep sweep = synthesiser.Unit(Part, serial);
        double peak = PeakHz(sweep.Grid, sweep.Network!.Trace(2, 1), 24e6 - 10e3, 24e6 + 10e3);
        // 1 Hz: second-order terms (B·R1 ≈ 0.01) and the −95 dB noise, with the peak found by a parabola on 1/|S21|².
        Assert.Equal(expectedPeak, peak, 1.0);
        Assert.InRange(fs - peak, 2.0, 40.0); // the pull is real and small: a few to tens of hertz
        Assert.InRange(peak, 24e6 * (1 - 20e-6), 24e6 * (1 + 20e-6)); // scenario: 24.000 MHz ±20 ppm
    }

    [Fact]
    public void A_drift_defect_moves_fs_beyond_20_ppm()
    {
        var synthesiser = new UnitSynthesiser(5);
        for (int serial = 1; serial <= 4; serial++)
        {
            Sweep sweep = synthesiser.Unit(Part, serial, DefectKind.CentreDrift);
            double peak = PeakHz(sweep.Grid, sweep.Network!.Trace(2, 1), 24e6 - 10e3, 24e6 + 10e3);
            Assert.True(Math.Abs(peak / 24e6 - 1) > 20e-6, $"S{serial}: fs {peak} Hz within ±20 ppm");
        }
    }

    [Theory]
    [InlineData(DefectKind.None, true)]
    [InlineData(DefectKind.StrongUnwantedMode, false)]
    public void Unwanted_modes_sit_on_the_intended_side_of_6_dB_below_the_main_response(DefectKind defect, bool meetsLimit)
    {
        var synthesiser = new UnitSynthesiser(31);
        for (int serial = 1; serial <= 3; serial++)
        {
            Sweep sweep = synthesiser.Unit(Part, serial, defect);
            ReadOnlySpan<Complex> s21 = sweep.Network!.Trace(2, 1);
            double main = 0, strongestMode = 0;
            for (int i = 1; i < sweep.Grid.Count - 1; i++)
            {
                double m = s21[i].Magnitude;
                main = Math.Max(main, m);
                // Local maxima beyond fp (fs + C1/(2C0)·fs ≈ +17.5 kHz) up to +500 kHz are unwanted modes.
                bool localMaximum = m >= s21[i - 1].Magnitude && m >= s21[i + 1].Magnitude;
                if (localMaximum && sweep.Grid[i] > 24e6 + 30e3 && sweep.Grid[i] <= 24e6 + 500e3)
                {
                    strongestMode = Math.Max(strongestMode, m);
                }
            }
            double belowDb = 20 * Math.Log10(main / strongestMode);
            Assert.True(belowDb >= 6 == meetsLimit, $"S{serial}: strongest unwanted mode {belowDb} dB below the main response");
        }
    }
}
