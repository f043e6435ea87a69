using System.Text.Json;
using FilterQA.Core.Synthesis;

namespace FilterQA.Cli.Tests;

// The check command's contract: one line (or JSON object) per unit; exit 0 all go, 1 any no-go or not verifiable
// (and usage errors), 2 unreadable input. The synthetic units are demo data: these tests check the command's
// behaviour, not the correctness of a measured value.
public class CheckCommandTests
{
    private const string Part = "TME-CF455-15";

    [Fact]
    public void Good_units_are_go_with_exit_code_0()
    {
        using var files = new CliFixture();
        string a = files.Unit(Part, 1), b = files.Unit(Part, 2);
        (int code, string output, string error) = CliFixture.Run("check", "--template", CliFixture.ShippedTemplate(Part), a, b);
        Assert.True(code == 0, error + output);
        Assert.Equal([$"{a}: go", $"{b}: go"], output.Split('\n', StringSplitOptions.RemoveEmptyEntries).Select(l => l.TrimEnd('\r')));
    }

    [Fact]
    public void A_defective_unit_makes_exit_code_1_and_its_line_names_the_failing_rule()
    {
        using var files = new CliFixture();
        string good = files.Unit(Part, 1), bad = files.Unit(Part, 2, DefectKind.HighLoss);
        (int code, string output, _) = CliFixture.Run("check", "--template", CliFixture.ShippedTemplate(Part), good, bad);
        Assert.Equal(1, code);
        string[] lines = output.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.StartsWith($"{good}: go", lines[0]);
        Assert.StartsWith($"{bad}: no-go: loss (fail): minimum loss", lines[1]);
    }

    [Fact]
    public void Json_lines_carry_every_field()
    {
        using var files = new CliFixture();
        string good = files.Unit(Part, 1), bad = files.Unit(Part, 3, DefectKind.LowRejection);
        (int code, string output, _) = CliFixture.Run("check", "--template", CliFixture.ShippedTemplate(Part), good, bad, "--json");
        Assert.Equal(1, code);
        string[] lines = output.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(2, lines.Length);
        using JsonDocument first = JsonDocument.Parse(lines[0]);
        using JsonDocument second = JsonDocument.Parse(lines[1]);
        JsonElement unit = first.RootElement;
        Assert.Equal(good, unit.GetProperty("file").GetString());
        Assert.Equal("go", unit.GetProperty("verdict").GetString());
        Assert.Equal(Part, unit.GetProperty("partNumber").GetString());
        Assert.Equal(1, unit.GetProperty("templateRevision").GetInt32());
        Assert.StartsWith("sha256:", unit.GetProperty("templateHash").GetString());
        Assert.NotEmpty(unit.GetProperty("warnings").EnumerateArray());
        JsonElement rule = unit.GetProperty("rules")[0];
        foreach (string name in new[] { "ruleId", "kind", "title", "unit", "measured", "limit", "sense", "margin", "guardBand", "outcome", "lowerBound", "atHz", "message" })
        {
            Assert.True(rule.TryGetProperty(name, out _), "missing " + name);
        }
        Assert.Equal("centre", rule.GetProperty("ruleId").GetString());
        Assert.Equal("centre-frequency", rule.GetProperty("kind").GetString());
        Assert.Equal("Hz", rule.GetProperty("unit").GetString());
        Assert.Equal(JsonValueKind.Number, rule.GetProperty("measured").ValueKind);
        Assert.Equal("pass", rule.GetProperty("outcome").GetString());

        JsonElement rejected = second.RootElement;
        Assert.Equal("no-go", rejected.GetProperty("verdict").GetString());
        JsonElement[] rules = [.. rejected.GetProperty("rules").EnumerateArray()];
        Assert.Contains(rules, r => r.GetProperty("ruleId").GetString()!.StartsWith("reject-", StringComparison.Ordinal)
            && r.GetProperty("outcome").GetString() is "fail" or "conditional-fail");
        // A value that cannot be measured is null, never NaN: the low-rejection unit never reaches 40 dB.
        JsonElement bw40 = rules.Single(r => r.GetProperty("ruleId").GetString() == "bw-40db");
        Assert.Equal("not-verifiable", bw40.GetProperty("outcome").GetString());
        Assert.Equal(JsonValueKind.Null, bw40.GetProperty("measured").ValueKind);
        Assert.Equal(JsonValueKind.Null, bw40.GetProperty("margin").ValueKind);
    }

    [Fact]
    public void A_sweep_that_cannot_be_read_gives_exit_code_2_and_no_unit_is_judged()
    {
        using var files = new CliFixture();
        string good = files.Unit(Part, 1);
        string broken = files.WriteText("broken.s2p", "# Hz S RI R 50\n1000 0.5 0 0.5\n");
        (int code, string output, string error) = CliFixture.Run("check", "--template", CliFixture.ShippedTemplate(Part), good, broken);
        Assert.Equal(2, code);
        Assert.Equal("", output);
        Assert.Contains("broken.s2p", error);
    }

    [Fact]
    public void A_thru_that_does_not_cover_the_sweep_gives_exit_code_2()
    {
        using var files = new CliFixture();
        string unit = files.Unit(Part, 1);
        string thru = files.Write(new UnitSynthesiser(1).Unit(DemoParts.Get("TME-LC92-TRAP"), 1), "thru.s2p"); // 60–124 MHz
        (int code, _, string error) = CliFixture.Run("check", "--template", CliFixture.ShippedTemplate(Part), unit, "--thru", thru);
        Assert.Equal(2, code);
        Assert.Contains("thru", error);
    }

    [Fact]
    public void Power_traces_are_judged_after_the_thru_is_divided_out()
    {
        // A stepped generator read by a spectrum analyser: the unit's dBm trace minus the station's thru is its loss.
        using var files = new CliFixture();
        var synthesiser = new UnitSynthesiser(2544);
        DemoPart part = DemoParts.Get(Part);
        string thru = files.WriteDelimited(synthesiser.PowerThru(part, "IQC-1"), "thru.csv");
        string good = files.WriteDelimited(synthesiser.PowerUnit(part, 1, "IQC-1"), "good.csv");
        string lossy = files.WriteDelimited(synthesiser.PowerUnit(part, 2, "IQC-1", DefectKind.HighLoss), "lossy.csv");
        (int code, string output, string error) = CliFixture.Run("check", "--template", CliFixture.ShippedTemplate(Part), good, lossy, "--thru", thru);
        Assert.True(code == 1, error + output);
        string[] lines = output.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.StartsWith($"{good}: go", lines[0]);
        Assert.StartsWith($"{lossy}: no-go: loss (fail)", lines[1]);
    }

    [Fact]
    public void A_power_trace_without_a_thru_cannot_be_used()
    {
        using var files = new CliFixture();
        string power = files.WriteDelimited(new UnitSynthesiser(1).PowerUnit(DemoParts.Get(Part), 1, "IQC-1"), "unit.csv");
        (int code, string output, string error) = CliFixture.Run("check", "--template", CliFixture.ShippedTemplate(Part), power);
        Assert.Equal(2, code);
        Assert.Equal("", output);
        Assert.Contains("normalised by a thru", error);
    }

    [Fact]
    public void A_template_with_problems_gives_exit_code_2_with_every_problem()
    {
        using var files = new CliFixture();
        string unit = files.Unit(Part, 1);
        string template = files.WriteText("bad.yaml", ValidateTemplateCommandTests.BrokenTemplate);
        (int code, string output, string error) = CliFixture.Run("check", "--template", template, unit);
        Assert.Equal(2, code);
        Assert.Equal("", output);
        Assert.True(error.Split('\n', StringSplitOptions.RemoveEmptyEntries).Length >= 2, error);
    }

    [Theory]
    [InlineData("check")]
    [InlineData("check", "--template")]
    [InlineData("check", "--template", "t.yaml")]
    [InlineData("check", "--template", "t.yaml", "a.s2p", "--colour")]
    public void Usage_errors_give_exit_code_1(params string[] args) => Assert.Equal(1, CliFixture.Run(args).Code);
}
