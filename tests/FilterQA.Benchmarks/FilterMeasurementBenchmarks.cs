using BenchmarkDotNet.Attributes;
using FilterQA.Core.Measurement;
using FilterQA.Core.Sweeps;

namespace FilterQA.Benchmarks;

/// <summary>
/// One full filter measurement of a 1,601-point sweep: 6 levels, a ripple band and 2 stopbands.
/// Target: at most 20 µs, no allocation per point.
/// </summary>
[MemoryDiagnoser]
public class FilterMeasurementBenchmarks
{
    private ResponseTrace _trace = null!;
    private FilterMeasurementRequest _request = null!;
    private double[] _floor = null!;

    [GlobalSetup]
    public void Setup()
    {
        // A 70 MHz SAW-like bandpass: order-5 Butterworth, 1.25 MHz wide, 10 dB insertion loss, a little seeded noise.
        const double f0 = 70e6, b = 1.25e6;
        var grid = FrequencyGrid.Linear(f0 - 5e6, f0 + 5e6, 1601);
        var random = new Random(5);
        var loss = new double[grid.Count];
        for (int i = 0; i < loss.Length; i++)
        {
            double omega = (grid[i] / f0 - f0 / grid[i]) * f0 / b;
            loss[i] = 10 + 10 * Math.Log10(1 + Math.Pow(omega, 10)) + 0.01 * (random.NextDouble() - 0.5);
        }
        _trace = ResponseTrace.Create(grid, ResponsePath.Transmission, loss);
        _request = new FilterMeasurementRequest
        {
            LevelsDb = [1, 3, 6, 20, 40, 60],
            RippleBand = new FrequencyBand(f0 - 0.45e6, f0 + 0.45e6),
            Stopbands = [new FrequencyBand(65e6, 67e6), new FrequencyBand(73e6, 75e6)],
        };
        _floor = new double[grid.Count];
        Array.Fill(_floor, 120.0);
    }

    [Benchmark(Baseline = true)]
    public FilterMeasurement WithFloorTrace() => FilterMeasurer.Measure(_trace, _request, _floor);

    [Benchmark]
    public FilterMeasurement WithEstimatedFloor() => FilterMeasurer.Measure(_trace, _request);
}
