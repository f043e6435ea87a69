using System.Globalization;
using System.Numerics;
using FilterQA.Core.Sweeps;
using static FilterQA.Core.Tests.Formats.Touchstone.TouchstoneTestText;

namespace FilterQA.Core.Tests.Formats.Touchstone;

/// <summary>
/// Y and Z data converted to S, checked against closed forms (not against the reader's matrix code).
/// Tolerance 1e-12 relative: the reader solves a linear system (LU), the test evaluates a quotient; both are
/// correct to a few units in the last place.
/// </summary>
public sealed class TouchstoneConversionTests
{
    private const double Tol = 1e-12;

    private static string N(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    [Fact]
    public void Version1_Z_is_normalised_to_R_so_0_99_at_R_75_is_74_25_ohm()
    {
        // Touchstone standard's example (DOMAIN 1 [S]): a v1 Z value 0.99 at R 75 equals 74.25 ohm in the v2 form.
        Sweep v1 = Read("# GHz Z RI R 75\n1 0.99 0\n", "z.s1p");
        Sweep v2 = Read("[Version] 2.0\n# GHz Z RI R 75\n[Number of Ports] 1\n[Number of Frequencies] 1\n[Network Data]\n1 74.25 0\n[End]\n", "z.ts");

        // Closed form for a one-port: S = (Z − Z0)/(Z + Z0) (reflection coefficient, any circuit text).
        Complex expected = (74.25 - 75.0) / (74.25 + 75.0);
        Near(expected, v1.Network!.Trace(1, 1)[0], Tol, "v1");
        Near(expected, v2.Network!.Trace(1, 1)[0], Tol, "v2");
        Assert.Equal(75.0, v2.Network.ReferenceOhm[0]);
    }

    [Theory]
    [InlineData(30.0, 40.0, 50.0)]
    [InlineData(10.0, -120.0, 75.0)]
    [InlineData(1000.0, 0.0, 50.0)]
    public void One_port_Z_and_Y_match_the_reflection_coefficient(double r, double x, double z0)
    {
        var z = new Complex(r, x);
        Complex y = 1 / z;
        // S = (Z − Z0)/(Z + Z0) (reflection coefficient).
        Complex expected = (z - z0) / (z + z0);

        Sweep fromZ = Read($"[Version] 2.0\n# MHz Z RI R {N(z0)}\n[Number of Ports] 1\n[Number of Frequencies] 1\n[Network Data]\n1 {N(z.Real)} {N(z.Imaginary)}\n[End]\n", "a.ts");
        Sweep fromY = Read($"[Version] 2.0\n# MHz Y RI R {N(z0)}\n[Number of Ports] 1\n[Number of Frequencies] 1\n[Network Data]\n1 {N(y.Real)} {N(y.Imaginary)}\n[End]\n", "b.ts");
        Sweep fromNormalisedY = Read($"# MHz Y RI R {N(z0)}\n1 {N((y * z0).Real)} {N((y * z0).Imaginary)}\n", "c.s1p");

        Near(expected, fromZ.Network!.Trace(1, 1)[0], Tol, "Z");
        Near(expected, fromY.Network!.Trace(1, 1)[0], Tol, "Y");
        Near(expected, fromNormalisedY.Network!.Trace(1, 1)[0], Tol, "normalised Y");
    }

    [Theory]
    [InlineData(30.0, 40.0)]
    [InlineData(200.0, -75.0)]
    public void Two_port_series_impedance_from_Y_parameters(double r, double x)
    {
        // A series impedance Z between the ports has Y = (1/Z)·[[1, −1], [−1, 1]] (its Z matrix does not exist).
        // Closed form (from memory, textbook two-port tables, e.g. Pozar, Microwave Engineering):
        // S11 = S22 = Z/(Z + 2·Z0), S21 = S12 = 2·Z0/(Z + 2·Z0).
        const double z0 = 50.0;
        var z = new Complex(r, x);
        Complex y = 1 / z;
        string v2 = $"[Version] 2.0\n# GHz Y RI R 50\n[Number of Ports] 2\n[Two-Port Data Order] 12_21\n[Number of Frequencies] 1\n[Network Data]\n"
            + $"1 {N(y.Real)} {N(y.Imaginary)} {N(-y.Real)} {N(-y.Imaginary)} {N(-y.Real)} {N(-y.Imaginary)} {N(y.Real)} {N(y.Imaginary)}\n[End]\n";
        Complex yn = y * z0;
        string v1 = $"# GHz Y RI R 50\n1 {N(yn.Real)} {N(yn.Imaginary)} {N(-yn.Real)} {N(-yn.Imaginary)} {N(-yn.Real)} {N(-yn.Imaginary)} {N(yn.Real)} {N(yn.Imaginary)}\n";

        foreach (NetworkData s in new[] { Read(v2, "series.ts").Network!, Read(v1, "series.s2p").Network! })
        {
            Near(z / (z + 2 * z0), s[0, 1, 1], Tol, "S11");
            Near(2 * z0 / (z + 2 * z0), s[0, 2, 1], Tol, "S21");
            Near(2 * z0 / (z + 2 * z0), s[0, 1, 2], Tol, "S12");
            Near(z / (z + 2 * z0), s[0, 2, 2], Tol, "S22");
        }
    }

    [Fact]
    public void Two_port_shunt_impedance_from_Z_parameters()
    {
        // A shunt impedance Z across the line has Z = [[Z, Z], [Z, Z]]. Closed form (from memory, textbook two-port
        // tables): S11 = −Z0/(2Z + Z0), S21 = 2Z/(2Z + Z0).
        const double z0 = 50.0;
        var z = new Complex(20.0, -35.0);
        string pair = $"{N(z.Real)} {N(z.Imaginary)}";
        NetworkData s = Read($"[Version] 2.0\n# GHz Z RI R 50\n[Number of Ports] 2\n[Two-Port Data Order] 21_12\n[Number of Frequencies] 1\n[Network Data]\n1 {pair} {pair} {pair} {pair}\n[End]\n", "shunt.ts").Network!;

        Near(-z0 / (2 * z + z0), s[0, 1, 1], Tol, "S11");
        Near(2 * z / (2 * z + z0), s[0, 2, 1], Tol, "S21");
    }

    [Fact]
    public void Per_port_references_normalise_each_port_with_its_own_Z0()
    {
        // Two unconnected ports (diagonal Z): each S_ii = (Z_i − Z0_i)/(Z_i + Z0_i), off-diagonals 0 (reflection coefficient).
        NetworkData s = Read("[Version] 2.0\n# GHz Z RI R 50\n[Number of Ports] 2\n[Two-Port Data Order] 12_21\n[Number of Frequencies] 1\n"
            + "[Reference] 50 75\n[Network Data]\n1 100 0 0 0 0 0 25 0\n[End]\n", "diag.ts").Network!;

        Near((100.0 - 50.0) / (100.0 + 50.0), s[0, 1, 1], Tol, "S11");
        Near((25.0 - 75.0) / (25.0 + 75.0), s[0, 2, 2], Tol, "S22");
        Near(Complex.Zero, s[0, 2, 1], Tol, "S21");
    }
}
