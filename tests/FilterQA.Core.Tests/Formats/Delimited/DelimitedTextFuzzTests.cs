using System.Diagnostics;
using System.Text;
using FilterQA.Core.Formats;
using FilterQA.Core.Formats.Delimited;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Tests.Formats.Delimited;

/// <summary>
/// Seeded mutation fuzzing: valid files are damaged at random (bytes changed, inserted, deleted, lines
/// repeated or swapped, troublesome tokens spliced in). Whatever comes out, the reader either returns a
/// sound sweep or throws SweepReadException with a sane location; any other exception fails the test,
/// and the timeout catches a hang. The seed is fixed so a failure reproduces.
/// </summary>
public sealed class DelimitedTextFuzzTests
{
    private const int Cases = 12_000;
    private const int Seed = 240_611;

    private static readonly string[] ValidFiles =
    [
        "# bench 3\nFrequency (MHz),S21 (dB),Phase (deg)\n10.6,-40.5,12\n10.65,-20.25,-150\n10.7,-2.5,90\n10.75,-21,45.5\n10.8,-41,-3\n",
        "! lot 2406\r\nFreq [kHz];S21 dB\r\n454,5;-30,5\r\n455;-6\r\n455,5;-31,25\r\n",
        "f/GHz\tMax hold (dBm)\tS21 deg\n2.40\t-60\t1\n2.45\t-12.5\t2\n2.50\t-61\t3\n",
        "\"Frequency, Hz\",\"S21 dB\"\n\"1000\",\"-1.5\"\n2000,-2\n3000,-3.5e0\n",
        "1000000,-1,10\n2000000,-2,20\n3000000,-3,30\n",
        "Index,Freq (GHz),S11 dB,S11 deg,S21 dB,S21 deg\n1,2.4,-15,10,-1.5,-20\n2,2.5,-16,11,-1.75,-30\n",
    ];

    private static readonly string[] Tokens =
    [
        "NaN", "1e400", "-1e400", "inf", "-", "+", ".", ",", ";", "\t", "\"", "\"\"", "#", "!", "\r", "\n", "\r\n",
        "e", "E+", "1.#INF", "\u00B0", "dBm", "dB", "Freq", "(THz)", "[", "/", "\u0000", "\uFFFD", "\uFEFF", "0", "-0", "9999999999",
    ];

    [Fact(Timeout = 60_000)]
    public async Task Mutated_files_give_a_sweep_or_a_read_error_and_nothing_else()
    {
        await Task.Run(() =>
        {
            var random = new Random(Seed);
            int read = 0, refused = 0;
            var watch = Stopwatch.StartNew();
            for (int n = 0; n < Cases; n++)
            {
                byte[] content = Mutate(random, Encoding.UTF8.GetBytes(ValidFiles[random.Next(ValidFiles.Length)]));
                try
                {
                    Sweep sweep = DelimitedTextReader.Read(content, "fuzz.csv");
                    CheckSound(sweep);
                    read++;
                }
                catch (SweepReadException error)
                {
                    Assert.True(error.Line >= 0 && error.Column >= 0 && error.Problem.Length > 0 && error.FileName == "fuzz.csv",
                        $"case {n}: a read error without a sane location: {error.Message}");
                    refused++;
                }
                catch (Exception other)
                {
                    Assert.Fail($"case {n} (seed {Seed}) let {other.GetType().Name} escape: {other.Message}\ncontent: {Convert.ToBase64String(content)}");
                }
            }
            watch.Stop();
            // Both outcomes must occur, or the mutations are not exercising the reader.
            Assert.True(read > Cases / 50 && refused > Cases / 2, $"read {read}, refused {refused}");
            // The brief allows 20 s in Debug; typical is well under a second.
            Assert.True(watch.Elapsed < TimeSpan.FromSeconds(20), $"took {watch.Elapsed}");
        });
    }

    private static void CheckSound(Sweep sweep)
    {
        ReadOnlySpan<double> hz = sweep.Grid.Hz;
        for (int i = 0; i < hz.Length; i++)
        {
            Assert.True(double.IsFinite(hz[i]) && hz[i] >= 0 && (i == 0 || hz[i] > hz[i - 1]));
            Assert.True(double.IsFinite(sweep.Scalar!.LevelDb[i]));
        }
        Assert.Equal(SweepFormat.DelimitedText, sweep.Source.Format);
        Assert.Equal(64, sweep.Source.Sha256.Length);
    }

    private static byte[] Mutate(Random random, byte[] valid)
    {
        var bytes = new List<byte>(valid);
        int mutations = 1 + random.Next(3);
        for (int m = 0; m < mutations; m++)
        {
            int at = bytes.Count == 0 ? 0 : random.Next(bytes.Count);
            switch (random.Next(8))
            {
                case 0 when bytes.Count > 0:
                    bytes[at] = (byte)random.Next(256);
                    break;
                case 1:
                    bytes.Insert(at, (byte)random.Next(256));
                    break;
                case 2 when bytes.Count > 0:
                    bytes.RemoveRange(at, Math.Min(bytes.Count - at, 1 + random.Next(4)));
                    break;
                case 3:
                    bytes.InsertRange(at, Encoding.UTF8.GetBytes(Tokens[random.Next(Tokens.Length)]));
                    break;
                case 4 when bytes.Count > 0:
                    bytes[at] = (byte)"0123456789.,;\t\"#-eE \n"[random.Next(21)];
                    break;
                case 5:
                    bytes.RemoveRange(at, bytes.Count - at);
                    break;
                default:
                    RearrangeLines(random, bytes);
                    break;
            }
        }
        return bytes.ToArray();
    }

    private static void RearrangeLines(Random random, List<byte> bytes)
    {
        List<string> lines = Encoding.UTF8.GetString(bytes.ToArray()).Split('\n').ToList();
        int a = random.Next(lines.Count), b = random.Next(lines.Count);
        if (random.Next(2) == 0)
        {
            lines.Insert(b, lines[a]);
        }
        else
        {
            (lines[a], lines[b]) = (lines[b], lines[a]);
        }
        bytes.Clear();
        bytes.AddRange(Encoding.UTF8.GetBytes(string.Join('\n', lines)));
    }
}
