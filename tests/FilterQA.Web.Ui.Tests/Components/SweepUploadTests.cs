using System.Text;
using Bunit;
using FilterQA.Core.Formats.Delimited;
using FilterQA.Core.Formats.Touchstone;
using FilterQA.Core.Synthesis;
using FilterQA.Core.Sweeps;
using FilterQA.Data.Services;
using FilterQA.Web.Ui.Components;
using FilterQA.Web.Ui.Services;
using FilterQA.Web.Ui.Tests.Infrastructure;
using Microsoft.AspNetCore.Components.Forms;
using Microsoft.Extensions.DependencyInjection;

namespace FilterQA.Web.Ui.Tests.Components;

public sealed class SweepUploadTests : SeededStore
{
    private static readonly TimeSpan Wait = TimeSpan.FromSeconds(20);

    private static byte[] Touchstone(Sweep sweep) => Encoding.ASCII.GetBytes(TouchstoneWriter.WriteToString(sweep));

    private async Task<IRenderedComponent<SweepUpload>> OpenAsync(string? serial)
    {
        await SeedAsync();
        Assert.True(await Services.GetRequiredService<BenchSession>().OpenLotAsync(LotNumber));
        return Render<SweepUpload>(p => p.Add(x => x.Serial, serial).Add(x => x.Station, Station));
    }

    [Fact]
    public async Task Choosing_a_good_units_file_stores_it_through_the_intake_and_shows_go()
    {
        var cut = await OpenAsync("S0001");
        DemoPart part = DemoParts.Get(PartNumber);
        byte[] file = Touchstone(new UnitSynthesiser(7).Unit(part, 1));

        cut.FindComponent<InputFile>().UploadFiles(InputFileContent.CreateFromBinary(file, "TME-CF455-15_S0001.s2p"));
        cut.WaitForElement("[data-verdict]", Wait);

        // The store now holds exactly the one unit, with the verdict the panel shows.
        LotSummary lot = await Services.GetRequiredService<LotService>().GetSummaryAsync(LotNumber);
        Assert.Equal(1, lot.UnitsTested);
        IReadOnlyList<UnitRow> units = await Services.GetRequiredService<LotUnitsReader>().UnitsAsync(LotNumber);
        Assert.Equal("S0001", Assert.Single(units).Serial);
        // A unit synthesised without a defect is built inside every limit of its template (the demo scenario's design).
        Assert.Equal(FilterQA.Core.Decisions.UnitVerdict.Go, units[0].CountedVerdict);
        Assert.Equal("go", cut.Find("section.verdict").GetAttribute("data-verdict"));
        Assert.Equal("yes", cut.Find(".attempt-note").GetAttribute("data-counts"));
        Assert.NotNull(cut.FindComponent<SweepChart>());
    }

    [Fact]
    public async Task A_unit_with_low_rejection_shows_no_go_with_the_failing_rule_in_words()
    {
        var cut = await OpenAsync("S0002");
        DemoPart part = DemoParts.Get(PartNumber);
        byte[] file = Touchstone(new UnitSynthesiser(7).Unit(part, 2, DefectKind.LowRejection));

        cut.FindComponent<InputFile>().UploadFiles(InputFileContent.CreateFromBinary(file, "S0002.s2p"));
        cut.WaitForElement("[data-verdict]", Wait);

        IReadOnlyList<UnitRow> units = await Services.GetRequiredService<LotUnitsReader>().UnitsAsync(LotNumber);
        Assert.Equal(FilterQA.Core.Decisions.UnitVerdict.NoGo, Assert.Single(units).CountedVerdict);
        Assert.Equal("no-go", cut.Find("section.verdict").GetAttribute("data-verdict"));
        // The template asks for at least 35 dB of rejection (SCENARIO: "rejection ≥ 35 dB at 455 kHz ± 100 kHz").
        Assert.Contains("35", cut.Find(".verdict-rules").TextContent, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Several_files_take_their_serials_from_their_names()
    {
        var cut = await OpenAsync(null);
        DemoPart part = DemoParts.Get(PartNumber);
        var synthesiser = new UnitSynthesiser(11);
        cut.FindComponent<InputFile>().UploadFiles(
            InputFileContent.CreateFromBinary(Touchstone(synthesiser.Unit(part, 3)), "TME-CF455-15_S0003.s2p"),
            InputFileContent.CreateFromBinary(Touchstone(synthesiser.Unit(part, 4)), "TME-CF455-15_S0004.s2p"));
        cut.WaitForAssertion(() => Assert.Equal(2, cut.FindAll("tr[data-outcome=judged]").Count), Wait);

        IReadOnlyList<UnitRow> units = await Services.GetRequiredService<LotUnitsReader>().UnitsAsync(LotNumber);
        Assert.Equal(["S0003", "S0004"], units.Select(u => u.Serial).ToArray());
    }

    [Fact]
    public async Task A_power_trace_without_a_thru_is_refused_with_the_thru_message_and_nothing_is_stored()
    {
        var cut = await OpenAsync("S0005");
        DemoPart part = DemoParts.Get(PartNumber);
        using var text = new StringWriter();
        DelimitedTextWriter.Write(new UnitSynthesiser(7).PowerUnit(part, 5, Station), text);

        cut.FindComponent<InputFile>().UploadFiles(InputFileContent.CreateFromText(text.ToString(), "S0005.csv"));
        cut.WaitForElement(".blocked", Wait);

        Assert.Contains("has no thru reference", cut.Find(".blocked").TextContent, StringComparison.Ordinal);
        Assert.Equal("stations", cut.Find(".blocked a").GetAttribute("href"));
        Assert.Empty(cut.FindAll("[data-verdict]"));
        Assert.Equal(0, (await Services.GetRequiredService<LotService>().GetSummaryAsync(LotNumber)).UnitsTested);
        Assert.Empty(await Services.GetRequiredService<LotUnitsReader>().UnitsAsync(LotNumber));
    }

    [Fact]
    public async Task An_unreadable_file_shows_the_readers_message_and_nothing_is_stored()
    {
        var cut = await OpenAsync("S0006");
        // Touchstone: the option line must come before the data; "# MHz S XY R 50" names no data format.
        cut.FindComponent<InputFile>().UploadFiles(InputFileContent.CreateFromText("# MHz S XY R 50\n455 0.5 0 0.5 0 0.5 0 0.5 0\n", "S0006.s2p"));
        cut.WaitForElement("tr[data-outcome=unreadable]", Wait);

        string shown = cut.Find("tr[data-outcome=unreadable]").TextContent;
        Assert.Contains("S0006.s2p", shown, StringComparison.Ordinal);
        // Counted by hand: '#' is column 1, "MHz" 3–5, "S" 7, and "XY" starts at column 9 of line 1.
        Assert.Contains("line 1, column 9", shown, StringComparison.Ordinal);
        Assert.Empty(await Services.GetRequiredService<LotUnitsReader>().UnitsAsync(LotNumber));
    }
}
