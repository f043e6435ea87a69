using System.Numerics;
using FilterQA.Core.Resonators;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Tests.Resonators;

/// <summary>Warnings about the fit itself, and the errors for inputs the analyser cannot use.</summary>
public sealed class FitDiagnosticsTests
{
    private static Sweep Crystal(Func<double, Complex>? distortion = null)
    {
        Complex S21(double f) => ResonatorSweeps.SeriesS21(ResonatorSweeps.Admittance(f, CrystalCases.C0F, CrystalCases.Arm()))
            * (distortion?.Invoke(f) ?? Complex.One);
        return ResonatorSweeps.TwoPort(CrystalCases.WideGrid, S21, _ => Complex.Zero);
    }

    [Fact]
    public void Uncorrected_fixture_delay_is_flagged_as_a_poor_residual()
    {
        // 5 ns (about a metre of coaxial cable) left in the data rotates S21 by −2π·f·τ ≈ −18° at 10 MHz: no BVD
        // response does that, so the best fit still misses by several per cent of the peak, against a 1 % limit.
        Sweep delayed = Crystal(f => Complex.FromPolarCoordinates(1, -2 * Math.PI * f * 5e-9));

        ResonatorMeasurement m = ResonatorAnalyzer.Measure(delayed);

        Assert.True(m.HasWarning(ResonatorWarningCode.FitPoorResidual));
    }

    [Fact]
    public void Iteration_limit_reached_is_flagged_as_not_converged()
    {
        ResonatorMeasurement m = ResonatorAnalyzer.Measure(Crystal(), new ResonatorOptions { MaxIterations = 1 });

        Assert.True(m.HasWarning(ResonatorWarningCode.FitNotConverged));
        Assert.NotNull(m.SeriesHz); // the last iterate is still reported
    }

    [Fact]
    public void Span_below_the_resonance_fits_nothing_and_says_why()
    {
        // 9.95..9.99 MHz: |S21| rises towards fs = 10 MHz, so its maximum is the last point.
        var grid = FrequencyGrid.Linear(9.95e6, 9.99e6, 401);
        ResonatorMeasurement m = ResonatorAnalyzer.Measure(ResonatorSweeps.SeriesCrystal(grid, CrystalCases.C0F, [CrystalCases.Arm()]));

        Assert.True(m.HasWarning(ResonatorWarningCode.ResonanceAtSpanEdge));
        Assert.Null(m.SeriesHz);
        Assert.Null(m.R1Ohm);
        Assert.Equal(9.99e6, m.PeakHz!.Value, 1e-6); // the sampled last point, not extrapolated
    }

    [Fact]
    public void Too_few_points_give_a_warning_not_an_exception()
    {
        var grid = FrequencyGrid.Linear(9.999e6, 10.001e6, 3);
        ResonatorMeasurement m = ResonatorAnalyzer.Measure(ResonatorSweeps.SeriesCrystal(grid, CrystalCases.C0F, [CrystalCases.Arm()]));

        Assert.True(m.HasWarning(ResonatorWarningCode.TooFewPoints));
        Assert.Null(m.SeriesHz);
    }

    [Fact]
    public void One_port_data_for_a_two_port_fixture_is_rejected_naming_the_fixture()
    {
        Sweep onePort = ResonatorSweeps.OnePort(CrystalCases.WideGrid, _ => new Complex(0.5, 0));

        var error = Assert.Throws<ArgumentException>(() => ResonatorAnalyzer.Measure(onePort, ResonatorFixture.SeriesThrough));
        Assert.Contains("SeriesThrough", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Unnormalised_dBm_trace_is_rejected()
    {
        var grid = FrequencyGrid.Linear(9.99e6, 10.01e6, 11);
        Sweep dbm = Sweep.FromScalar(ScalarTrace.Create(grid, ScalarQuantity.PowerDbm, new double[11]), SweepSource.Of("sa.csv", SweepFormat.DelimitedText));

        var error = Assert.Throws<ArgumentException>(() => ResonatorAnalyzer.Measure(dbm));
        Assert.Contains("dBm", error.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentException>(() => TrapAnalyzer.Measure(dbm));
    }

    [Fact]
    public void Different_port_impedances_are_rejected_with_both_values()
    {
        var grid = FrequencyGrid.Linear(9.99e6, 10.01e6, 11);
        var s = new Complex[11, 2, 2];
        Sweep sweep = Sweep.FromNetwork(NetworkData.Create(grid, s, [50.0, 75.0]), SweepSource.Of("x.s2p", SweepFormat.Touchstone2));

        var error = Assert.Throws<ArgumentException>(() => ResonatorAnalyzer.Measure(sweep));
        Assert.Contains("50 ohm and 75 ohm", error.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(1001)]
    public void Options_out_of_range_are_rejected(int minPoints)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => new ResonatorOptions { MinPointsInBandwidth = minPoints });
    }

    [Fact]
    public void Result_refuses_NaN_so_an_unmeasurable_value_can_only_be_null()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() =>
            new ResonatorMeasurement(double.NaN, null, null, null, null, null, null, null, null, null, null, null, [], []));
        Assert.Throws<ArgumentOutOfRangeException>(() => new UnwantedMode(1e6, double.PositiveInfinity));
    }
}
