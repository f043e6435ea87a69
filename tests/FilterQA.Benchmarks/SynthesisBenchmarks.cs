using BenchmarkDotNet.Attributes;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Synthesis;

namespace FilterQA.Benchmarks;

/// <summary>Cost of one synthetic unit (the what-if benchmark generates 100 000 of them).</summary>
[MemoryDiagnoser]
public class SynthesisBenchmarks
{
    private readonly UnitSynthesiser _synthesiser = new(2544);
    private int _serial;

    [Params("TME-CF455-15", "TME-SF70M-1M2", "TME-XR24M-18", "TME-LC92-TRAP")]
    public string PartNumber { get; set; } = "TME-CF455-15";

    [Benchmark]
    public Sweep Unit() => _synthesiser.Unit(DemoParts.Get(PartNumber), 1 + (_serial++ & 1023));
}
