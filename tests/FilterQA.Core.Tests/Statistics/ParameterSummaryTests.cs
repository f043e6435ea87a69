using FilterQA.Core.Statistics;
using MathNet.Numerics.Statistics;

namespace FilterQA.Core.Tests.Statistics;

public sealed class ParameterSummaryTests
{
    private static readonly double[] CentreHz =
        Enumerable.Range(0, 50).Select(i => 10.7072e6 + 5e3 * Math.Sin(0.9 * i)).ToArray();

    [Fact]
    public void Summary_has_moments_histogram_and_capability_from_the_overall_s()
    {
        var limits = SpecLimits.Symmetric(10.700e6, 0.030e6);
        ParameterSummary s = ParameterSummary.Compute("CentreHz", "Hz", CentreHz, limits);
        // Reference: MathNet mean and s; Cpk by the handbook formula min(USL - x̄, x̄ - LSL)/(3s). 1e-9 relative.
        double mean = CentreHz.Mean(), sd = CentreHz.StandardDeviation();
        double cpk = Math.Min(10.730e6 - mean, mean - 10.670e6) / (3 * sd);
        Assert.Equal(cpk, s.Capability!.Cpk, 1e-9 * cpk);
        Assert.Equal(sd, s.Capability.Sigma, 1e-9 * sd);
        Assert.True(s.Capability.IsPerformanceIndex);
        Assert.Equal(50, s.Histogram.Counts.ToArray().Sum());
        Assert.Null(s.CapabilityNote);
    }

    [Fact]
    public void No_limits_or_no_spread_gives_no_capability_with_a_note()
    {
        Assert.Null(ParameterSummary.Compute("CentreHz", "Hz", CentreHz, null).Capability);
        ParameterSummary flat = ParameterSummary.Compute("LossDb", "dB", [2.0, 2.0, 2.0], new SpecLimits(null, 3.0));
        Assert.Null(flat.Capability);
        Assert.Contains("zero spread", flat.CapabilityNote, StringComparison.Ordinal);
    }

    [Fact]
    public void Given_edges_are_used()
    {
        var options = new SummaryOptions { BinEdges = [10.69e6, 10.70e6, 10.71e6, 10.72e6] };
        ParameterSummary s = ParameterSummary.Compute("CentreHz", "Hz", CentreHz, null, options);
        Assert.Equal(3, s.Histogram.BinCount);
        Assert.Equal(50, s.Histogram.Counts.ToArray().Sum() + s.Histogram.BelowRange + s.Histogram.AboveRange);
    }
}
