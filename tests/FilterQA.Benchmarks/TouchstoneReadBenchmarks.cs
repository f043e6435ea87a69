using System.Globalization;
using System.Text;
using BenchmarkDotNet.Attributes;
using FilterQA.Core.Formats.Touchstone;
using FilterQA.Core.Sweeps;

namespace FilterQA.Benchmarks;

/// <summary>
/// Reading a 1,601-point 2-port Touchstone file (DB format, 7 significant digits, as network analysers export) from
/// memory: one file on one core, and a folder of such files on all cores. Text throughput in MB/s is the file size
/// divided by the mean time (the size is printed once at set-up). The baseline is a plain line split with
/// double.Parse per number and no checks, the speed the reader must beat.
/// </summary>
[MemoryDiagnoser]
public class TouchstoneReadBenchmarks
{
    private const int Points = 1601;
    private const int FolderFiles = 64;

    private byte[] _file = [];
    private string _fileText = "";
    private byte[][] _folder = [];

    /// <summary>Bytes of one file, to turn time per read into MB/s.</summary>
    public int FileBytes => _file.Length;

    [GlobalSetup]
    public void Setup()
    {
        _file = MakeFile(seed: 1);
        _fileText = Encoding.ASCII.GetString(_file);
        _folder = Enumerable.Range(0, FolderFiles).Select(MakeFile).ToArray();
        Console.WriteLine($"// one file: {_file.Length} bytes; folder: {FolderFiles} files, {_folder.Sum(f => (long)f.Length)} bytes; {Environment.ProcessorCount} cores");
    }

    [Benchmark(Baseline = true, Description = "line split + double.Parse (no checks)")]
    public double SplitAndParse()
    {
        double sum = 0;
        foreach (string line in _fileText.Split('\n'))
        {
            if (line.Length == 0 || line[0] == '!' || line[0] == '#')
            {
                continue;
            }
            foreach (string token in line.Split(' ', StringSplitOptions.RemoveEmptyEntries))
            {
                sum += double.Parse(token, CultureInfo.InvariantCulture);
            }
        }
        return sum;
    }

    [Benchmark(Description = "TouchstoneReader, one file, one core")]
    public Sweep ReadOne() => TouchstoneReader.Read(_file, "filter.s2p");

    [Benchmark(Description = "TouchstoneReader, folder of 64 files, all cores", OperationsPerInvoke = FolderFiles)]
    public int ReadFolderParallel()
    {
        int total = 0;
        Parallel.For(0, _folder.Length, i =>
        {
            Sweep sweep = TouchstoneReader.Read(_folder[i], "filter.s2p");
            Interlocked.Add(ref total, sweep.Grid.Count);
        });
        return total;
    }

    /// <summary>A 2-port band-pass-like response, 7 significant digits, in the layout analysers export.</summary>
    private static byte[] MakeFile(int seed)
    {
        var random = new Random(seed);
        var text = new StringBuilder();
        text.Append("! synthetic 2-port filter response for benchmarking\n! 1601 points\n# Hz S DB R 50\n");
        for (int i = 0; i < Points; i++)
        {
            double hz = 60e6 + i * 12_500.0;
            text.Append(hz.ToString("E9", CultureInfo.InvariantCulture));
            for (int pair = 0; pair < 4; pair++)
            {
                double db = -(random.NextDouble() * 80);
                double deg = random.NextDouble() * 360 - 180;
                text.Append(' ').Append(db.ToString("G7", CultureInfo.InvariantCulture)).Append(' ').Append(deg.ToString("G7", CultureInfo.InvariantCulture));
            }
            text.Append('\n');
        }
        return Encoding.ASCII.GetBytes(text.ToString());
    }
}
