using System.Diagnostics;
using System.Text;
using FilterQA.Core.Formats;
using FilterQA.Core.Formats.Touchstone;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Tests.Formats.Touchstone;

/// <summary>
/// Seeded fuzzing of valid Touchstone files (byte flips, insertions, deletions, truncation, duplicated and swapped
/// lines, random tokens). The reader's contract: a sweep, or a <see cref="SweepReadException"/> with a location —
/// never any other exception, never a hang. The run is seeded (repeatable) and bounded: it stops after
/// <see cref="CaseCount"/> cases or <see cref="Budget"/>, whichever comes first.
/// </summary>
public sealed class TouchstoneFuzzTests
{
    private const int CaseCount = 12_000;
    private static readonly TimeSpan Budget = TimeSpan.FromSeconds(20);
    private static readonly TimeSpan PerCaseLimit = TimeSpan.FromSeconds(2);

    private static readonly string[] Seeds =
    [
        "! one-port\n# MHz S DB R 50\n10 -0.5 10\n20 -1.5 -20\n30 -3.0 -45.5\n",
        "# GHz S MA R 50\n1 0.5 10 0.9 -20 0.01 30 0.4 -40\n2 0.5 11 0.9 -21 0.01 31 0.4 -41\n1 1.2 0.6 45 0.4\n1.5 1.4 0.55 50 0.5\n",
        "# Hz Z RI R 75\n100 1 0 0.1 0 0.2 0\n 0.1 0 1 0 0.3 0\n 0.2 0 0.3 0 1 0\n200 1 1 0 0 0 0\n 0 0 1 1 0 0\n 0 0 0 0 1 1\n",
        "[Version] 2.0\n# GHz S RI R 50\n[Number of Ports] 2\n[Two-Port Data Order] 12_21\n[Number of Frequencies] 2\n[Number of Noise Frequencies] 1\n"
            + "[Reference] 50\n 75\n[Matrix Format] Full\n[Network Data]\n1 0.1 0 0.2 0 0.3 0 0.4 0\n2 0.1 0 0.2 0 0.3 0 0.4 0\n[Noise Data]\n1 1.2 0.6 45 30\n[End]\n",
        "[Version] 2.0\n# kHz Y RI R 50\n[Number of Ports] 3\n[Number of Frequencies] 1\n[Matrix Format] Lower\n[Network Data]\n455 0.01 0\n0.002 0 0.01 0\n0.001 0 0.002 0 0.01 0\n[End]\n",
    ];

    private const string Alphabet = " 0123456789.-+eE#![]\n\r\tRIMADBSZYHGhz,";

    private static readonly string[] Names = ["a.s1p", "a.s2p", "a.s3p", "a.ts", "a.s4p", "a.txt"];

    private static readonly string[] Tokens =
    [
        "#", "!", "[End]", "[Network Data]", "[Version] 2.0", "[Number of Ports] 999", "[Number of Frequencies] 2147483647", "1e400",
        "-1e-400", "NaN", "-", ".", "1,5", "1D3", "\r", "\n", "\r\n", "\t", " ", "0", "-0", "1e308", "99999999999999999999999", "[", "]",
        "[Reference]", "[Matrix Format] Upper", "# Hz Y MA R 0.001", "# H", "[Two-Port Data Order] 21_12", "\u00FF", "\u0000", "[Noise Data]",
    ];

    [Fact]
    public void Mutated_files_give_a_sweep_or_a_SweepReadException_and_never_hang()
    {
        var failures = new List<string>();
        int ran = 0;
        bool outOfTime = false;
        TimeSpan slowest = TimeSpan.Zero;
        var worker = new Thread(() =>
        {
            try
            {
                Run();
            }
            catch (Exception error)
            {
                failures.Add($"the fuzz harness itself failed: {error}");
            }
        }, 16 * 1024 * 1024)
        { IsBackground = true };

        void Run()
        {
            var random = new Random(1_234_567);
            var total = Stopwatch.StartNew();
            var one = new Stopwatch();
            while (ran < CaseCount && total.Elapsed < Budget)
            {
                byte[] content = Mutate(Encoding.Latin1.GetBytes(Seeds[random.Next(Seeds.Length)]), random);
                string name = Names[random.Next(Names.Length)];
                int ports = random.Next(8) == 0 ? random.Next(1, 5) : 0;
                one.Restart();
                try
                {
                    Sweep sweep = ports == 0 ? TouchstoneReader.Read(content, name) : TouchstoneReader.Read(content, name, ports);
                    Assert.NotNull(sweep.Network);
                }
                catch (SweepReadException error)
                {
                    if (error.FileName != name || string.IsNullOrEmpty(error.Problem))
                    {
                        failures.Add($"case {ran}: exception without file name or problem: {error.Message}");
                    }
                }
                catch (Exception error)
                {
                    failures.Add($"case {ran} ({name}): {error.GetType().Name}: {error.Message}\n{Convert.ToBase64String(content)}");
                }
                one.Stop();
                if (one.Elapsed > slowest)
                {
                    slowest = one.Elapsed;
                }
                ran++;
            }
            outOfTime = ran < CaseCount;
        }

        worker.Start();
        bool finished = worker.Join(TimeSpan.FromSeconds(60));

        Assert.True(finished, $"the fuzz run did not finish within 60 s (a case hangs?) after {ran} cases");
        Assert.True(failures.Count == 0, string.Join("\n", failures.Take(5)));
        Assert.True(slowest < PerCaseLimit, $"the slowest case took {slowest.TotalMilliseconds:F0} ms");
        // The time budget is a guard for slow machines; at normal speed all cases run (about 2 s in Debug).
        Assert.True(ran == CaseCount || (outOfTime && ran >= 1_000), $"only {ran} cases ran");
    }

    private static byte[] Mutate(byte[] seed, Random random)
    {
        var bytes = new List<byte>(seed);
        int edits = 1 + random.Next(4);
        for (int e = 0; e < edits; e++)
        {
            if (bytes.Count == 0)
            {
                bytes.Add((byte)random.Next(256));
                continue;
            }
            int at = random.Next(bytes.Count);
            switch (random.Next(8))
            {
                case 0:
                    bytes[at] = (byte)random.Next(256);
                    break;
                case 1:
                    bytes[at] = (byte)Alphabet[random.Next(Alphabet.Length)];
                    break;
                case 2:
                    bytes.Insert(at, (byte)random.Next(32, 127));
                    break;
                case 3:
                    bytes.RemoveRange(at, Math.Min(bytes.Count - at, 1 + random.Next(12)));
                    break;
                case 4:
                    bytes.RemoveRange(at, bytes.Count - at);
                    break;
                case 5:
                    bytes.InsertRange(at, Encoding.Latin1.GetBytes(" " + Tokens[random.Next(Tokens.Length)] + " "));
                    break;
                default:
                    DuplicateOrSwapLine(bytes, random);
                    break;
            }
        }
        return bytes.ToArray();
    }

    private static void DuplicateOrSwapLine(List<byte> bytes, Random random)
    {
        string text = Encoding.Latin1.GetString(bytes.ToArray());
        var lines = text.Split('\n').ToList();
        int i = random.Next(lines.Count);
        if (random.Next(2) == 0)
        {
            lines.Insert(i, lines[i]);
        }
        else
        {
            int j = random.Next(lines.Count);
            (lines[i], lines[j]) = (lines[j], lines[i]);
        }
        bytes.Clear();
        bytes.AddRange(Encoding.Latin1.GetBytes(string.Join('\n', lines)));
    }
}
