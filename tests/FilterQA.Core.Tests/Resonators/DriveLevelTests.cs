using FilterQA.Core.Resonators;

namespace FilterQA.Core.Tests.Resonators;

/// <summary>Drive level in the series-through fixture: P = 4·Z0·R1·Pav/(R1 + 2Z0)² (DOMAIN 3, worked example 4, computed).</summary>
public sealed class DriveLevelTests
{
    [Theory]
    // dBm available, R1 ohm, worked-example value W, tolerance = half the last printed digit
    [InlineData(0.0, 40.0, 408e-6, 0.5e-6)]    // 408 µW
    [InlineData(-20.0, 40.0, 4.1e-6, 0.05e-6)] // 4.1 µW
    public void Worked_example_4(double availableDbm, double r1Ohm, double expectedW, double toleranceW)
    {
        Assert.Equal(expectedW, DriveLevel.DissipatedFromDbmW(availableDbm, r1Ohm, 50), toleranceW);
    }

    [Theory]
    [InlineData(1e-3, 40.0, 50.0)]
    [InlineData(2e-3, 12.2, 50.0)]
    [InlineData(1e-4, 200.0, 75.0)]
    public void Equals_the_formula(double availableW, double r1Ohm, double z0Ohm)
    {
        double expected = 4 * z0Ohm * r1Ohm * availableW / Math.Pow(r1Ohm + 2 * z0Ohm, 2);
        Assert.Equal(expected, DriveLevel.DissipatedW(availableW, r1Ohm, z0Ohm), expected * 1e-14); // same formula, rounding only
    }

    [Fact]
    public void Never_exceeds_half_the_available_power_and_reaches_it_at_R1_equal_2Z0()
    {
        // DOMAIN 3: P ≤ Pav/2 (maximum power transfer to R1 from a 2·Z0 source-plus-load loop).
        Assert.Equal(0.5e-3, DriveLevel.DissipatedW(1e-3, 100, 50), 1e-18);
        Assert.True(DriveLevel.DissipatedW(1e-3, 99, 50) < 0.5e-3);
        Assert.True(DriveLevel.DissipatedW(1e-3, 101, 50) < 0.5e-3);
    }

    [Theory]
    [InlineData(double.NaN, 40.0, 50.0)]
    [InlineData(-1e-3, 40.0, 50.0)]
    [InlineData(1e-3, -1.0, 50.0)]
    [InlineData(1e-3, 40.0, 0.0)]
    public void Rejects_invalid_arguments(double availableW, double r1Ohm, double z0Ohm)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => DriveLevel.DissipatedW(availableW, r1Ohm, z0Ohm));
    }
}
