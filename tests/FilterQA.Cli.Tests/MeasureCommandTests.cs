using System.Text.Json;

namespace FilterQA.Cli.Tests;

public sealed class MeasureCommandTests
{
    private const double F0 = 10.7e6;
    private const double B = 280e3;
    private const int Order = 4;

    private static string Demo(string name) => Path.Combine(CliRunner.RepositoryRoot(), "src", "FilterQA.Cli", "DemoSweeps", name);

    [Fact]
    public void Json_has_every_field_of_the_contract_and_nothing_printed_besides_one_object()
    {
        (int code, string stdout, string stderr) = CliRunner.Run("measure", Demo("TME-CF455-15_S0001.s2p"),
            "--levels", "3,6,40", "--ripple-band", "450000:460000", "--stopband", "255000:355000", "--stopband", "555000:655000", "--json");

        Assert.Equal(0, code);
        Assert.Equal("", stderr);
        string[] lines = stdout.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Single(lines);
        using JsonDocument json = JsonDocument.Parse(lines[0]);
        JsonElement root = json.RootElement;
        foreach (string field in new[] { "points", "startHz", "stopHz", "minLossHz", "insertionLossDb", "bands", "rippleDb", "stopbands", "warnings" })
        {
            Assert.True(root.TryGetProperty(field, out _), $"missing {field}");
        }
        Assert.Equal(2001, root.GetProperty("points").GetInt32());
        Assert.Equal(new[] { 3.0, 6.0, 40.0 }, root.GetProperty("bands").EnumerateArray().Select(b => b.GetProperty("levelDb").GetDouble()));
        JsonElement band = root.GetProperty("bands")[1];
        foreach (string field in new[] { "lowerHz", "upperHz", "bandwidthHz", "centreHz", "geometricCentreHz" })
        {
            Assert.Equal(JsonValueKind.Number, band.GetProperty(field).ValueKind);
        }
        Assert.Equal(2, root.GetProperty("stopbands").GetArrayLength());
        JsonElement stop = root.GetProperty("stopbands")[0];
        foreach (string field in new[] { "startHz", "stopHz", "minRejectionDb", "absoluteLossDb", "atHz", "floorLimited" })
        {
            Assert.True(stop.TryGetProperty(field, out _), $"missing stopbands[].{field}");
        }
        Assert.Equal(255000, stop.GetProperty("startHz").GetDouble());
    }

    [Fact]
    public void Level_is_printed_exactly_as_parsed_in_the_order_given()
    {
        (int code, string stdout, _) = CliRunner.Run("measure", Demo("TME-CF455-15_S0001.s2p"), "--levels", "20,3.0103,6", "--json");

        Assert.Equal(0, code);
        using JsonDocument json = JsonDocument.Parse(stdout);
        Assert.Equal(new[] { 20, 3.0103, 6 }, json.RootElement.GetProperty("bands").EnumerateArray().Select(b => b.GetProperty("levelDb").GetDouble()));
    }

    [Theory]
    [InlineData(3.0, 4001)]
    [InlineData(6.0, 4001)]
    [InlineData(20.0, 4001)]
    [InlineData(3.0, 401)]
    public void Butterworth_edges_match_the_closed_form_within_the_interpolation_bound(double levelDb, int points)
    {
        // Expected edges: closed form of the Butterworth bandpass (Zverev 1967, from memory), see ButterworthFile.Edges.
        using var folder = new TempFolder();
        const double start = 9.7e6, stop = 11.7e6;
        string file = folder.Write("butterworth.s2p", ButterworthFile.Text(start, stop, points, F0, B, Order));
        (double lower, double upper) = ButterworthFile.Edges(levelDb, F0, B, Order);

        (int code, string stdout, string stderr) = CliRunner.Run("measure", file, "--levels", levelDb.ToString(System.Globalization.CultureInfo.InvariantCulture), "--json");

        Assert.True(code == 0, stderr);
        JsonElement band = JsonDocument.Parse(stdout).RootElement.GetProperty("bands")[0];
        // Linear interpolation in dB between points h apart errs by at most about h²·|d²A/df²|/8 / |dA/df|;
        // bounding it by h/8 holds where the slope changes by less than 2x within a step (DOMAIN 4, computed),
        // which a 4th-order skirt sampled this densely satisfies.
        double h = (stop - start) / (points - 1);
        Assert.InRange(band.GetProperty("lowerHz").GetDouble(), lower - h / 8, lower + h / 8);
        Assert.InRange(band.GetProperty("upperHz").GetDouble(), upper - h / 8, upper + h / 8);
        Assert.InRange(band.GetProperty("bandwidthHz").GetDouble(), upper - lower - h / 4, upper - lower + h / 4);
        Assert.InRange(band.GetProperty("centreHz").GetDouble(), (lower + upper) / 2 - h / 8, (lower + upper) / 2 + h / 8);
    }

    [Fact]
    public void An_edge_the_sweep_does_not_reach_is_null_and_so_are_the_derived_values_with_a_warning()
    {
        // The sweep starts at the centre frequency, so the lower 3 dB edge lies outside it.
        using var folder = new TempFolder();
        string file = folder.Write("half.s2p", ButterworthFile.Text(F0, 11.7e6, 1001, F0, B, Order));

        (int code, string stdout, _) = CliRunner.Run("measure", file, "--json");

        Assert.Equal(0, code);
        JsonElement root = JsonDocument.Parse(stdout).RootElement;
        JsonElement band = root.GetProperty("bands")[0];
        Assert.Equal(JsonValueKind.Null, band.GetProperty("lowerHz").ValueKind);
        Assert.Equal(JsonValueKind.Number, band.GetProperty("upperHz").ValueKind);
        Assert.Equal(JsonValueKind.Null, band.GetProperty("bandwidthHz").ValueKind);
        Assert.Equal(JsonValueKind.Null, band.GetProperty("centreHz").ValueKind);
        Assert.Equal(JsonValueKind.Null, band.GetProperty("geometricCentreHz").ValueKind);
        Assert.NotEqual(0, root.GetProperty("warnings").GetArrayLength());
    }

    [Fact]
    public void Ripple_band_takes_points_inside_the_closed_interval_with_the_relative_tolerance()
    {
        // Points every 1 kHz; a band from 10.700 MHz·(1+5e-10) still includes 10.700 MHz (tolerance 1e-9, fixed contract).
        using var folder = new TempFolder();
        string file = folder.Write("b.s2p", ButterworthFile.Text(9.7e6, 11.7e6, 2001, F0, B, Order));
        double start = F0 * (1 + 5e-10);
        double stop = 10.75e6;
        string band = FormattableString.Invariant($"{start:R}:{stop:R}");

        (int code, string stdout, _) = CliRunner.Run("measure", file, "--ripple-band", band, "--json");

        Assert.Equal(0, code);
        // Expected ripple: max − min of the closed-form loss over the sampled points 10.700…10.750 MHz.
        double min = double.MaxValue, max = double.MinValue;
        for (double f = 10.700e6; f <= 10.750e6 + 1; f += 1e3)
        {
            double loss = -10 * Math.Log10(ButterworthFile.GainSquared(f, F0, B, Order));
            min = Math.Min(min, loss);
            max = Math.Max(max, loss);
        }
        Assert.Equal(max - min, JsonDocument.Parse(stdout).RootElement.GetProperty("rippleDb").GetDouble(), 1e-9);
    }

    [Fact]
    public void Resonator_object_holds_the_fitted_fields()
    {
        (int code, string stdout, string stderr) = CliRunner.Run("measure", Demo("TME-XR24M-18_S0001.s2p"), "--resonator", "--json");

        Assert.True(code == 0, stderr);
        JsonElement resonator = JsonDocument.Parse(stdout).RootElement.GetProperty("resonator");
        foreach (string field in new[] { "peakHz", "peakLossDb", "notchHz", "notchLossDb", "seriesHz", "parallelHz", "r1Ohm", "c1F", "l1H", "c0F", "unloadedQ", "loadedQ" })
        {
            Assert.Equal(JsonValueKind.Number, resonator.GetProperty(field).ValueKind);
        }
        Assert.Equal(JsonValueKind.Array, resonator.GetProperty("unwantedModes").ValueKind);
        // Q = 2π·fs·L1/R1 (Butterworth–Van Dyke model, DOMAIN 3): the printed fields must agree with each other.
        double q = 2 * Math.PI * resonator.GetProperty("seriesHz").GetDouble() * resonator.GetProperty("l1H").GetDouble() / resonator.GetProperty("r1Ohm").GetDouble();
        Assert.Equal(q, resonator.GetProperty("unloadedQ").GetDouble(), q * 1e-9);
    }

    [Fact]
    public void A_power_trace_is_normalised_by_its_thru_and_the_floor_file_is_used()
    {
        (int code, string stdout, string stderr) = CliRunner.Run("measure", Demo("TME-CF455-15_S0001_power.csv"),
            "--thru", Demo("TME-CF455-15_thru_IQC-1.csv"), "--floor", Demo("TME-CF455-15_floor_IQC-1.csv"), "--stopband", "255000:355000", "--json");

        Assert.True(code == 0, stderr);
        JsonElement root = JsonDocument.Parse(stdout).RootElement;
        Assert.Contains(root.GetProperty("warnings").EnumerateArray(), w => w.GetString()!.Contains("normalised by thru", StringComparison.Ordinal));
        Assert.DoesNotContain(root.GetProperty("warnings").EnumerateArray(), w => w.GetString()!.Contains("estimated", StringComparison.Ordinal));
    }

    [Fact]
    public void A_missing_sweep_file_is_exit_2_with_the_file_named()
    {
        (int code, string stdout, string stderr) = CliRunner.Run("measure", "no-such-sweep.s2p", "--json");

        Assert.Equal(2, code);
        Assert.Equal("", stdout);
        Assert.Contains("no-such-sweep.s2p", stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void A_malformed_sweep_is_exit_2_with_line_and_column()
    {
        using var folder = new TempFolder();
        string file = folder.Write("bad.s2p", "# HZ S RI R 50\n1000 0.1 0 0.9 0 0.9 0 0.1 0\n2000 0.1 x 0.9 0 0.9 0 0.1 0\n");

        (int code, string stdout, string stderr) = CliRunner.Run("measure", file, "--json");

        Assert.Equal(2, code);
        Assert.Equal("", stdout);
        Assert.Contains("bad.s2p, line 3", stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void A_thru_that_does_not_cover_the_sweep_is_exit_2()
    {
        using var folder = new TempFolder();
        string dut = folder.Write("dut.s2p", ButterworthFile.Text(9.7e6, 11.7e6, 201, F0, B, Order));
        string thru = folder.Write("thru.s2p", ButterworthFile.Text(10e6, 11e6, 101, F0, 50e6, 1));

        (int code, string stdout, string stderr) = CliRunner.Run("measure", dut, "--thru", thru, "--json");

        Assert.Equal(2, code);
        Assert.Equal("", stdout);
        Assert.Contains("thru.s2p", stderr, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("measure")]
    [InlineData("measure", "a.s2p", "b.s2p")]
    [InlineData("measure", "a.s2p", "--bogus")]
    [InlineData("measure", "a.s2p", "--levels", "3,-6")]
    [InlineData("measure", "a.s2p", "--levels", "abc")]
    [InlineData("measure", "a.s2p", "--stopband", "5:1")]
    [InlineData("measure", "a.s2p", "--ripple-band", "100")]
    [InlineData("measure", "a.s2p", "--thru")]
    [InlineData("measure", "a.s2p", "--json=yes")]
    [InlineData("frobnicate")]
    public void Usage_errors_are_exit_1_and_print_nothing_on_stdout(params string[] args)
    {
        (int code, string stdout, string stderr) = CliRunner.Run(args);

        Assert.Equal(1, code);
        Assert.Equal("", stdout);
        Assert.NotEqual("", stderr);
    }
}
