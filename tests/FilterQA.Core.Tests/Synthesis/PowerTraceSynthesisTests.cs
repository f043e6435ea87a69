using FilterQA.Core.Sweeps;
using FilterQA.Core.Synthesis;

namespace FilterQA.Core.Tests.Synthesis;

public class PowerTraceSynthesisTests
{
    [Theory]
    [InlineData("TME-CF455-15", "IQC-1")]
    [InlineData("TME-SF162-AIS", "IQC-2")]
    public void Thru_is_minus_10_dBm_within_the_stated_ripple(string partNumber, string station)
    {
        Sweep thru = new UnitSynthesiser(4).PowerThru(DemoParts.Get(partNumber), station);
        Assert.Equal(ScalarQuantity.PowerDbm, thru.Scalar!.Quantity);
        Assert.Equal(SweepFormat.Synthetic, thru.Source.Format);
        foreach (double level in thru.Scalar.LevelDb)
        {
            // ±0.2 dB ripple (the synthesiser's stated envelope) + 0.02 dB for the ±4σ jitter of 0.005 dB.
            Assert.InRange(level, -10.22, -9.78);
        }
    }

    [Theory]
    [InlineData("TME-CF455-15", DefectKind.None)]
    [InlineData("TME-SF70M-1M2", DefectKind.None)]
    [InlineData("TME-XR24M-18", DefectKind.HighLoss)]
    public void Subtracting_the_thru_recovers_the_unit_gain(string partNumber, DefectKind defect)
    {
        DemoPart part = DemoParts.Get(partNumber);
        var synthesiser = new UnitSynthesiser(12);
        ReadOnlySpan<double> unit = synthesiser.PowerUnit(part, 8, "IQC-1", defect).Scalar!.LevelDb;
        ReadOnlySpan<double> thru = synthesiser.PowerThru(part, "IQC-1").Scalar!.LevelDb;
        ReadOnlySpan<double> networkLoss = ResponseTrace.Primary(synthesiser.Unit(part, 8, defect)).LossDb;
        int compared = 0;
        for (int i = 0; i < unit.Length; i++)
        {
            // Compare only where the loss is ≤ 30 dB: there the −105 dBm analyser floor lies ≥ 65 dB below the
            // signal (adds < 10·log10(1 + 10^−6.5) dB, DOMAIN §4) and the reference's own network noise, 95 dB
            // below a thru, is ≥ 65 dB below it: ≤ 20·log10(1 + 4·10^(−65/20)) = 0.02 dB at 4σ.
            if (networkLoss[i] > 30)
            {
                continue;
            }
            double gainDb = unit[i] - thru[i]; // the normalisation: dBm − dBm = dB
            // Tolerance 0.05 dB: that 0.02 dB plus two independent power-trace jitters of ≤ 0.02 dB (4σ of 0.005 dB).
            Assert.Equal(-networkLoss[i], gainDb, 0.05);
            compared++;
        }
        Assert.True(compared > 50, $"only {compared} points compared");
    }

    [Fact]
    public void Noise_floor_averages_near_minus_105_dBm()
    {
        ReadOnlySpan<double> floor = new UnitSynthesiser(4).NoiseFloor(DemoParts.Get("TME-XF21M4-15"), "IQC-2").Scalar!.LevelDb;
        // Mean of the linear powers: the floor's mean −105 dBm (tilt ±0.5 dB averages out); 8 001 points of an
        // 8-sample average have a relative standard error of 1/√(8·8001) = 0.4 %, so ±0.1 dB is > 4σ.
        double meanMw = 0;
        foreach (double dbm in floor)
        {
            meanMw += Math.Pow(10, dbm / 10) / floor.Length;
        }
        double tiltMean = 10 * Math.Log10(Enumerable.Range(0, 101).Average(k => Math.Pow(10, (k / 100.0 - 0.5) / 10)));
        Assert.Equal(-105 + tiltMean, 10 * Math.Log10(meanMw), 0.1);
    }
}
