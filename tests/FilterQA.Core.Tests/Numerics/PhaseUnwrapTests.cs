using FilterQA.Core.Numerics;

namespace FilterQA.Core.Tests.Numerics;

public sealed class PhaseUnwrapTests
{
    [Fact]
    public void Unwrap_matches_the_numpy_documentation_example()
    {
        // numpy.unwrap reference documentation, Examples: phase = linspace(0, π, 5); phase[3:] += π;
        // unwrap(phase) = [0, 0.78539816, 1.57079633, -0.78539816, 0]. Exactly: [0, π/4, π/2, −π/4, 0].
        double[] phase = [0, Math.PI / 4, Math.PI / 2, 3 * Math.PI / 4 + Math.PI, Math.PI + Math.PI];

        double[] result = PhaseUnwrap.Unwrap(phase);

        double[] expected = [0, Math.PI / 4, Math.PI / 2, -Math.PI / 4, 0];
        for (int i = 0; i < expected.Length; i++)
        {
            // Tolerance 1e-12 rad: a few binary64 roundings of values below 2π.
            Assert.Equal(expected[i], result[i], 1e-12);
        }
    }

    [Theory]
    [InlineData(200e-9, 100e3)]   // 0.04π per step
    [InlineData(4.5e-6, 100e3)]   // 0.9π per step: still below π, so still recoverable
    public void Wrapped_linear_phase_of_a_delay_unwraps_to_the_ramp(double delayS, double stepHz)
    {
        // A pure delay τ has phase φ(f) = −2π·f·τ (textbook definition of group delay τ = −dφ/dω).
        // Unwrapping recovers it up to the multiple of 2π lost when the first sample was wrapped.
        const int count = 1000;
        var ramp = new double[count];
        var wrapped = new double[count];
        for (int i = 0; i < count; i++)
        {
            double f = 1e6 + i * stepHz;
            ramp[i] = -2 * Math.PI * f * delayS;
            wrapped[i] = Math.Atan2(Math.Sin(ramp[i]), Math.Cos(ramp[i]));
        }

        double[] result = PhaseUnwrap.Unwrap(wrapped);

        double offset = ramp[0] - wrapped[0];
        for (int i = 0; i < count; i++)
        {
            // Tolerance 1e-9 rad: phases reach ~3e3 rad here, so sin/cos/atan2 round at ~1e-11 rad per point
            // and the accumulated steps add at most ~1e-12 each over 1000 points.
            Assert.Equal(ramp[i] - offset, result[i], 1e-9);
        }
    }

    [Theory]
    [InlineData(Math.PI, Math.PI)]
    [InlineData(-Math.PI, Math.PI)]
    [InlineData(3 * Math.PI, Math.PI)]
    [InlineData(2 * Math.PI, 0.0)]
    [InlineData(-0.5, -0.5)]
    [InlineData(7.0, 7.0 - 2 * Math.PI)]
    public void Wrap_reduces_into_minus_pi_exclusive_to_pi_inclusive(double input, double expected)
    {
        // Convention: each step reduced into (−π, π] (group-delay practice, DOMAIN section 4). Tolerance 1e-12 rad.
        Assert.Equal(expected, PhaseUnwrap.Wrap(input), 1e-12);
    }

    [Fact]
    public void A_step_of_exactly_pi_is_kept_positive()
    {
        double[] result = PhaseUnwrap.Unwrap([0.0, -Math.PI]);

        // −π − 0 reduces to +π by the (−π, π] convention, so the unwrapped phase goes up by π.
        Assert.Equal(Math.PI, result[1], 1e-15);
    }

    [Fact]
    public void Empty_gives_empty_and_NaN_is_refused_with_its_index()
    {
        Assert.Empty(PhaseUnwrap.Unwrap([]));
        var error = Assert.Throws<ArgumentException>(() => PhaseUnwrap.Unwrap([0.0, double.NaN]));
        Assert.Contains("index 1", error.Message, StringComparison.Ordinal);
    }
}
