using FilterQA.Core.Measurement;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Tests.Measurement;

public sealed class ReturnLossTests
{
    [Theory]
    // DOMAIN 9.11 (worked example, computed): 10 dB → |Γ| 0.316, VSWR 1.92; 14 dB → 1.50; 20 dB → 1.22.
    // Tolerance: half the last printed digit.
    [InlineData(10.0, 0.316, 1.92)]
    [InlineData(14.0, 0.1995, 1.50)]
    [InlineData(20.0, 0.100, 1.22)]
    public void Vswr_worked_example(double returnLossDb, double gamma, double vswr)
    {
        Assert.Equal(gamma, ReturnLoss.ReflectionMagnitude(returnLossDb), 0.0005);
        Assert.Equal(vswr, ReturnLoss.Vswr(returnLossDb)!.Value, 0.005);
    }

    [Fact]
    public void Mismatch_loss_worked_example()
    {
        // DOMAIN 9.11 (worked example, computed): 10 dB return loss → mismatch loss 0.46 dB (half the last digit).
        Assert.Equal(0.46, ReturnLoss.MismatchLossDb(10)!.Value, 0.005);
    }

    [Fact]
    public void Over_band_finds_the_worst_match_inside_the_band_only()
    {
        var grid = FrequencyGrid.Linear(60e6, 80e6, 21);
        double[] rl = new double[21];
        for (int i = 0; i < rl.Length; i++)
        {
            rl[i] = 25;
        }
        rl[3] = 6;   // 63 MHz, outside the band
        rl[12] = 14; // 72 MHz, the worst inside
        rl[13] = 15;
        ResponseTrace s11 = ResponseTrace.Create(grid, ResponsePath.InputReflection, rl);

        ReturnLossResult result = ReturnLoss.OverBand(s11, new FrequencyBand(68e6, 75e6))!;

        // DOMAIN 9.11: 14 dB → VSWR 1.50 (half the last digit); the point itself is exact.
        Assert.Equal(14, result.MinReturnLossDb);
        Assert.Equal(72e6, result.AtHz, 1e-6);
        Assert.Equal(1.50, result.MaxVswr!.Value, 0.005);
    }

    [Fact]
    public void A_reading_with_gain_has_no_finite_vswr_and_is_warned()
    {
        var grid = FrequencyGrid.Linear(60e6, 80e6, 3);
        ResponseTrace s22 = ResponseTrace.Create(grid, ResponsePath.OutputReflection, [12, -0.2, 12]);
        var warnings = new List<MeasurementWarning>();

        ReturnLossResult result = ReturnLoss.OverBand(s22, new FrequencyBand(60e6, 80e6), warnings)!;

        Assert.Null(result.MaxVswr);
        Assert.Equal([MeasurementWarningCodes.ReflectionNotPassive], warnings.Select(w => w.Code));
    }

    [Fact]
    public void A_transmission_trace_is_refused()
    {
        ResponseTrace s21 = ResponseTrace.Create(FrequencyGrid.Linear(1, 2, 2), ResponsePath.Transmission, [1, 1]);

        var error = Assert.Throws<ArgumentException>(() => ReturnLoss.OverBand(s21, new FrequencyBand(1, 2)));
        Assert.Equal("reflection", error.ParamName);
    }
}
