using FilterQA.Core.Resonators;

namespace FilterQA.Core.Tests.Resonators;

/// <summary>The three-point parabola between samples (DOMAIN 4) and the prominence of local maxima.</summary>
public sealed class ExtremaTests
{
    [Theory]
    [InlineData(-1.0, -0.2, -0.5)]
    [InlineData(-3.0, -0.1, -0.2)]
    [InlineData(-0.4, -0.1, -2.5)]
    public void Vertex_on_a_uniform_step_is_the_DOMAIN_4_parabola(double yMinus, double y0, double yPlus)
    {
        double h = 40;
        double[] hz = [1000, 1000 + h, 1000 + 2 * h];
        double[] y = [yMinus, y0, yPlus];
        // DOMAIN 4: δ = h·(y₋₁ − y₊₁)/(2(y₋₁ − 2y₀ + y₊₁)); vertex value y₀ − (y₋₁ − y₊₁)·δ/(4h) of the same parabola.
        double delta = h * (yMinus - yPlus) / (2 * (yMinus - 2 * y0 + yPlus));
        double value = y0 - (yMinus - yPlus) * delta / (4 * h);

        (double f, double v) = Extrema.Vertex(hz, y, 1);

        Assert.Equal(1000 + h + delta, f, 1e-9); // same arithmetic, different order: rounding only
        Assert.Equal(value, v, 1e-12);
    }

    [Fact]
    public void Vertex_is_exact_for_a_parabola_on_a_non_uniform_grid()
    {
        // y = 3 − 0.002·(f − 1017)²: vertex at 1017, value 3 (algebra).
        double[] hz = [1000, 1010, 1035];
        double[] y = hz.Select(f => 3 - 0.002 * (f - 1017) * (f - 1017)).ToArray();

        (double f, double v) = Extrema.Vertex(hz, y, 1);

        Assert.Equal(1017, f, 1e-9);
        Assert.Equal(3, v, 1e-12);
    }

    [Fact]
    public void Prominence_is_height_above_the_higher_of_the_two_bases()
    {
        // Topographic prominence: index 2 (level 0) meets no higher sample either way, so its bases are the lowest
        // points of each side, −12 and −20: prominence 0 − (−12) = 12. Index 4 (−1) is stopped on the left by index 2,
        // so its bases are −4 and −20: prominence −1 − (−4) = 3.
        double[] level = [-12, -10, 0, -4, -1, -20, -15];

        var peaks = Extrema.ProminentPeaks(level, 3);

        Assert.Equal([2, 4], peaks.Select(p => p.Index));
        Assert.Equal([12.0, 3.0], peaks.Select(p => p.ProminenceDb));
        Assert.Single(Extrema.ProminentPeaks(level, 3.5)); // index 4 has only 3 dB
    }
}
