using System.Numerics;
using System.Security.Cryptography;
using System.Text;
using FilterQA.Core.Formats;
using FilterQA.Core.Formats.Touchstone;
using FilterQA.Core.Sweeps;
using static FilterQA.Core.Tests.Formats.Touchstone.TouchstoneTestText;

namespace FilterQA.Core.Tests.Formats.Touchstone;

/// <summary>
/// Files written from the Touchstone standard's own description (IBIS Open Forum, Touchstone 1.1 and 2.0: option
/// line, data layout, keywords); expected values are computed here from the format definitions
/// RI a+jb, MA a·e^(jπb/180), DB 10^(a/20)·e^(jπb/180).
/// Tolerance 1e-13 relative unless stated: reader and test evaluate the same closed form, so they differ only by
/// the rounding order of a few floating-point operations.
/// </summary>
public sealed class TouchstoneReaderTests
{
    private const double Tol = 1e-13;

    [Theory]
    [InlineData("RI")]
    [InlineData("MA")]
    [InlineData("DB")]
    public void Each_data_format_gives_the_complex_value_the_standard_defines(string format)
    {
        string text = $"# MHz S {format} R 50\n100 0.5 -30\n200 3.25 179.5\n";
        Sweep sweep = Read(text, "part.s1p");

        Func<double, double, Complex> define = format switch { "RI" => Ri, "MA" => Ma, _ => Db };
        Near(define(3.25, 179.5), sweep.Network!.Trace(1, 1)[1], Tol, "S11 at 200 MHz");
        Near(define(0.5, -30), sweep.Network.Trace(1, 1)[0], Tol, "S11 at 100 MHz");
        Assert.Equal(SweepFormat.Touchstone1, sweep.Source.Format);
    }

    [Theory]
    [InlineData("HZ", 1.0)]
    [InlineData("kHz", 1e3)]
    [InlineData("MHz", 1e6)]
    [InlineData("ghz", 1e9)]
    public void Every_frequency_unit_scales_to_hertz_case_insensitively(string unit, double multiplier)
    {
        Sweep sweep = Read($"# {unit} S RI R 50\n1.5 0 0\n2.25 0 0\n", "u.s1p");

        // Exact: the reader scales the decimal exponent, so 1.5 MHz is the double nearest 1.5e6 (reference double.Parse).
        Assert.Equal(double.Parse("1.5", System.Globalization.CultureInfo.InvariantCulture) * multiplier, sweep.Grid[0]);
        Assert.Equal(2.25 * multiplier, sweep.Grid[1]);
    }

    [Fact]
    public void A_bare_hash_means_GHz_S_MA_R_50()
    {
        // Touchstone standard: missing option tokens take the defaults GHz, S, MA, R 50.
        Sweep sweep = Read("#\n1 0.5 90\n", "d.s1p");

        Assert.Equal(1e9, sweep.Grid[0]);
        Near(Ma(0.5, 90), sweep.Network!.Trace(1, 1)[0], Tol);
        Assert.Equal(50.0, sweep.Network.ReferenceOhm[0]);
    }

    [Fact]
    public void Option_tokens_may_come_in_any_order()
    {
        Sweep sweep = Read("# R 75 RI mhz s\n10 0.1 0.2\n", "o.s1p");

        Assert.Equal(1e7, sweep.Grid[0]);
        Assert.Equal(75.0, sweep.Network!.ReferenceOhm[0]);
        Assert.Equal(Ri(0.1, 0.2), sweep.Network.Trace(1, 1)[0]);
    }

    [Fact]
    public void Version1_two_port_lists_N21_before_N12()
    {
        // Touchstone 1.1: a 2-port line is f N11 N21 N12 N22, the one exception to row order.
        Sweep sweep = Read("! two-port\n# GHz S RI R 50\n1.0 0.11 0.12 0.21 0.22 0.31 0.32 0.41 0.42\n", "t.s2p");
        NetworkData s = sweep.Network!;

        Assert.Equal(Ri(0.11, 0.12), s[0, 1, 1]);
        Assert.Equal(Ri(0.21, 0.22), s[0, 2, 1]);
        Assert.Equal(Ri(0.31, 0.32), s[0, 1, 2]);
        Assert.Equal(Ri(0.41, 0.42), s[0, 2, 2]);
        Assert.Equal(["two-port"], sweep.Source.Notes);
    }

    [Fact]
    public void Three_port_rows_on_separate_lines_read_row_by_row()
    {
        // Touchstone 1.1: 3-port blocks are three lines, f N11 N12 N13 / N21 N22 N23 / N31 N32 N33.
        var text = new StringBuilder("# GHz S RI R 50\n");
        for (int f = 1; f <= 2; f++)
        {
            for (int row = 1; row <= 3; row++)
            {
                text.Append(row == 1 ? $"{f} " : "  ");
                for (int column = 1; column <= 3; column++)
                {
                    text.Append($"{f}{row}{column} -{row}{column} ");
                }
                text.Append("! row ").Append(row).Append('\n');
            }
        }
        NetworkData s = Read(text.ToString(), "three.s3p").Network!;

        for (int row = 1; row <= 3; row++)
        {
            for (int column = 1; column <= 3; column++)
            {
                Assert.Equal(Ri(200 + 10 * row + column, -(10 * row + column)), s[1, row, column]);
            }
        }
    }

    [Fact]
    public void Four_and_five_port_blocks_wrap_at_four_pairs_and_are_read_as_a_token_stream()
    {
        // Touchstone 1.1: at most 4 pairs per line; a 5-port row continues on the next line.
        foreach (int n in new[] { 4, 5 })
        {
            var text = new StringBuilder("# Hz S MA R 50\n");
            text.Append("100");
            for (int row = 1; row <= n; row++)
            {
                for (int column = 1; column <= n; column++)
                {
                    if (column > 1 && (column - 1) % 4 == 0)
                    {
                        text.Append('\n');
                    }
                    text.Append($" 0.{row}{column} {row * 10 + column}");
                }
                text.Append('\n');
            }
            NetworkData s = Read(text.ToString(), $"p.s{n}p").Network!;
            Assert.Equal(n, s.PortCount);
            for (int row = 1; row <= n; row++)
            {
                for (int column = 1; column <= n; column++)
                {
                    Near(Ma(double.Parse($"0.{row}{column}", System.Globalization.CultureInfo.InvariantCulture), row * 10 + column), s[0, row, column], Tol);
                }
            }
        }
    }

    [Fact]
    public void Line_breaks_inside_a_three_port_block_do_not_matter()
    {
        // DOMAIN 1 (common practice): count numbers per block rather than trusting line breaks.
        string text = "# GHz S RI R 50\n1 1 0\n 2 0 3 0\n 4\n 0 5 0 6 0 7 0\n 8 0 9 0\n";
        NetworkData s = Read(text, "w.s3p").Network!;

        Assert.Equal(Ri(1, 0), s[0, 1, 1]);
        Assert.Equal(Ri(4, 0), s[0, 2, 1]);
        Assert.Equal(Ri(9, 0), s[0, 3, 3]);
    }

    [Fact]
    public void Version11_reference_resistance_per_port()
    {
        // Touchstone 1.1: R may give one value per port (and then ends the line).
        NetworkData s = Read("# GHz S RI R 50 75\n1 0 0 0 0 0 0 0 0\n", "r.s2p").Network!;

        Assert.Equal([50.0, 75.0], s.ReferenceOhm.ToArray());
    }

    [Theory]
    [InlineData("12_21", false)]
    [InlineData("21_12", true)]
    public void Version2_two_port_data_order_decides_where_N12_and_N21_go(string order, bool twentyOneFirst)
    {
        // Touchstone 2.0 [Two-Port Data Order]: 12_21 is row order, 21_12 the version 1 order.
        string text = $"[Version] 2.0\n# GHz S RI R 50\n[Number of Ports] 2\n[Two-Port Data Order] {order}\n[Number of Frequencies] 1\n"
            + "[Network Data]\n1 0.11 0 0.22 0 0.33 0 0.44 0\n[End]\n";
        Sweep sweep = Read(text, "two.ts");
        NetworkData s = sweep.Network!;

        Assert.Equal(SweepFormat.Touchstone2, sweep.Source.Format);
        Assert.Equal(Ri(twentyOneFirst ? 0.22 : 0.33, 0), s[0, 2, 1]);
        Assert.Equal(Ri(twentyOneFirst ? 0.33 : 0.22, 0), s[0, 1, 2]);
    }

    [Fact]
    public void Version2_lower_and_upper_matrices_fill_the_other_half_by_symmetry()
    {
        // Touchstone 2.0 [Matrix Format]: Lower row i holds N_i1..N_ii, Upper row i holds N_ii..N_in.
        string header = "[version] 2.0\n# GHz S RI R 50\n[number of ports] 3\n[number of frequencies] 1\n";
        NetworkData lower = Read(header + "[Matrix Format] Lower\n[Network Data]\n1 11 0\n21 0 22 0\n31 0 32 0 33 0\n[End]\n", "l.ts").Network!;
        NetworkData upper = Read(header + "[MATRIX FORMAT] upper\n[NETWORK DATA]\n1 11 0 12 0 13 0\n22 0 23 0\n33 0\n[END]\n", "u.ts").Network!;

        Assert.Equal(Ri(21, 0), lower[0, 1, 2]);
        Assert.Equal(Ri(21, 0), lower[0, 2, 1]);
        Assert.Equal(Ri(32, 0), lower[0, 2, 3]);
        Assert.Equal(Ri(33, 0), lower[0, 3, 3]);
        Assert.Equal(Ri(13, 0), upper[0, 3, 1]);
        Assert.Equal(Ri(23, 0), upper[0, 3, 2]);
        Assert.Equal(Ri(12, 0), upper[0, 1, 2]);
    }

    [Fact]
    public void Version2_reference_may_span_lines_and_overrides_R()
    {
        // Touchstone 2.0 [Reference]: one value per port, may continue on following lines; overrides R.
        string text = "[Version] 2.0\n# GHz S MA R 50\n[Number of Ports] 4\n[Number of Frequencies] 1\n[Reference] 50 75\n 0.01 ! small\n 100\n"
            + "[Network Data]\n5 0.6 161.24 0.4 -42.2 0.42 -66.58 0.53 -79.34\n0.4 -42.2 0.6 161.2 0.53 -79.34 0.42 -66.58\n"
            + "0.42 -66.58 0.53 -79.34 0.6 161.24 0.4 -42.2\n0.53 -79.34 0.42 -66.58 0.4 -42.2 0.6 161.24\n[End]\n";
        NetworkData s = Read(text, "ref.ts").Network!;

        Assert.Equal([50.0, 75.0, 0.01, 100.0], s.ReferenceOhm.ToArray());
        Near(Ma(0.53, -79.34), s[0, 4, 1], Tol);
        Near(Ma(0.6, 161.2), s[0, 2, 2], Tol);
    }

    [Fact]
    public void Version1_noise_block_starts_where_the_frequency_drops_and_Rn_is_scaled_by_R()
    {
        // Touchstone 1.1: noise data starts at a frequency <= the last network frequency; five values per line;
        // Rn normalised to R. Here R = 50, so Rn 0.4 is 20 ohm.
        string text = "# GHz S MA R 50\n1 0.5 10 0.9 -20 0.01 30 0.4 -40\n2 0.5 11 0.9 -21 0.01 31 0.4 -41\n"
            + "! noise\n1 1.2 0.6 45 0.4\n1.5 1.4 0.55 50 0.5\n";
        Sweep sweep = Read(text, "n.s2p");
        NoiseParameters noise = sweep.Noise!;

        Assert.Equal(2, sweep.Grid.Count);
        Assert.Equal([1e9, 1.5e9], noise.Grid.Hz.ToArray());
        Assert.Equal([1.2, 1.4], noise.MinNoiseFigureDb.ToArray());
        Assert.Equal([0.6, 0.55], noise.GammaOptMagnitude.ToArray());
        Assert.Equal([45.0, 50.0], noise.GammaOptAngleDeg.ToArray());
        // 0.4·50 and 0.5·50: tolerance 1e-12 ohm for the one multiplication's rounding.
        Assert.Equal(20.0, noise.NoiseResistanceOhm[0], 1e-12);
        Assert.Equal(25.0, noise.NoiseResistanceOhm[1], 1e-12);
    }

    [Fact]
    public void Version2_noise_block_follows_Noise_Data_with_Rn_in_ohms()
    {
        // Touchstone 2.0 [Noise Data] with [Number of Noise Frequencies]; Rn in ohms (not normalised).
        string text = "[Version] 2.0\n# GHz S DB R 50\n[Number of Ports] 2\n[Two-Port Data Order] 21_12\n[Number of Frequencies] 2\n"
            + "[Number of Noise Frequencies] 1\n[Network Data]\n1 -0.5 10 -20 -20 -40 30 -0.4 -40\n2 -0.6 11 -21 -21 -41 31 -0.5 -41\n"
            + "[Noise Data]\n4 1.2 0.6 45 30\n[End]\n";
        Sweep sweep = Read(text, "n2.s2p");

        Assert.Equal(4e9, sweep.Noise!.Grid[0]);
        Assert.Equal(30.0, sweep.Noise.NoiseResistanceOhm[0]);
        Near(Db(-20, -20), sweep.Network!.Trace(2, 1)[0], Tol);
    }

    [Fact]
    public void Source_keeps_notes_warnings_and_the_sha256_of_the_original_bytes()
    {
        byte[] body = Encoding.ASCII.GetBytes("! VNA export\r\n!  lot 7  \r\n# MHz S DB R 50 ! trailing comment\r\n10 -1 2\r\n# GHz S RI R 50\r\n20 -1.5 3\r\n");
        byte[] content = [0xEF, 0xBB, 0xBF, .. body];

        Sweep sweep = TouchstoneReader.Read(content, "bom.s1p");

        Assert.Equal(["VNA export", "lot 7"], sweep.Source.Notes);
        Assert.Equal(2, sweep.Source.Warnings.Count);
        Assert.Contains("byte-order mark", sweep.Source.Warnings[0], StringComparison.Ordinal);
        Assert.Contains("line 5", sweep.Source.Warnings[1], StringComparison.Ordinal);
        // The later option line is ignored: 20 is still MHz and DB.
        Assert.Equal(20e6, sweep.Grid[1]);
        Near(Db(-1.5, 3), sweep.Network!.Trace(1, 1)[1], Tol);
        // Reference: System.Security.Cryptography.SHA256 over the bytes as given, lower-case hex.
        Assert.Equal(Convert.ToHexString(SHA256.HashData(content)).ToLowerInvariant(), sweep.Source.Sha256);
        Assert.Equal("bom.s1p", sweep.Source.FileName);
    }

    [Fact]
    public void A_name_without_sNp_reads_with_a_port_count_from_the_caller()
    {
        byte[] content = Encoding.ASCII.GetBytes("# GHz S RI R 50\n1 0.1 0 0.2 0 0.3 0 0.4 0\n");

        Sweep sweep = TouchstoneReader.Read(content, "export.txt", 2);

        Assert.Equal(2, sweep.Network!.PortCount);
        Assert.Equal(Ri(0.2, 0), sweep.Network[0, 2, 1]);
    }

    [Fact]
    public void ReadFile_reads_from_disk_and_names_the_sweep_by_its_file_name()
    {
        string path = Path.Combine(Path.GetTempPath(), $"filterqa-{Guid.NewGuid():N}.s1p");
        File.WriteAllText(path, "# GHz S RI R 50\n1 0.25 0\n");
        try
        {
            Sweep sweep = TouchstoneReader.ReadFile(path);
            Assert.Equal(Path.GetFileName(path), sweep.Source.FileName);
            Assert.Equal(Ri(0.25, 0), sweep.Network!.Trace(1, 1)[0]);
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void ReadFile_of_a_missing_file_is_a_SweepReadException()
    {
        string path = Path.Combine(Path.GetTempPath(), $"filterqa-missing-{Guid.NewGuid():N}.s2p");

        var error = Assert.Throws<SweepReadException>(() => TouchstoneReader.ReadFile(path));

        Assert.Contains("does not exist", error.Problem, StringComparison.Ordinal);
    }
}
