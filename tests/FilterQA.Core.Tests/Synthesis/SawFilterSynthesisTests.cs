using System.Numerics;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Synthesis;

namespace FilterQA.Core.Tests.Synthesis;

// Demo units of TME-SF70M-1M2 against the scenario: group-delay variation ≤ 60 ns within ±0.45 MHz,
// return loss ≥ 10 dB in band, and a delay of a transversal SAW (1–2 µs).
public class SawFilterSynthesisTests
{
    private static readonly DemoPart Part = DemoParts.Get("TME-SF70M-1M2");

    [Theory]
    [InlineData(1, DefectKind.None)]
    [InlineData(2, DefectKind.None)]
    [InlineData(3, DefectKind.LowRejection)]
    public void Group_delay_is_about_a_microsecond_and_flat_within_60_ns(int serial, DefectKind defect)
    {
        Sweep sweep = new UnitSynthesiser(70).Unit(Part, serial, defect);
        FrequencyGrid grid = sweep.Grid;
        ReadOnlySpan<Complex> s21 = sweep.Network!.Trace(2, 1);
        double min = double.MaxValue, max = double.MinValue;
        for (int i = 1; i < grid.Count - 1; i++)
        {
            if (Math.Abs(grid[i] - 70e6) > 0.45e6)
            {
                continue;
            }
            // τ = −dφ/dω by central difference; the phase step reduced into (−π, π] (DOMAIN §4: needs
            // Δf < 1/(2τ), here 10 kHz ≪ 385 kHz).
            double dPhi = (s21[i + 1] / s21[i - 1]).Phase;
            double delay = -dPhi / (2 * Math.PI * (grid[i + 1] - grid[i - 1]));
            min = Math.Min(min, delay);
            max = Math.Max(max, delay);
        }
        Assert.InRange(min, 1e-6, 2e-6);
        Assert.True(max - min <= 60e-9, $"group-delay variation {(max - min) * 1e9} ns");
    }

    [Fact]
    public void Return_loss_is_at_least_10_dB_in_band_and_poorer_out_of_band()
    {
        Sweep sweep = new UnitSynthesiser(70).Unit(Part, 4);
        ResponseTrace s11 = ResponseTrace.Reflection(sweep, 1)!;
        ResponseTrace s22 = ResponseTrace.Reflection(sweep, 2)!;
        for (int i = 0; i < sweep.Grid.Count; i++)
        {
            double offset = Math.Abs(sweep.Grid[i] - 70e6);
            if (offset <= 0.45e6)
            {
                Assert.True(s11.LossDb[i] >= 10 && s22.LossDb[i] >= 10); // scenario: RL ≥ 10 dB in band
            }
            else if (offset >= 3e6)
            {
                Assert.True(s11.LossDb[i] < 3 && s22.LossDb[i] < 3); // mostly reflected far out of band
            }
        }
    }
}
