using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Tests.Resonators;

/// <summary>The crystal of DOMAIN worked example 2 (computed): fs = 10 MHz, C1 = 20 fF, C0 = 5 pF, R1 = 10 ohm.</summary>
internal static class CrystalCases
{
    public const double FsHz = 10e6;
    public const double C1F = 20e-15;
    public const double C0F = 5e-12;
    public const double R1Ohm = 10;

    /// <summary>L1 = 1/((2π·fs)²·C1) (BVD model), so fs is exactly the series resonance.</summary>
    public static double L1H => 1 / (Math.Pow(2 * Math.PI * FsHz, 2) * C1F);

    /// <summary>fp = fs·√(1 + C1/C0) (BVD model).</summary>
    public static double FpHz => FsHz * Math.Sqrt(1 + C1F / C0F);

    public static MotionalArm Arm(double r1Ohm = R1Ohm) => new(r1Ohm, L1H, C1F);

    /// <summary>9.97..10.05 MHz in 2 001 points (40 Hz step): covers fs and fp with ~35 points per loaded width.</summary>
    public static FrequencyGrid WideGrid => FrequencyGrid.Linear(9.97e6, 10.05e6, 2001);
}
