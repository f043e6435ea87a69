using FilterQA.Core.Measurement;
using FilterQA.Core.Sweeps;
using static FilterQA.Core.Tests.Measurement.AnalyticBandpass;

namespace FilterQA.Core.Tests.Measurement;

public sealed class ShapeFactorAndSpuriousTests
{
    private const double F0Hz = 455e3;
    private const double BandwidthHz = 12e3;

    [Theory]
    [InlineData(4, 6.0, 60.0)]
    [InlineData(6, 3.0, 60.0)]
    [InlineData(5, 3.0, 40.0)]
    public void Butterworth_shape_factor_matches_the_closed_form(int order, double narrowDb, double wideDb)
    {
        var grid = FrequencyGrid.Linear(F0Hz - 15 * BandwidthHz, F0Hz + 15 * BandwidthHz, 12001);
        double Loss(double f) => ButterworthLossDb(f, F0Hz, BandwidthHz, order);
        ResponseTrace trace = Trace(grid, Loss);

        double? factor = ShapeFactor.Of(trace, narrowDb, wideDb);

        // upper − lower = Ω_X·B for the lowpass-to-bandpass edges (difference of the two roots), so the shape factor is
        // Ω_A2/Ω_A1 = ((10^(A2/10) − 1)/(10^(A1/10) − 1))^(1/(2n)) (Butterworth prototype, Zverev, from memory).
        // f0 is on the grid, so the minimum is 0 dB. Tolerance: the interpolation bounds of the four edges (DOMAIN 4) over the bandwidths.
        double expected = ButterworthOmegaAt(wideDb, order) / ButterworthOmegaAt(narrowDb, order);
        (double nl, double nu) = EdgesHz(ButterworthOmegaAt(narrowDb, order), F0Hz, BandwidthHz);
        (double wl, double wu) = EdgesHz(ButterworthOmegaAt(wideDb, order), F0Hz, BandwidthHz);
        double h = grid.MaxStepHz;
        double relative = (InterpolationToleranceHz(Loss, nl, h) + InterpolationToleranceHz(Loss, nu, h)) / (nu - nl)
            + (InterpolationToleranceHz(Loss, wl, h) + InterpolationToleranceHz(Loss, wu, h)) / (wu - wl);
        Assert.Equal(expected, factor!.Value, expected * relative + 1e-12);
    }

    [Fact]
    public void Shape_factor_is_inconclusive_when_the_wide_level_is_not_reached()
    {
        // Order 4: 60 dB needs Ω = (10^6 − 1)^(1/8) = 5.62, i.e. ±34 kHz; the sweep stops at ±20 kHz.
        var grid = FrequencyGrid.Linear(F0Hz - 20e3, F0Hz + 20e3, 401);
        ResponseTrace trace = Trace(grid, f => ButterworthLossDb(f, F0Hz, BandwidthHz, 4));
        var warnings = new List<MeasurementWarning>();

        Assert.Null(ShapeFactor.Of(trace, 6, 60, warnings));
        Assert.Contains(warnings, w => w.Code == MeasurementWarningCodes.EdgeNotFound);
    }

    [Fact]
    public void Shape_factor_levels_must_increase()
    {
        ResponseTrace trace = Trace(FrequencyGrid.Linear(1, 2, 3), f => f);

        Assert.Throws<ArgumentOutOfRangeException>(() => ShapeFactor.Of(trace, 60, 6));
    }

    [Fact]
    public void Spurious_responses_above_the_threshold_are_found_and_noise_ripple_is_not()
    {
        // A 21.4 MHz-style passband (Butterworth, order 4, B = 15 kHz) plus two narrow resonant responses added in power:
        // |H|² = |H_bp|² + a²/(1 + ((f − fs)/(w/2))²). Response 1 at +300 kHz, 45 dB below; response 2 at +600 kHz, 70 dB below.
        // Seeded Gaussian noise of 0.3 dB on every point: its local minima stand out by far less than 3 dB (10σ).
        const double f0 = 21.4e6, b = 15e3, w = 2e3;
        double Spur(double f, double fs, double belowDb) => Math.Pow(10, -belowDb / 10) / (1 + Math.Pow((f - fs) / (w / 2), 2));
        double Loss(double f)
        {
            double passband = 1 / (1 + Math.Pow(Omega(f, f0, b), 8));
            return -10 * Math.Log10(passband + Spur(f, f0 + 300e3, 45) + Spur(f, f0 + 600e3, 70));
        }
        var grid = FrequencyGrid.Linear(f0 - 200e3, f0 + 800e3, 2001);
        ResponseTrace trace = Trace(grid, Loss, noiseSigmaDb: 0.3, seed: 7);

        // A threshold of 100 dB lets every noise dip out to about +330 kHz through the level test, so only the prominence
        // rule keeps them out.
        IReadOnlyList<SpuriousResponse> found = SpuriousResponses.Find(trace, new FrequencyBand(f0 - 50e3, f0 + 50e3), 100);

        // The responses (grid points) are 45 and 70 dB below the 0 dB passband per the closed form; each reading is a noisy
        // point against the noisy minimum, each off by at most 5σ = 1.5 dB (seeded), so ±3 dB; the peak may move one step.
        Assert.Equal(2, found.Count);
        Assert.Equal(f0 + 300e3, found[0].Hz, grid.MaxStepHz);
        Assert.Equal(Loss(f0 + 300e3) - Loss(f0), found[0].RelativeLevelDb, 3.0);
        Assert.Equal(f0 + 600e3, found[1].Hz, grid.MaxStepHz);
        Assert.Equal(Loss(f0 + 600e3) - Loss(f0), found[1].RelativeLevelDb, 3.0);
        Assert.True(found[0].ProminenceDb > 20);
    }

    [Fact]
    public void Spurious_search_reports_only_responses_above_the_threshold()
    {
        const double f0 = 21.4e6, b = 15e3, w = 2e3;
        double Spur(double f, double fs, double belowDb) => Math.Pow(10, -belowDb / 10) / (1 + Math.Pow((f - fs) / (w / 2), 2));
        double Loss(double f) =>
            -10 * Math.Log10(1 / (1 + Math.Pow(Omega(f, f0, b), 8)) + Spur(f, f0 + 300e3, 45) + Spur(f, f0 + 600e3, 70));
        var grid = FrequencyGrid.Linear(f0 - 200e3, f0 + 800e3, 2001);
        ResponseTrace trace = Trace(grid, Loss);

        IReadOnlyList<SpuriousResponse> at60 = SpuriousResponses.Find(trace, new FrequencyBand(f0 - 50e3, f0 + 50e3), 60);
        IReadOnlyList<SpuriousResponse> at80 = SpuriousResponses.Find(trace, new FrequencyBand(f0 - 50e3, f0 + 50e3), 80);

        // Noise-free: the levels are the closed form at the grid points (rounding 1e-9 dB), in order of frequency.
        SpuriousResponse only = Assert.Single(at60);
        Assert.Equal(f0 + 300e3, only.Hz, 1e-6);
        Assert.Equal(Loss(f0 + 300e3) - Loss(f0), only.RelativeLevelDb, 1e-9);
        Assert.Equal(2, at80.Count);
        Assert.Equal(f0 + 600e3, at80[1].Hz, 1e-6);
        Assert.Equal(Loss(f0 + 600e3) - Loss(f0), at80[1].RelativeLevelDb, 1e-9);
    }
}
