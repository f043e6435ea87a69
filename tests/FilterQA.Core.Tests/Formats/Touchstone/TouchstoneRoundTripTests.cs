using System.Numerics;
using FilterQA.Core.Formats.Touchstone;
using FilterQA.Core.Sweeps;
using static FilterQA.Core.Tests.Formats.Touchstone.TouchstoneTestText;

namespace FilterQA.Core.Tests.Formats.Touchstone;

/// <summary>
/// Write then read. The reference is the sweep written: frequencies and RI values must come back bit for bit
/// (shortest round-trip text, "R"); DB and MA within 1e-12 relative, the writer's stated tolerance (a logarithm or a
/// polar conversion each way, each a few units in the last place).
/// </summary>
public sealed class TouchstoneRoundTripTests
{
    public static TheoryData<int, TouchstoneDataFormat, FrequencyUnit> Cases()
    {
        var data = new TheoryData<int, TouchstoneDataFormat, FrequencyUnit>();
        foreach (int n in new[] { 1, 2, 3, 4, 5 })
        {
            foreach (TouchstoneDataFormat format in Enum.GetValues<TouchstoneDataFormat>())
            {
                foreach (FrequencyUnit unit in Enum.GetValues<FrequencyUnit>())
                {
                    data.Add(n, format, unit);
                }
            }
        }
        return data;
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void Write_then_read_gives_the_same_sweep(int n, TouchstoneDataFormat format, FrequencyUnit unit)
    {
        Sweep original = RandomSweep(n, points: 40, seed: n * 100 + (int)format * 10 + (int)unit);
        var options = new TouchstoneWriteOptions { DataFormat = format, FrequencyUnit = unit, Comments = ["round trip", "second line"] };

        string text = TouchstoneWriter.WriteToString(original, options);
        Sweep back = Read(text, $"rt.s{n}p");

        Assert.Equal(original.Grid.Hz.ToArray(), back.Grid.Hz.ToArray());
        Assert.Equal(original.Network!.ReferenceOhm.ToArray(), back.Network!.ReferenceOhm.ToArray());
        Assert.Equal(["round trip", "second line"], back.Source.Notes);
        for (int to = 1; to <= n; to++)
        {
            for (int from = 1; from <= n; from++)
            {
                ReadOnlySpan<Complex> expected = original.Network.Trace(to, from);
                ReadOnlySpan<Complex> actual = back.Network.Trace(to, from);
                for (int f = 0; f < expected.Length; f++)
                {
                    if (format == TouchstoneDataFormat.RealImaginary)
                    {
                        Assert.Equal(expected[f], actual[f]);
                    }
                    else
                    {
                        Assert.True((actual[f] - expected[f]).Magnitude <= 1e-12 * expected[f].Magnitude, $"S{to}{from}[{f}]: {expected[f]} vs {actual[f]}");
                    }
                }
            }
        }
        if (n >= 3)
        {
            // Layout rule of version 1: at most 4 pairs (9 numbers with the frequency) on a line.
            Assert.All(text.Split('\n').Where(line => line.Length > 0 && line[0] != '!' && line[0] != '#'),
                line => Assert.True(line.Split(' ', StringSplitOptions.RemoveEmptyEntries).Length <= 9, line));
        }
    }

    [Fact]
    public void Noise_block_round_trips_with_Rn_in_ohms()
    {
        Sweep network = RandomSweep(2, points: 5, seed: 3);
        double[] hz = [1e3, 2e3, 3.5e3];
        NoiseParameters noise = NoiseParameters.Create(FrequencyGrid.FromHz(hz), [0.5, 0.7, 0.9], [0.3, 0.35, 0.4], [10, 20, -30], [12.5, 15, 17.25]);
        Sweep original = Sweep.FromNetwork(network.Network!, network.Source, noise);

        Sweep back = Read(TouchstoneWriter.WriteToString(original), "noise.s2p");

        Assert.Equal(hz, back.Noise!.Grid.Hz.ToArray());
        Assert.Equal([0.5, 0.7, 0.9], back.Noise.MinNoiseFigureDb.ToArray());
        // Rn is written normalised to R (division) and read back multiplied: 1e-12 relative for the two roundings.
        for (int i = 0; i < 3; i++)
        {
            Assert.Equal(noise.NoiseResistanceOhm[i], back.Noise.NoiseResistanceOhm[i], 1e-12 * noise.NoiseResistanceOhm[i]);
        }
    }

    [Fact]
    public void A_scalar_sweep_has_no_Touchstone_form()
    {
        FrequencyGrid grid = FrequencyGrid.Linear(1e6, 2e6, 3);
        Sweep scalar = Sweep.FromScalar(ScalarTrace.Create(grid, ScalarQuantity.GainDb, [-1.0, -2.0, -3.0]), SweepSource.Of("s.csv", SweepFormat.DelimitedText));

        var error = Assert.Throws<ArgumentException>(() => TouchstoneWriter.WriteToString(scalar));

        Assert.Contains("scalar", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_zero_value_cannot_be_written_in_DB()
    {
        FrequencyGrid grid = FrequencyGrid.FromHz([1e6]);
        var s = new Complex[1, 1, 1];
        Sweep sweep = Sweep.FromNetwork(NetworkData.Create(grid, s, [50.0]), SweepSource.Of("z.s1p", SweepFormat.Touchstone1));

        Assert.Throws<ArgumentException>(() => TouchstoneWriter.WriteToString(sweep, new TouchstoneWriteOptions { DataFormat = TouchstoneDataFormat.DecibelAngle }));
        Assert.Equal(Complex.Zero, Read(TouchstoneWriter.WriteToString(sweep), "z.s1p").Network!.Trace(1, 1)[0]);
    }

    [Fact]
    public void Two_port_is_written_in_the_version1_order_on_one_line()
    {
        FrequencyGrid grid = FrequencyGrid.FromHz([2e9]);
        var s = new Complex[1, 2, 2];
        s[0, 0, 0] = 0.125;
        s[0, 1, 0] = 0.25;
        s[0, 0, 1] = 0.5;
        s[0, 1, 1] = 0.75;
        Sweep sweep = Sweep.FromNetwork(NetworkData.Create(grid, s, [50.0, 50.0]), SweepSource.Of("t.s2p", SweepFormat.Touchstone1));

        string text = TouchstoneWriter.WriteToString(sweep, new TouchstoneWriteOptions { FrequencyUnit = FrequencyUnit.GHz });

        // Touchstone 1.1: f N11 N21 N12 N22.
        Assert.Equal("# GHZ S RI R 50\n2 0.125 0 0.25 0 0.5 0 0.75 0\n", text);
    }

    private static Sweep RandomSweep(int n, int points, int seed)
    {
        var random = new Random(seed);
        var hz = new double[points];
        double f = random.NextDouble() * 1e6;
        for (int i = 0; i < points; i++)
        {
            f += 1 + random.NextDouble() * 1e7;
            hz[i] = f;
        }
        var s = new Complex[points, n, n];
        for (int i = 0; i < points; i++)
        {
            for (int to = 0; to < n; to++)
            {
                for (int from = 0; from < n; from++)
                {
                    double magnitude = Math.Pow(10, -random.NextDouble() * 5);
                    s[i, to, from] = Complex.FromPolarCoordinates(magnitude, (random.NextDouble() * 2 - 1) * Math.PI);
                }
            }
        }
        double[] references = Enumerable.Range(0, n).Select(p => p % 2 == 0 ? 50.0 : 75.0).ToArray();
        return Sweep.FromNetwork(NetworkData.Create(FrequencyGrid.FromHz(hz), s, references), SweepSource.Of("x", SweepFormat.Synthetic));
    }
}
