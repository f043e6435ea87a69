using FilterQA.Core.Sweeps;
using FilterQA.Core.Synthesis;

namespace FilterQA.Core.Tests.Synthesis;

// Demo units land on the intended side of the scenario limits of TME-CF455-15 (centre 455.0 kHz ±1.5 kHz as
// the midpoint of the 6 dB edges, insertion loss ≤ 6 dB, rejection ≥ 35 dB at ±100 kHz and beyond).
// Edges by linear interpolation in dB against frequency, innermost crossing each side (DOMAIN §2 and §4,
// IEC 60368-1 terms); the helper lives here so the test does not lean on the engine's own edge finder.
public class CeramicFilterSynthesisTests
{
    private static readonly DemoPart Part = DemoParts.Get("TME-CF455-15");

    private static (double Lower, double Upper) Edges(ResponseTrace trace, double relativeDb)
    {
        ReadOnlySpan<double> loss = trace.LossDb;
        int best = 0;
        for (int i = 1; i < loss.Length; i++)
        {
            best = loss[i] < loss[best] ? i : best;
        }
        double level = loss[best] + relativeDb;
        int up = best, down = best;
        while (loss[up] < level)
        {
            up++;
        }
        while (loss[down] < level)
        {
            down--;
        }
        // fx = f1 + (X − A1)(f2 − f1)/(A2 − A1), DOMAIN §4.
        double lower = trace.Grid[down] + (level - loss[down]) * (trace.Grid[down + 1] - trace.Grid[down]) / (loss[down + 1] - loss[down]);
        double upper = trace.Grid[up - 1] + (level - loss[up - 1]) * (trace.Grid[up] - trace.Grid[up - 1]) / (loss[up] - loss[up - 1]);
        return (lower, upper);
    }

    private static double LossAt(ResponseTrace trace, double hz)
    {
        int i = 0;
        while (trace.Grid[i] < hz)
        {
            i++;
        }
        Assert.Equal(hz, trace.Grid[i]); // the grid has the point itself: 255 kHz + 1000 × 200 Hz = 455 kHz
        return trace.LossDb[i];
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(250)]
    public void A_good_unit_meets_loss_and_centre_limits(int serial)
    {
        ResponseTrace trace = ResponseTrace.Primary(new UnitSynthesiser(2544).Unit(Part, serial));
        Assert.InRange(LossAt(trace, 455e3), 0, 6.0); // scenario: insertion loss ≤ 6 dB
        (double lower, double upper) = Edges(trace, 6);
        Assert.InRange((lower + upper) / 2, 455e3 - 1.5e3, 455e3 + 1.5e3); // scenario centre tolerance
        Assert.True(upper - lower >= 15e3, $"6 dB bandwidth {upper - lower} Hz"); // scenario: ≥ 15 kHz
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(4)]
    public void A_drift_defect_moves_the_centre_outside_the_tolerance_and_keeps_the_bandwidth(int serial)
    {
        var synthesiser = new UnitSynthesiser(2544);
        (double lower, double upper) = Edges(ResponseTrace.Primary(synthesiser.Unit(Part, serial, DefectKind.CentreDrift)), 6);
        double centre = (lower + upper) / 2;
        Assert.True(Math.Abs(centre - 455e3) > 1.5e3, $"centre {centre} Hz should be outside 455 ± 1.5 kHz");
        (double goodLower, double goodUpper) = Edges(ResponseTrace.Primary(synthesiser.Unit(Part, serial)), 6);
        // Only the centre moved: the same serial's good twin has the same 6 dB bandwidth within 50 Hz
        // (grid step 250 Hz, interpolation error ≲ h/8 ≈ 31 Hz per edge, DOMAIN §4).
        Assert.Equal(goodUpper - goodLower, upper - lower, 50.0);
    }

    [Fact]
    public void A_low_rejection_defect_breaks_the_35_dB_rejection_a_good_unit_keeps()
    {
        var synthesiser = new UnitSynthesiser(9);
        ResponseTrace good = ResponseTrace.Primary(synthesiser.Unit(Part, 1));
        ResponseTrace bad = ResponseTrace.Primary(synthesiser.Unit(Part, 1, DefectKind.LowRejection));
        Assert.True(WorstRejection(good) >= 35, $"good rejection {WorstRejection(good)} dB");
        Assert.True(WorstRejection(bad) < 35, $"defect rejection {WorstRejection(bad)} dB");
    }

    [Fact]
    public void A_high_loss_defect_breaks_the_6_dB_loss_limit()
    {
        ResponseTrace trace = ResponseTrace.Primary(new UnitSynthesiser(9).Unit(Part, 3, DefectKind.HighLoss));
        double minimum = double.MaxValue;
        foreach (double loss in trace.LossDb)
        {
            minimum = Math.Min(minimum, loss);
        }
        Assert.True(minimum > 6, $"minimum loss {minimum} dB");
    }

    // Relative rejection: loss at |f − 455 kHz| ≥ 100 kHz minus the minimum loss.
    private static double WorstRejection(ResponseTrace trace)
    {
        double minimum = double.MaxValue, worst = double.MaxValue;
        for (int i = 0; i < trace.Grid.Count; i++)
        {
            minimum = Math.Min(minimum, trace.LossDb[i]);
        }
        for (int i = 0; i < trace.Grid.Count; i++)
        {
            if (Math.Abs(trace.Grid[i] - 455e3) >= 100e3)
            {
                worst = Math.Min(worst, trace.LossDb[i] - minimum);
            }
        }
        return worst;
    }
}
