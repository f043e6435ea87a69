using System.Numerics;
using FilterQA.Core.Synthesis;

namespace FilterQA.Core.Tests.Synthesis;

// The filter model against handbook formulas for all-pole prototypes (Williams and Taylor, Electronic Filter
// Design Handbook, ch. 2; any filter text): Butterworth |H|² = 1/(1 + Ω^(2N)), Chebyshev
// |H|² = 1/(1 + ε²·T_N(Ω)²), and the bandpass map Ω = (f0/B)·(f/f0 − f0/f).
public class BandpassPrototypeTests
{
    private const double F0 = 10e6, B = 200e3;

    private static double Omega(double f) => F0 / B * (f / F0 - F0 / f);

    // |T_N(x)|; only its square is used.
    private static double Chebyshev(int n, double x) =>
        Math.Abs(x) <= 1 ? Math.Cos(n * Math.Acos(x)) : Math.Cosh(n * Math.Acosh(Math.Abs(x)));

    [Theory]
    [InlineData(3, 0.0)]
    [InlineData(5, 0.0)]
    [InlineData(4, 0.5)]
    [InlineData(7, 0.5)]
    [InlineData(5, 0.2)]
    public void Bandpass_magnitude_matches_the_prototype_formula(int order, double rippleDb)
    {
        Complex[] poles = BandpassPrototype.Poles(order, rippleDb);
        Complex numerator = BandpassPrototype.DcGainNumerator(poles);
        double epsilon2 = Math.Pow(10, rippleDb / 10) - 1;
        for (double f = 9.5e6; f <= 10.5e6; f += 7_919)
        {
            double x = Omega(f);
            double expected = rippleDb == 0
                ? 1 / (1 + Math.Pow(x, 2 * order))
                : 1 / (1 + epsilon2 * Math.Pow(Chebyshev(order, x), 2));
            // Chebyshev prototypes normalised to 1 at DC: even orders start at a ripple valley, 1/(1 + ε²).
            if (rippleDb > 0 && order % 2 == 0)
            {
                expected *= 1 + epsilon2;
            }
            double actual = Math.Pow(BandpassPrototype.Evaluate(poles, numerator, f, F0, B, 0).Magnitude, 2);
            // Relative 1e-9: the same rational function evaluated two ways, only rounding differs.
            Assert.Equal(expected, actual, expected * 1e-9);
        }
    }

    [Theory]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(6)]
    public void Butterworth_group_delay_at_centre_is_two_over_B_sin(int order)
    {
        // Butterworth lowpass delay at DC: Σ −Re p/|p|² = Σ sin θk = 1/sin(π/(2N)) s (derivation from the
        // pole positions); the bandpass map has dΩ/dω = 2/B at f0, so τ(f0) = 2/(2πB·sin(π/(2N))).
        Complex[] poles = BandpassPrototype.Poles(order, 0);
        Complex numerator = BandpassPrototype.DcGainNumerator(poles);
        double expected = 2 / (2 * Math.PI * B * Math.Sin(Math.PI / (2 * order)));
        double h = 10; // Hz; central difference of the phase, error O(h²) ≪ 1e-6 relative here
        double phaseUp = BandpassPrototype.Evaluate(poles, numerator, F0 + h, F0, B, 0).Phase;
        double phaseDown = BandpassPrototype.Evaluate(poles, numerator, F0 - h, F0, B, 0).Phase;
        double delay = -(phaseUp - phaseDown) / (2 * Math.PI * 2 * h);
        Assert.Equal(expected, delay, expected * 1e-6);
    }

    [Fact]
    public void Arithmetic_centre_of_the_band_edges_is_the_requested_centre()
    {
        // Edges of the geometric map satisfy fL·fU = f0², fU − fL = B; their mean is √(f0² + B²/4).
        const double bandwidth = 19e3;
        double f0 = BandpassPrototype.GeometricCentreHz(455e3, bandwidth);
        double upper = bandwidth / 2 + Math.Sqrt(bandwidth * bandwidth / 4 + f0 * f0);
        double lower = upper - bandwidth;
        Assert.Equal(f0 * f0, lower * upper, f0 * f0 * 1e-12); // geometric symmetry, rounding only
        Assert.Equal(455e3, (upper + lower) / 2, 1e-6); // 1 µHz: rounding only
    }
}
