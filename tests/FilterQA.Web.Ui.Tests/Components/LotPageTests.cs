using System.Text;
using Bunit;
using FilterQA.Core.Formats.Touchstone;
using FilterQA.Core.Synthesis;
using FilterQA.Data.Services;
using FilterQA.Web.Ui.Components;
using FilterQA.Web.Ui.Pages;
using FilterQA.Web.Ui.Services;
using FilterQA.Web.Ui.Tests.Infrastructure;
using Microsoft.Extensions.DependencyInjection;

namespace FilterQA.Web.Ui.Tests.Components;

public sealed class LotPageTests : SeededStore
{
    private async Task StoreUnitsAsync(params (int Index, DefectKind Defect)[] units)
    {
        DemoPart part = DemoParts.Get(PartNumber);
        var synthesiser = new UnitSynthesiser(3);
        var intake = Services.GetRequiredService<SweepIntake>();
        foreach ((int index, DefectKind defect) in units)
        {
            string serial = UnitSynthesiser.Serial(index);
            byte[] bytes = Encoding.ASCII.GetBytes(TouchstoneWriter.WriteToString(synthesiser.Unit(part, index, defect)));
            await intake.SubmitAsync(new SweepSubmission(LotNumber, serial, Station, new Actor("u-rhaldane", "R. Haldane"), bytes, serial + ".s2p"));
        }
    }

    [Fact]
    public async Task The_lot_page_lists_each_unit_with_its_verdict_and_overlays_every_counted_sweep()
    {
        await SeedAsync();
        await StoreUnitsAsync((1, DefectKind.None), (2, DefectKind.LowRejection), (3, DefectKind.None));

        var cut = Render<LotDetail>(p => p.Add(x => x.LotNumber, LotNumber));
        cut.WaitForElement("table.list tbody tr", TimeSpan.FromSeconds(20));

        var rows = cut.FindAll("table.list tbody tr");
        Assert.Equal(3, rows.Count);
        Assert.Equal(["Go", "NoGo", "Go"], rows.Select(r => r.GetAttribute("data-verdict") ?? "").ToArray());
        // Each unit links its counted measurement's one-page report.
        Assert.All(rows, r => Assert.Matches(@"^measurements/\d+/report\.pdf$", r.QuerySelector("a[download]")?.GetAttribute("href") ?? ""));
        // Three counted sweeps go into the envelope; the caption says how many.
        Assert.Contains("of 3 counted sweeps", cut.Find("#overlay-title + figure figcaption").TextContent, StringComparison.Ordinal);
        Assert.Contains("reject", cut.Find("table.pareto").TextContent, StringComparison.Ordinal);
        // An operator sees no disposition buttons (approvers only).
        Assert.Empty(cut.FindAll("section.disposition"));
        Assert.True(cut.FindComponents<SweepChart>().Count >= 2);
    }

    [Fact]
    public async Task The_page_model_counts_one_trace_per_unit_in_the_envelope()
    {
        await SeedAsync();
        await StoreUnitsAsync((1, DefectKind.None), (2, DefectKind.None));
        LotPage page = await Services.GetRequiredService<LotPageModel>().LoadAsync(LotNumber, envelopeBins: 100);
        Assert.Equal(2, page.Envelope.TraceCount);
        Assert.Equal(100, page.Envelope.BinCount);
        Assert.NotEmpty(page.MaskLines);
        // The template asks for 255 to 655 kHz at 50 points per 10 kHz feature: a 200 Hz step, 400 kHz / 200 Hz + 1 = 2 001 points a sweep.
        Assert.Equal(2 * 2001, page.Envelope.PointCounts.Sum());
    }
}
