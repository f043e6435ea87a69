using System.Numerics;
using FilterQA.Core.Measurement;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Tests.Measurement;

public sealed class GroupDelayTests
{
    private static ResponseTrace LinearPhase(FrequencyGrid grid, double delayS)
    {
        // φ = −2π·f·τ0, stored wrapped into (−π, π] as an instrument reports it.
        var values = new Complex[grid.Count];
        for (int i = 0; i < values.Length; i++)
        {
            values[i] = Complex.FromPolarCoordinates(0.5, -2 * Math.PI * grid[i] * delayS);
        }
        return ResponseTrace.FromComplex(grid, ResponsePath.Transmission, values);
    }

    [Theory]
    [InlineData(1e-6, 100e3, 1e6)]
    [InlineData(250e-9, 200e3, 0.5e6)]
    [InlineData(1e-6, 100e3, 50e3)]
    public void Linear_phase_gives_its_delay_exactly(double delayS, double stepHz, double apertureHz)
    {
        // τ = −dφ/dω (IEC 60862 / textbook definition): for φ = −2πfτ0 every difference quotient is τ0.
        var grid = FrequencyGrid.Linear(60e6, 60e6 + 200 * stepHz, 201);
        ResponseTrace trace = LinearPhase(grid, delayS);
        var warnings = new List<MeasurementWarning>();

        double? tau = GroupDelay.At(trace, 60e6 + 100 * stepHz, apertureHz, warnings);
        GroupDelayVariation variation = GroupDelay.Variation(trace, new FrequencyBand(60e6 + 50 * stepHz, 60e6 + 150 * stepHz), apertureHz, warnings)!;

        // Tolerance: the phase of a wrapped complex number is exact to ~1e-15 rad; over at least one step that is < 1e-9 relative.
        Assert.Equal(delayS, tau!.Value, delayS * 1e-9);
        Assert.Equal(0, variation.VariationS, delayS * 1e-9);
        Assert.Empty(warnings);
    }

    [Theory]
    [InlineData(300e3)]
    [InlineData(600e3)]
    public void A_step_near_or_beyond_the_unwrapping_limit_is_warned(double stepHz)
    {
        // DOMAIN 4: unwrapping needs Δf < 1/(2τmax) = 500 kHz at 1 µs. 300 kHz turns the phase by 0.6π per step (within a
        // factor 2 of the limit); 600 kHz aliases to a step of 0.8π the other way.
        const double delayS = 1e-6;
        var grid = FrequencyGrid.Linear(60e6, 60e6 + 100 * stepHz, 101);
        ResponseTrace trace = LinearPhase(grid, delayS);
        var warnings = new List<MeasurementWarning>();

        GroupDelay.At(trace, 60e6 + 50 * stepHz, stepHz, warnings);

        Assert.Contains(warnings, w => w.Code == MeasurementWarningCodes.PhaseStepTooCoarse);
    }

    [Fact]
    public void An_expected_delay_beyond_the_step_limit_is_warned_even_when_the_data_look_smooth()
    {
        // 1 µs seen at a 100 kHz step is fine, but a part that may reach 4 µs needs Δf < 125 kHz (DOMAIN 4) — and within
        // the factor-2 guard, below 62.5 kHz.
        var grid = FrequencyGrid.Linear(60e6, 70e6, 101);
        ResponseTrace trace = LinearPhase(grid, 1e-6);
        var quiet = new List<MeasurementWarning>();
        var warned = new List<MeasurementWarning>();

        GroupDelay.At(trace, 65e6, 200e3, quiet);
        GroupDelay.At(trace, 65e6, 200e3, warned, expectedMaxDelayS: 4e-6);

        Assert.Empty(quiet);
        Assert.Contains(warned, w => w.Code == MeasurementWarningCodes.PhaseStepTooCoarse);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(0.5)]
    [InlineData(-1.0)]
    public void Single_pole_resonator_delay_matches_the_closed_form(double offsetInBandwidths)
    {
        // H = 1/(1 + jx), x = Q(f/f0 − f0/f) (single-tuned resonator, textbook, from memory): φ = −atan x,
        // τ = −dφ/dω = (1/2π)·Q(1/f0 + f0/f²)/(1 + x²); at f0 this is Q/(π·f0).
        const double f0 = 10.7e6, q = 50;
        double b3 = f0 / q;
        var grid = FrequencyGrid.Linear(f0 - 1e6, f0 + 1e6, 2001);
        var values = new Complex[grid.Count];
        for (int i = 0; i < values.Length; i++)
        {
            double x = q * (grid[i] / f0 - f0 / grid[i]);
            values[i] = 1 / new Complex(1, x);
        }
        ResponseTrace trace = ResponseTrace.FromComplex(grid, ResponsePath.Transmission, values);
        static double Tau(double f)
        {
            double x = q * (f / f0 - f0 / f);
            return q * (1 / f0 + f0 / (f * f)) / (1 + x * x) / (2 * Math.PI);
        }
        double hz = f0 + offsetInBandwidths * b3 / 2;
        hz = grid[(int)Math.Round((hz - grid.StartHz) / grid.MaxStepHz)];
        const double apertureHz = 2e3;

        double? tau = GroupDelay.At(trace, hz, apertureHz);

        // Tolerance: a central difference over ±a/2 returns τ + (a/2)²·τ''/6 (Taylor); τ'' from the closed form by a central
        // difference, times 3 for safety, plus 1e-9 relative for rounding of the phase.
        double d = b3 / 100;
        double curvature = Math.Abs(Tau(hz + d) - 2 * Tau(hz) + Tau(hz - d)) / (d * d);
        double tolerance = 3 * (apertureHz / 2) * (apertureHz / 2) * curvature / 6 + 1e-9 * Tau(hz);
        Assert.Equal(Tau(hz), tau!.Value, tolerance);
        if (offsetInBandwidths == 0)
        {
            Assert.Equal(q / (Math.PI * f0), tau.Value, tolerance);
        }
    }

    [Fact]
    public void Resonator_delay_variation_over_the_3_dB_band_matches_the_closed_form()
    {
        // Same resonator: over f0 ± B3/2 the delay falls from Q/(πf0) at f0 to about half at the edges (x = ±1).
        const double f0 = 10.7e6, q = 50;
        double b3 = f0 / q;
        var grid = FrequencyGrid.Linear(f0 - 1e6, f0 + 1e6, 2001);
        var values = new Complex[grid.Count];
        for (int i = 0; i < values.Length; i++)
        {
            values[i] = 1 / new Complex(1, q * (grid[i] / f0 - f0 / grid[i]));
        }
        ResponseTrace trace = ResponseTrace.FromComplex(grid, ResponsePath.Transmission, values);
        static double Tau(double f)
        {
            double x = q * (f / f0 - f0 / f);
            return q * (1 / f0 + f0 / (f * f)) / (1 + x * x) / (2 * Math.PI);
        }
        var band = new FrequencyBand(f0 - b3 / 2, f0 + b3 / 2);
        double expectedMax = double.NegativeInfinity, expectedMin = double.PositiveInfinity;
        foreach (double f in grid.Hz)
        {
            if (band.Contains(f))
            {
                expectedMax = Math.Max(expectedMax, Tau(f));
                expectedMin = Math.Min(expectedMin, Tau(f));
            }
        }

        GroupDelayVariation variation = GroupDelay.Variation(trace, band, 2e3)!;

        // Tolerance: (a/2)²·|τ''|/6 with |τ''| ≤ 8τ/B3² near the peak (Lorentzian shape), times 3, relative to τ(f0).
        double tolerance = 3 * 1e3 * 1e3 * 8 / (b3 * b3) / 6 * Tau(f0);
        Assert.Equal(expectedMax, variation.MaxDelayS, tolerance);
        Assert.Equal(expectedMin, variation.MinDelayS, tolerance);
        Assert.Equal(expectedMax - expectedMin, variation.VariationS, 2 * tolerance);
    }

    [Fact]
    public void Without_phase_there_is_no_delay_and_a_warning()
    {
        ResponseTrace trace = ResponseTrace.Create(FrequencyGrid.Linear(1e6, 2e6, 11), ResponsePath.Transmission, new double[11]);
        var warnings = new List<MeasurementWarning>();

        Assert.Null(GroupDelay.At(trace, 1.5e6, 1e5, warnings));
        Assert.Null(GroupDelay.Variation(trace, new FrequencyBand(1e6, 2e6), 1e5, warnings));
        Assert.Equal(2, warnings.Count(w => w.Code == MeasurementWarningCodes.NoPhase));
    }

    [Fact]
    public void An_aperture_beyond_the_sweep_end_is_warned()
    {
        var grid = FrequencyGrid.Linear(60e6, 70e6, 101);
        ResponseTrace trace = LinearPhase(grid, 1e-7);
        var warnings = new List<MeasurementWarning>();

        double? tau = GroupDelay.At(trace, 60.1e6, 1e6, warnings);

        // Still exact for linear phase (any two points give τ0); only the centring is lost.
        Assert.Equal(1e-7, tau!.Value, 1e-16);
        Assert.Contains(warnings, w => w.Code == MeasurementWarningCodes.ApertureTruncated);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(-1.0)]
    [InlineData(double.NaN)]
    public void A_bad_aperture_is_refused(double apertureHz)
    {
        ResponseTrace trace = LinearPhase(FrequencyGrid.Linear(60e6, 70e6, 11), 1e-7);

        var error = Assert.Throws<ArgumentOutOfRangeException>(() => GroupDelay.At(trace, 65e6, apertureHz));
        Assert.Equal("apertureHz", error.ParamName);
    }
}
