using System.Numerics;
using System.Text;
using FilterQA.Core.Formats.Touchstone;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Tests.Formats.Touchstone;

/// <summary>Helpers shared by the Touchstone tests: reading text, and the standard's value definitions.</summary>
internal static class TouchstoneTestText
{
    public static Sweep Read(string text, string fileName) => TouchstoneReader.Read(Encoding.ASCII.GetBytes(text), fileName);

    /// <summary>RI: a + jb (Touchstone standard, option line formats).</summary>
    public static Complex Ri(double a, double b) => new(a, b);

    /// <summary>MA: a·e^(jπb/180) (Touchstone standard).</summary>
    public static Complex Ma(double a, double b) => Complex.FromPolarCoordinates(a, b * Math.PI / 180.0);

    /// <summary>DB: 10^(a/20)·e^(jπb/180) (Touchstone standard).</summary>
    public static Complex Db(double a, double b) => Complex.FromPolarCoordinates(Math.Pow(10, a / 20.0), b * Math.PI / 180.0);

    /// <summary>
    /// Asserts |actual − expected| ≤ tolerance·max(1, |expected|). The tolerance is stated by each caller.
    /// </summary>
    public static void Near(Complex expected, Complex actual, double tolerance, string what = "")
    {
        double error = (actual - expected).Magnitude;
        double allowed = tolerance * Math.Max(1.0, expected.Magnitude);
        Assert.True(error <= allowed, $"{what}: expected {expected}, got {actual} (error {error:E3} > {allowed:E3})");
    }
}
