using BenchmarkDotNet.Attributes;
using FilterQA.Core.Normalisation;
using FilterQA.Core.Sweeps;

namespace FilterQA.Benchmarks;

/// <summary>Normalising a 10 001-point device trace with phase by a 1 601-point thru on another grid.</summary>
[MemoryDiagnoser]
public class ThruNormaliserBenchmarks
{
    private ResponseTrace _dut = null!;
    private ResponseTrace _thru = null!;

    [GlobalSetup]
    public void Setup()
    {
        FrequencyGrid dutGrid = FrequencyGrid.Linear(10.2e6, 11.2e6, 10_001);
        FrequencyGrid thruGrid = FrequencyGrid.Linear(10e6, 11.5e6, 1_601);
        _dut = Make(dutGrid, 150e-9);
        _thru = Make(thruGrid, 100e-9);
    }

    private static ResponseTrace Make(FrequencyGrid grid, double delayS)
    {
        var loss = new double[grid.Count];
        var phase = new double[grid.Count];
        for (int i = 0; i < grid.Count; i++)
        {
            loss[i] = 1 + 0.2 * Math.Sin(grid[i] / 1e5);
            phase[i] = Math.IEEERemainder(-2 * Math.PI * grid[i] * delayS, 2 * Math.PI);
        }
        return ResponseTrace.Create(grid, ResponsePath.Transmission, loss, phase);
    }

    [Benchmark]
    public NormalisedResponse Normalise() => ThruNormaliser.Normalise(_dut, _thru, "thru.csv");
}
