using FilterQA.Core.Normalisation;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Tests.Normalisation;

public sealed class LinearResamplerTests
{
    private static FrequencyGrid RandomGrid(Random random, double startHz, double stopHz, int count)
    {
        var hz = new double[count];
        hz[0] = startHz;
        hz[^1] = stopHz;
        for (int i = 1; i < count - 1; i++)
        {
            hz[i] = startHz + (stopHz - startHz) * random.NextDouble();
        }
        Array.Sort(hz);
        return FrequencyGrid.FromHz(hz.Distinct().ToArray());
    }

    [Fact]
    public void Linear_function_is_reproduced_on_any_grid()
    {
        // A degree-1 polynomial is its own linear interpolant (uniqueness of polynomial interpolation).
        var random = new Random(11);
        FrequencyGrid source = RandomGrid(random, 10e6, 20e6, 300);
        FrequencyGrid target = RandomGrid(random, 10e6, 20e6, 777);
        static double Line(double f) => 3.5 - 2.25e-6 * (f - 15e6);
        double[] values = source.Hz.ToArray().Select(Line).ToArray();

        double[] result = LinearResampler.Resample(source, values, target);

        for (int k = 0; k < target.Count; k++)
        {
            // Tolerance 1e-12 dB: values are below 15 in size; a handful of binary64 roundings (~2e-15 each).
            Assert.Equal(Line(target[k]), result[k], 1e-12);
        }
    }

    [Fact]
    public void Quadratic_has_the_known_interpolation_error()
    {
        // For g(f) = f², the linear interpolant between f0 and f1 errs by exactly (f − f0)(f1 − f) (the
        // interpolation remainder g''/2·(f − f0)(f1 − f) with g'' = 2). Frequencies in MHz keep numbers small.
        FrequencyGrid source = FrequencyGrid.FromHz([1, 2, 4, 7]);
        FrequencyGrid target = FrequencyGrid.FromHz([1.5, 3, 6.25]);
        double[] values = [1, 4, 16, 49];

        double[] result = LinearResampler.Resample(source, values, target);

        Assert.Equal(1.5 * 1.5 + (1.5 - 1) * (2 - 1.5), result[0], 1e-12);
        Assert.Equal(3.0 * 3 + (3 - 2) * (4 - 3.0), result[1], 1e-12);
        Assert.Equal(6.25 * 6.25 + (6.25 - 4) * (7 - 6.25), result[2], 1e-12);
    }

    [Fact]
    public void Source_points_are_returned_exactly()
    {
        FrequencyGrid grid = FrequencyGrid.FromHz([1e6, 1.5e6, 4e6]);
        double[] values = [0.1, -7.3, 2.0 / 3.0];

        // No arithmetic happens at a coinciding point, so the values come back bit for bit.
        Assert.Equal(values, LinearResampler.Resample(grid, values, grid));
    }

    [Fact]
    public void Target_beyond_the_source_span_is_refused()
    {
        FrequencyGrid source = FrequencyGrid.Linear(10e6, 20e6, 11);
        FrequencyGrid target = FrequencyGrid.Linear(9e6, 20e6, 12);
        var result = new double[12];

        Assert.False(LinearResampler.TryResample(source, new double[11], target, result));
        var error = Assert.Throws<ArgumentException>(() => LinearResampler.Resample(source, new double[11], target));
        Assert.Contains("covers 10000000\u201320000000 Hz but the sweep needs 9000000\u201320000000 Hz", error.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(0.5e-9, true)]
    [InlineData(2e-9, false)]
    public void Coverage_allows_a_relative_slack_of_1e_minus_9(double relativeExcess, bool covered)
    {
        FrequencyGrid source = FrequencyGrid.FromHz([1e9, 2e9]);
        FrequencyGrid target = FrequencyGrid.FromHz([1e9 * (1 - relativeExcess), 2e9 * (1 + relativeExcess)]);

        Assert.Equal(covered, LinearResampler.Covers(source, target));
        if (covered)
        {
            // Points within the slack take the end values (no extrapolation).
            Assert.Equal([5.0, 9.0], LinearResampler.Resample(source, [5.0, 9.0], target));
        }
    }

    [Fact]
    public void One_point_source_covers_only_its_own_frequency()
    {
        FrequencyGrid one = FrequencyGrid.FromHz([1e6]);

        Assert.Equal([-4.0], LinearResampler.Resample(one, [-4.0], one));
        Assert.False(LinearResampler.Covers(one, FrequencyGrid.FromHz([1e6, 1.1e6])));
    }
}
