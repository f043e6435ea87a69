using FilterQA.Core.Statistics;
using MathNet.Numerics;
using MathNet.Numerics.Distributions;

namespace FilterQA.Core.Tests.Statistics;

public sealed class ProcessCapabilityTests
{
    // Worked example values are printed to 2 decimals: half the last digit.
    private const double TwoDecimals = 0.005;

    [Fact]
    public void Worked_example_6_centre_frequency()
    {
        // DOMAIN worked example 6 (worked example, computed): spec 10.700 ± 0.030 MHz,
        // mean 10.7072 MHz, s = 5 kHz, n = 50 -> Cp 2.00, Cpu 1.52, Cpl 2.48, Cpk 1.52; Bissell 95 % bound 1.26.
        var limits = SpecLimits.Symmetric(10.700e6, 0.030e6);
        CapabilityIndices c = ProcessCapability.Compute(10.7072e6, 5e3, 50, limits);
        Assert.Equal(2.00, c.Cp!.Value, TwoDecimals);
        Assert.Equal(1.52, c.Cpu!.Value, TwoDecimals);
        Assert.Equal(2.48, c.Cpl!.Value, TwoDecimals);
        Assert.Equal(1.52, c.Cpk, TwoDecimals);
        Assert.Equal(1.26, c.CpkLowerBound, TwoDecimals);
        Assert.True(c.IsPerformanceIndex); // overall s: strictly Ppk
    }

    [Fact]
    public void Bissell_bound_matches_the_formula_with_the_normal_quantile()
    {
        // Bissell (1990), Applied Statistics 39(3): Cpk_L = Cpk - z(1-α) sqrt(1/(9n) + Cpk²/(2(n-1))),
        // z from MathNet's normal quantile; 1e-12 for rounding.
        foreach ((double cpk, int n, double conf) in new[] { (1.52, 50, 0.95), (1.33, 30, 0.90), (0.8, 125, 0.99) })
        {
            double z = Normal.InvCDF(0, 1, conf);
            double expected = cpk - z * Math.Sqrt(1.0 / (9 * n) + cpk * cpk / (2.0 * (n - 1)));
            Assert.Equal(expected, ProcessCapability.BissellLowerBound(cpk, n, conf), 1e-12);
        }
    }

    [Fact]
    public void One_sided_upper_limit_gives_Cpu_only()
    {
        // Insertion loss 3.00 dB mean, s = 0.25 dB, USL 4.00 dB: Cpu = (4 - 3)/(3 * 0.25) = 4/3 (handbook formula).
        CapabilityIndices c = ProcessCapability.Compute(3.0, 0.25, 60, new SpecLimits(null, 4.0));
        Assert.Null(c.Cp);
        Assert.Null(c.Cpl);
        Assert.Equal(4.0 / 3, c.Cpu!.Value, 1e-12);
        Assert.Equal(c.Cpu.Value, c.Cpk);
        // Expected fraction beyond USL: Φ(-4) = erfc(4/√2)/2, via MathNet's erfc; 1e-9 ppm for rounding.
        Assert.Equal(1e6 * SpecialFunctions.Erfc(4 / Math.Sqrt(2)) / 2, c.EstimatedPpmOutside, 1e-9);
    }

    [Fact]
    public void One_sided_lower_limit_gives_Cpl_only()
    {
        // Rejection 62 dB mean, s = 2 dB, LSL 55 dB: Cpl = 7/6.
        CapabilityIndices c = ProcessCapability.Compute(62, 2, 40, new SpecLimits(55, null));
        Assert.Null(c.Cpu);
        Assert.Equal(7.0 / 6, c.Cpl!.Value, 1e-12);
        Assert.Equal(7.0 / 6, c.Cpk, 1e-12);
    }

    [Theory]
    [InlineData(1.0, 1350, 0.5)]          // DOMAIN 6 [C]: Cpk 1.00 ≈ 1350 ppm (printed to 4 figures: ±0.5)
    [InlineData(4.0 / 3, 31.7, 0.05)]     // Cpk 1.33 (= 4/3, z = 4) ≈ 31.7 ppm (±0.05, one decimal printed)
    [InlineData(5.0 / 3, 0.29, 0.005)]    // Cpk 1.67 (= 5/3, z = 5) ≈ 0.29 ppm
    public void OneSidedPpm_matches_the_normal_tail(double index, double printedPpm, double tolerance)
    {
        Assert.Equal(printedPpm, ProcessCapability.OneSidedPpm(index), tolerance);
        // And the normal tail from MathNet's erfc: Φ(-3k) = erfc(3k/√2)/2; relative 1e-12.
        double tail = 1e6 * SpecialFunctions.Erfc(3 * index / Math.Sqrt(2)) / 2;
        Assert.Equal(tail, ProcessCapability.OneSidedPpm(index), tail * 1e-12);
    }

    [Fact]
    public void MovingRangeSigma_is_mean_moving_range_over_1_128()
    {
        // Values 1, 3, 2, 5: moving ranges 2, 1, 3, mean 2; d2 = 1.128 for ranges of 2 (SPC handbooks).
        Assert.Equal(2 / 1.128, ProcessCapability.MovingRangeSigma([1, 3, 2, 5]), 1e-12);
    }

    [Fact]
    public void FromSample_with_moving_range_is_not_a_performance_index()
    {
        double[] values = [10.0, 10.2, 9.9, 10.1, 10.3, 9.8, 10.0, 10.1];
        CapabilityIndices c = ProcessCapability.FromSample(values, new SpecLimits(9.0, 11.0), SigmaBasis.MovingRange);
        Assert.False(c.IsPerformanceIndex);
        // MR: 0.2 0.3 0.2 0.2 0.5 0.2 0.1 -> mean 1.7/7; σ = that / 1.128; Cp = 2/(6σ). 1e-9 for rounding.
        double sigma = 1.7 / 7 / 1.128;
        Assert.Equal(sigma, c.Sigma, 1e-9);
        Assert.Equal(2 / (6 * sigma), c.Cp!.Value, 1e-9);
    }

    [Fact]
    public void FromSample_with_given_sigma_uses_it()
    {
        CapabilityIndices c = ProcessCapability.FromSample([1.0, 2.0, 3.0], new SpecLimits(-4.0, 8.0), SigmaBasis.Given, givenSigma: 1.0);
        Assert.Equal(12.0 / 6, c.Cp!.Value, 1e-12); // (8 - -4)/(6·1)
        Assert.Throws<ArgumentException>(() => ProcessCapability.FromSample([1.0, 2.0, 3.0], new SpecLimits(-4.0, 8.0), SigmaBasis.Given));
    }

    [Fact]
    public void Bad_inputs_are_refused()
    {
        var limits = new SpecLimits(0, 1);
        Assert.Throws<ArgumentOutOfRangeException>(() => ProcessCapability.Compute(0.5, 0, 10, limits));
        Assert.Throws<ArgumentOutOfRangeException>(() => ProcessCapability.Compute(double.NaN, 0.1, 10, limits));
        Assert.Throws<ArgumentOutOfRangeException>(() => ProcessCapability.Compute(0.5, 0.1, 1, limits));
        Assert.Throws<ArgumentOutOfRangeException>(() => ProcessCapability.Compute(0.5, 0.1, 10, limits, confidence: 1));
        Assert.Throws<ArgumentException>(() => new SpecLimits(null, null));
        Assert.Throws<ArgumentException>(() => new SpecLimits(2, 1));
        var error = Assert.Throws<ArgumentException>(() => ProcessCapability.FromSample([1.0, double.NaN, 3.0], limits));
        Assert.Contains("index 1", error.Message, StringComparison.Ordinal);
    }
}
