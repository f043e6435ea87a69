using System.Numerics;
using BenchmarkDotNet.Attributes;
using FilterQA.Core.Resonators;
using FilterQA.Core.Sweeps;

namespace FilterQA.Benchmarks;

/// <summary>
/// Full resonator measurement (peak, notch, modes, BVD fit) of a 2 001-point sweep of a 10 MHz crystal
/// (fs 10 MHz, C1 20 fF, C0 5 pF, R1 10 ohm) in a 50 ohm series fixture; target ≤ 5 ms.
/// The data are built here from the BVD admittance and S21 = 2Z0·Y/(2Z0·Y + 1).
/// </summary>
[MemoryDiagnoser]
public class ResonatorFitBenchmarks
{
    private Sweep _clean = null!;
    private Sweep _noisy = null!;
    private Sweep _withMode = null!;

    [GlobalSetup]
    public void Setup()
    {
        var grid = FrequencyGrid.Linear(9.97e6, 10.05e6, 2001);
        _clean = Make(grid, 0, withMode: false);
        _noisy = Make(grid, 1e-3, withMode: false);
        _withMode = Make(grid, 0, withMode: true);
    }

    [Benchmark(Baseline = true)]
    public ResonatorMeasurement Crystal2001Points() => ResonatorAnalyzer.Measure(_clean);

    [Benchmark]
    public ResonatorMeasurement Crystal2001PointsNoisy() => ResonatorAnalyzer.Measure(_noisy);

    [Benchmark]
    public ResonatorMeasurement Crystal2001PointsWithUnwantedMode() => ResonatorAnalyzer.Measure(_withMode);

    private static Sweep Make(FrequencyGrid grid, double noiseRms, bool withMode)
    {
        const double z0 = 50, fs = 10e6, c1 = 20e-15, c0 = 5e-12, r1 = 10;
        double l1 = 1 / (Math.Pow(2 * Math.PI * fs, 2) * c1);
        double lSpur = 2 * l1, cSpur = 1 / (Math.Pow(2 * Math.PI * 10.035e6, 2) * lSpur);
        var random = new Random(7);
        var s = new Complex[grid.Count, 2, 2];
        for (int i = 0; i < grid.Count; i++)
        {
            double w = 2 * Math.PI * grid[i];
            Complex y = new Complex(0, w * c0) + 1 / new Complex(r1, w * l1 - 1 / (w * c1));
            if (withMode)
            {
                y += 1 / new Complex(60, w * lSpur - 1 / (w * cSpur));
            }
            Complex s21 = 2 * z0 * y / (2 * z0 * y + 1);
            if (noiseRms > 0)
            {
                s21 += Complex.FromPolarCoordinates(Math.Sqrt(-2 * Math.Log(1 - random.NextDouble())) * noiseRms / Math.Sqrt(2), 2 * Math.PI * random.NextDouble());
            }
            s[i, 1, 0] = s21;
            s[i, 0, 1] = s21;
            s[i, 0, 0] = s[i, 1, 1] = 1 / (1 + 2 * z0 * y);
        }
        return Sweep.FromNetwork(NetworkData.Create(grid, s, [z0, z0]), SweepSource.Of("bench.s2p", SweepFormat.Synthetic));
    }
}
