using System.Globalization;
using System.Text;
using BenchmarkDotNet.Attributes;
using FilterQA.Core.Formats.Delimited;
using FilterQA.Core.Sweeps;

namespace FilterQA.Benchmarks;

/// <summary>Reading and writing a 10 001-point gain and phase trace as delimited text.</summary>
[MemoryDiagnoser]
public class DelimitedTextBenchmarks
{
    private byte[] _csv = [];
    private Sweep _sweep = null!;

    [GlobalSetup]
    public void Setup()
    {
        var text = new StringBuilder("# bench 3\nFrequency (MHz),S21 (dB),S21 Phase (deg)\n");
        for (int i = 0; i <= 10_000; i++)
        {
            double mhz = 10.2 + i * 0.0001;
            text.Append(CultureInfo.InvariantCulture, $"{mhz:F4},{-3 - 40 * Math.Abs(mhz - 10.7):R},{(i * 0.37) % 360 - 180:R}\n");
        }
        _csv = Encoding.UTF8.GetBytes(text.ToString());
        _sweep = DelimitedTextReader.Read(_csv, "bench.csv");
    }

    [Benchmark]
    public Sweep Read10001Points() => DelimitedTextReader.Read(_csv, "bench.csv");

    [Benchmark]
    public int Write10001Points()
    {
        using var writer = new StringWriter(CultureInfo.InvariantCulture);
        DelimitedTextWriter.Write(_sweep, writer);
        return writer.GetStringBuilder().Length;
    }
}
