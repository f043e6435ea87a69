using FilterQA.Core.Measurement;
using FilterQA.Core.Sweeps;
using static FilterQA.Core.Tests.Measurement.AnalyticBandpass;

namespace FilterQA.Core.Tests.Measurement;

public sealed class BandEdgesTests
{
    private const double F0Hz = 10.7e6;
    private const double BandwidthHz = 200e3;

    public static TheoryData<int, int, double> ButterworthCases => new()
    {
        // order, points over f0 ± 2.5 B, level dB
        { 4, 4001, 3 },
        { 4, 4001, 6 },
        { 4, 4001, 20 },
        { 4, 4001, 40 },
        { 5, 101, 3 },
        { 5, 101, 6 },
        { 5, 101, 30 },
        { 2, 51, 3 },
        { 2, 51, 12 },
    };

    [Theory]
    [MemberData(nameof(ButterworthCases))]
    public void Butterworth_edges_match_the_closed_form_on_dense_and_coarse_grids(int order, int points, double levelDb)
    {
        var grid = FrequencyGrid.Linear(F0Hz - 2.5 * BandwidthHz, F0Hz + 2.5 * BandwidthHz, points);
        double Loss(double f) => ButterworthLossDb(f, F0Hz, BandwidthHz, order);
        ResponseTrace trace = Trace(grid, Loss);

        LevelBandwidth band = BandEdges.Find(trace, levelDb);

        // Expected: Ω_X = (10^(X/10) − 1)^(1/(2n)) with X = sampled minimum + level (the reference is the sampled point,
        // Zverev / Matthaei–Young–Jones prototypes, from memory); f = ∓Ω_X·B/2 + √((Ω_X·B/2)² + f0²).
        double x = SampledMinimum(grid, Loss) + levelDb;
        (double lower, double upper) = EdgesHz(ButterworthOmegaAt(x, order), F0Hz, BandwidthHz);
        double step = grid.MaxStepHz;
        // Tolerance: linear-interpolation error h²|L''|/(8|L'|) (DOMAIN 4), evaluated on the closed form.
        double lowerTol = InterpolationToleranceHz(Loss, lower, step);
        double upperTol = InterpolationToleranceHz(Loss, upper, step);
        Assert.Equal(levelDb, band.LevelDb);
        Assert.InRange(band.LowerHz!.Value, lower - lowerTol, lower + lowerTol);
        Assert.InRange(band.UpperHz!.Value, upper - upperTol, upper + upperTol);
        Assert.InRange(band.BandwidthHz!.Value, upper - lower - lowerTol - upperTol, upper - lower + lowerTol + upperTol);
        // Geometric centre of the closed-form edges is exactly f0 (product of the roots of f² ∓ Ω·B·f − f0² = 0).
        Assert.InRange(band.GeometricCentreHz!.Value, F0Hz - lowerTol - upperTol, F0Hz + lowerTol + upperTol);
    }

    [Theory]
    [InlineData(3, 0.5, 3)]
    [InlineData(3, 0.5, 20)]
    [InlineData(4, 1.0, 3)]
    [InlineData(4, 1.0, 40)]
    [InlineData(5, 0.1, 10)]
    public void Chebyshev_edges_above_the_ripple_match_the_closed_form(int order, double rippleDb, double levelDb)
    {
        var grid = FrequencyGrid.Linear(F0Hz - 2 * BandwidthHz, F0Hz + 2 * BandwidthHz, 8001);
        double Loss(double f) => ChebyshevLossDb(f, F0Hz, BandwidthHz, order, rippleDb);
        ResponseTrace trace = Trace(grid, Loss);

        LevelBandwidth band = BandEdges.Find(trace, levelDb);

        // Expected: Ω_X = cosh(acosh(√(10^(X/10) − 1)/ε)/n), ε = √(10^(ripple/10) − 1) (Chebyshev type I prototype, from memory).
        double x = SampledMinimum(grid, Loss) + levelDb;
        (double lower, double upper) = EdgesHz(ChebyshevOmegaAt(x, order, rippleDb), F0Hz, BandwidthHz);
        double lowerTol = InterpolationToleranceHz(Loss, lower, grid.MaxStepHz);
        double upperTol = InterpolationToleranceHz(Loss, upper, grid.MaxStepHz);
        Assert.InRange(band.LowerHz!.Value, lower - lowerTol, lower + lowerTol);
        Assert.InRange(band.UpperHz!.Value, upper - upperTol, upper + upperTol);
    }

    [Theory]
    [InlineData(3, 1)]
    [InlineData(6, 2)]
    [InlineData(20, 3)]
    public void Butterworth_edges_on_a_noisy_grid_stay_within_the_noise_bound(double levelDb, int seed)
    {
        const int order = 4;
        const double sigmaDb = 0.02;
        var grid = FrequencyGrid.Linear(F0Hz - 2.5 * BandwidthHz, F0Hz + 2.5 * BandwidthHz, 2001);
        double Loss(double f) => ButterworthLossDb(f, F0Hz, BandwidthHz, order);
        ResponseTrace trace = Trace(grid, Loss, sigmaDb, seed);

        LevelBandwidth band = BandEdges.Find(trace, levelDb);

        (double lower, double upper) = EdgesHz(ButterworthOmegaAt(levelDb, order), F0Hz, BandwidthHz);
        // Tolerance: the reference (a noisy minimum) and the two interpolated points each move by at most 5σ
        // (P(|z| > 5) = 6e-7 per point), so the level is off by ≤ 10σ, moving the edge by 10σ/|L'|; plus the interpolation bound.
        double d = grid.MaxStepHz / 10;
        double lowerTol = 10 * sigmaDb / Math.Abs(SlopeDbPerHz(Loss, lower, d)) + InterpolationToleranceHz(Loss, lower, grid.MaxStepHz);
        double upperTol = 10 * sigmaDb / Math.Abs(SlopeDbPerHz(Loss, upper, d)) + InterpolationToleranceHz(Loss, upper, grid.MaxStepHz);
        Assert.InRange(band.LowerHz!.Value, lower - lowerTol, lower + lowerTol);
        Assert.InRange(band.UpperHz!.Value, upper - upperTol, upper + upperTol);
    }

    [Fact]
    public void Chebyshev_level_inside_the_ripple_innermost_and_outermost_take_different_crossings()
    {
        // Order 3 has a transmission zero of T_3 at Ω = 0 (f = f0, on the grid), so the minimum-loss point is f0 exactly.
        const int order = 3;
        const double rippleDb = 0.5, levelDb = 0.3;
        var grid = FrequencyGrid.Linear(F0Hz - 2 * BandwidthHz, F0Hz + 2 * BandwidthHz, 8001);
        double Loss(double f) => ChebyshevLossDb(f, F0Hz, BandwidthHz, order, rippleDb);
        ResponseTrace trace = Trace(grid, Loss);

        LevelBandwidth inner = BandEdges.Find(trace, levelDb, EdgeSearch.Innermost);
        LevelBandwidth outer = BandEdges.Find(trace, levelDb, EdgeSearch.Outermost);

        // |T_3(Ω)| = c with c = √(10^(X/10) − 1)/ε < 1. With Ω = cos θ, T_3 = cos 3θ. Nearest f0 (θ = π/2):
        // 3θ = 3π/2 ± asin c → Ω = ±sin(asin(c)/3). Outermost (smallest θ): 3θ = acos c → Ω = cos(acos(c)/3).
        // Derived from the Chebyshev prototype (Zverev, from memory).
        double c = Math.Sqrt(Math.Pow(10, levelDb / 10) - 1) / Epsilon(rippleDb);
        (double innerLower, double innerUpper) = EdgesHz(Math.Sin(Math.Asin(c) / order), F0Hz, BandwidthHz);
        (double outerLower, double outerUpper) = EdgesHz(Math.Cos(Math.Acos(c) / order), F0Hz, BandwidthHz);
        double h = grid.MaxStepHz;
        Assert.InRange(inner.LowerHz!.Value, innerLower - InterpolationToleranceHz(Loss, innerLower, h), innerLower + InterpolationToleranceHz(Loss, innerLower, h));
        Assert.InRange(inner.UpperHz!.Value, innerUpper - InterpolationToleranceHz(Loss, innerUpper, h), innerUpper + InterpolationToleranceHz(Loss, innerUpper, h));
        Assert.InRange(outer.LowerHz!.Value, outerLower - InterpolationToleranceHz(Loss, outerLower, h), outerLower + InterpolationToleranceHz(Loss, outerLower, h));
        Assert.InRange(outer.UpperHz!.Value, outerUpper - InterpolationToleranceHz(Loss, outerUpper, h), outerUpper + InterpolationToleranceHz(Loss, outerUpper, h));
    }

    [Fact]
    public void A_ripple_that_crosses_the_level_and_comes_back_gives_innermost_and_outermost_edges()
    {
        // Piecewise linear in dB with corners on grid points, so linear interpolation is exact (to rounding, 1e-9 Hz).
        // 0 dB at 1000 Hz; up to 4 dB at 1010 Hz, back to 1 dB at 1020 Hz, then 40 dB at 1060 Hz; symmetric below.
        var grid = FrequencyGrid.Linear(900, 1100, 201);
        static double Loss(double f)
        {
            double x = Math.Abs(f - 1000);
            return x <= 10 ? 0.4 * x : x <= 20 ? 4 - 0.3 * (x - 10) : 1 + 0.975 * (x - 20);
        }
        ResponseTrace trace = Trace(grid, Loss);

        LevelBandwidth inner = BandEdges.Find(trace, 3, EdgeSearch.Innermost);
        LevelBandwidth outer = BandEdges.Find(trace, 3, EdgeSearch.Outermost);

        // Inner: 0.4x = 3 → x = 7.5. Outer: 1 + 0.975(x − 20) = 3 → x = 20 + 2/0.975.
        Assert.Equal(992.5, inner.LowerHz!.Value, 9);
        Assert.Equal(1007.5, inner.UpperHz!.Value, 9);
        Assert.Equal(1000 - 20 - 2 / 0.975, outer.LowerHz!.Value, 9);
        Assert.Equal(1000 + 20 + 2 / 0.975, outer.UpperHz!.Value, 9);
    }

    [Fact]
    public void A_level_not_reached_on_one_side_gives_a_null_edge_and_a_warning_never_the_sweep_end()
    {
        const int order = 4;
        // The sweep stops above f0 before the 20 dB edge: Ω at 20 dB = 99^(1/8) = 1.776, edge ≈ f0 + 177 kHz.
        var grid = FrequencyGrid.Linear(F0Hz - 3 * BandwidthHz, F0Hz + 0.5 * BandwidthHz, 3501);
        ResponseTrace trace = Trace(grid, f => ButterworthLossDb(f, F0Hz, BandwidthHz, order));
        var warnings = new List<MeasurementWarning>();

        LevelBandwidth band = BandEdges.Find(trace, 20, EdgeSearch.Innermost, warnings);

        Assert.NotNull(band.LowerHz);
        Assert.Null(band.UpperHz);
        Assert.Null(band.BandwidthHz);
        Assert.Null(band.CentreHz);
        Assert.Null(band.GeometricCentreHz);
        MeasurementWarning warning = Assert.Single(warnings);
        Assert.Equal(MeasurementWarningCodes.EdgeNotFound, warning.Code);
        Assert.Contains("upper", warning.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Outermost_edge_is_null_when_the_level_is_not_held_to_the_sweep_end()
    {
        // Falls to 30 dB at 1050 Hz, then a response climbs back to 5 dB at the sweep end (1100 Hz).
        var grid = FrequencyGrid.Linear(900, 1100, 201);
        static double Loss(double f) => f <= 1050 ? 0.6 * Math.Abs(f - 1000) : 30 - 0.5 * (f - 1050);
        ResponseTrace trace = Trace(grid, Loss);
        var warnings = new List<MeasurementWarning>();

        LevelBandwidth outer = BandEdges.Find(trace, 20, EdgeSearch.Outermost, warnings);
        LevelBandwidth inner = BandEdges.Find(trace, 20, EdgeSearch.Innermost);

        // Lower side: 0.6·x = 20 → x = 33.33 (exact, corner-free segment). Upper: outermost inconclusive, innermost found.
        Assert.Equal(1000 - 20 / 0.6, outer.LowerHz!.Value, 9);
        Assert.Null(outer.UpperHz);
        Assert.Equal(1000 + 20 / 0.6, inner.UpperHz!.Value, 9);
        Assert.Contains(warnings, w => w.Code == MeasurementWarningCodes.EdgeNotFound && w.Message.Contains("upper", StringComparison.Ordinal));
    }

    [Fact]
    public void Centre_worked_example_arithmetic_and_geometric()
    {
        // DOMAIN 9.5 (worked example, computed): edges 10.56/10.84 MHz → arithmetic 10.70000, geometric 10.69908 MHz.
        // Triangular response in dB reaching 3 dB exactly on the grid points 10.56 and 10.84 MHz.
        var grid = FrequencyGrid.Linear(10.40e6, 11.00e6, 61);
        ResponseTrace trace = Trace(grid, f => 3 * Math.Abs(f - 10.70e6) / 0.14e6);

        LevelBandwidth band = BandEdges.Find(trace, 3);

        // Tolerances: the edges are grid points, exact to rounding (1e-6 Hz); centres to half the last printed digit (5 Hz).
        Assert.Equal(10.56e6, band.LowerHz!.Value, 1e-6);
        Assert.Equal(10.84e6, band.UpperHz!.Value, 1e-6);
        Assert.Equal(10.70000e6, band.CentreHz!.Value, 5.0);
        Assert.Equal(10.69908e6, band.GeometricCentreHz!.Value, 5.0);
    }

    [Fact]
    public void Centre_worked_example_wideband()
    {
        // DOMAIN 9.5 (worked example, computed): edges 52/88 MHz → 70.000 vs 67.646 MHz (half the last digit: 500 Hz).
        LevelBandwidth band = LevelBandwidth.FromEdges(3, 52e6, 88e6);

        Assert.Equal(70.000e6, band.CentreHz!.Value, 500.0);
        Assert.Equal(67.646e6, band.GeometricCentreHz!.Value, 500.0);
        Assert.Equal(36e6, band.BandwidthHz!.Value, 1e-6);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(-3.0)]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    public void A_level_that_is_not_positive_and_finite_is_refused(double levelDb)
    {
        ResponseTrace trace = Trace(FrequencyGrid.Linear(1, 2, 3), f => f);

        var error = Assert.Throws<ArgumentOutOfRangeException>(() => BandEdges.Find(trace, levelDb));
        Assert.Equal("levelDb", error.ParamName);
    }
}
