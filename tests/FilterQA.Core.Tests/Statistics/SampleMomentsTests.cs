using FilterQA.Core.Statistics;
using MathNet.Numerics.Statistics;

namespace FilterQA.Core.Tests.Statistics;

public sealed class SampleMomentsTests
{
    // 50 centre frequencies around 10.7072 MHz with kHz spread: a small spread on a large offset.
    private static double[] CentreFrequenciesHz() =>
        Enumerable.Range(0, 50).Select(i => 10.7072e6 + 5e3 * Math.Sin(0.7 * i) + 1e3 * Math.Cos(2.3 * i)).ToArray();

    [Fact]
    public void Mean_and_sample_sd_match_MathNet()
    {
        // Reference library: MathNet.Numerics Statistics.Mean / StandardDeviation (n - 1).
        // 1e-9 relative: both are accurate to ~1e-12 relative of the spread here.
        double[] x = CentreFrequenciesHz();
        SampleMoments m = SampleMoments.Of(x);
        Assert.Equal(50, m.Count);
        Assert.Equal(x.Mean(), m.Mean, 1e-9 * 10.7e6);
        Assert.Equal(x.StandardDeviation(), m.StandardDeviation, 1e-9 * x.StandardDeviation());
        Assert.Equal(x.Minimum(), m.Minimum);
        Assert.Equal(x.Maximum(), m.Maximum);
    }

    [Fact]
    public void Textbook_sd_of_2_4_4_4_5_5_7_9()
    {
        // Classic example: mean 5, sum of squared deviations 32, sample variance 32/7.
        SampleMoments m = SampleMoments.Of([2, 4, 4, 4, 5, 5, 7, 9]);
        Assert.Equal(5, m.Mean, 1e-15);
        Assert.Equal(Math.Sqrt(32.0 / 7), m.StandardDeviation, 1e-14);
    }

    [Fact]
    public void One_value_has_no_sd_and_empty_is_refused()
    {
        Assert.True(double.IsNaN(SampleMoments.Of([3.0]).StandardDeviation));
        Assert.Throws<ArgumentException>(() => SampleMoments.Of([]));
        var error = Assert.Throws<ArgumentException>(() => SampleMoments.Of([1, double.PositiveInfinity]));
        Assert.Contains("index 1", error.Message, StringComparison.Ordinal);
    }
}
