using BenchmarkDotNet.Attributes;
using FilterQA.Core.Decisions;
using FilterQA.Core.Measurement;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;
using MeasurementBand = FilterQA.Core.Measurement.FrequencyBand;
using TemplateBand = FilterQA.Core.Templates.FrequencyBand;

namespace FilterQA.Benchmarks;

/// <summary>
/// A 1,601-point sweep judged against an 8-rule template (centre, two bandwidths, loss, ripple, two stopbands, a limit
/// line), against the filter measurement of the same quantities alone. Target: the evaluation costs at most 30 µs more
/// than the measurement.
/// </summary>
[MemoryDiagnoser]
public class EvaluationBenchmarks
{
    private ResponseTrace _trace = null!;
    private FilterMeasurementRequest _request = null!;
    private double[] _floor = null!;
    private LimitTemplate _template = null!;
    private MeasurementInput _input = null!;

    [GlobalSetup]
    public void Setup()
    {
        // The same 70 MHz SAW-like bandpass as the filter measurement benchmark: order-5 Butterworth, 1.25 MHz, 10 dB loss.
        const double f0 = 70e6, b = 1.25e6;
        var grid = FrequencyGrid.Linear(f0 - 5e6, f0 + 5e6, 1601);
        var random = new Random(5);
        var gain = new double[grid.Count];
        for (int i = 0; i < gain.Length; i++)
        {
            double omega = (grid[i] / f0 - f0 / grid[i]) * f0 / b;
            gain[i] = -(10 + 10 * Math.Log10(1 + Math.Pow(omega, 10)) + 0.01 * (random.NextDouble() - 0.5));
        }
        Sweep sweep = Sweep.FromScalar(ScalarTrace.Create(grid, ScalarQuantity.GainDb, gain), SweepSource.Of("bench.csv", SweepFormat.DelimitedText));
        _trace = ResponseTrace.Primary(sweep);
        _floor = new double[grid.Count];
        Array.Fill(_floor, 120.0);
        _request = new FilterMeasurementRequest
        {
            LevelsDb = [3, 40],
            RippleBand = new MeasurementBand(f0 - 0.45e6, f0 + 0.45e6),
            Stopbands = [new MeasurementBand(65e6, 67e6), new MeasurementBand(73e6, 75e6)],
        };
        _template = LimitTemplate.Create("BENCH-70M", 1, "benchmark part", DeviceKind.BandpassFilter, f0, TemplateStatus.Draft, null, null,
            new SweepRequirements(65e6, 75e6, 900e3, 90, 8 * 3600, false, false, false), DecisionRule.GuardedAcceptance,
            [
                new CentreFrequencyRule("centre", "centre", 3, new FrequencyTolerance(50e3, ToleranceUnit.Hertz), CentreMethod.ArithmeticMean, 5e3),
                new BandwidthRule("bw-3db", "3 dB bandwidth", 3, 1.1e6, 1.4e6, 10e3),
                new BandwidthRule("bw-40db", "40 dB bandwidth", 40, null, 5e6, 20e3),
                new InsertionLossRule("loss", "loss", 12, InsertionLossMeasure.MinimumLoss, null, 0.3),
                new PassbandRippleRule("ripple", "ripple", new TemplateBand(FrequencyAnchor.NominalOffset, -0.45e6, 0.45e6), 1, 0.1),
                new StopbandRejectionRule("reject-low", "low", new TemplateBand(FrequencyAnchor.NominalOffset, -5e6, -3e6), 40, LossReference.Relative, 1),
                new StopbandRejectionRule("reject-high", "high", new TemplateBand(FrequencyAnchor.NominalOffset, 3e6, 5e6), 40, LossReference.Relative, 1),
                new LimitLineRule("mask", "mask", LimitBoundary.Upper, FrequencyAnchor.MeasuredOffset, LossReference.Relative, [-0.5e6, 0.5e6], [3, 3], 0.2),
            ]);
        _input = MeasurementInput.FromSweep(sweep, thruAge: TimeSpan.FromHours(1), floorLossDb: _floor);
    }

    [Benchmark(Baseline = true)]
    public FilterMeasurement MeasureOnly() => FilterMeasurer.Measure(_trace, _request, _floor);

    [Benchmark]
    public UnitEvaluation Evaluate() => TemplateEvaluator.Evaluate(_template, _input);
}
