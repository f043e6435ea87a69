using Bunit;
using FilterQA.Core.Sampling;
using FilterQA.Data.Entities;
using FilterQA.Data.Services;
using FilterQA.Web.Ui.Components;

namespace FilterQA.Web.Ui.Tests.Components;

public sealed class LotProgressTests : BunitContext
{
    // MIL-STD-105E: a lot of 1 200 at general level II is code letter J (Table I, 501–1200), n = 80;
    // Table II-A, J at AQL 0.65 %: Ac 1, Re 2.
    private const int TableSampleSize = 80;
    private const int TableAc = 1;
    private const int TableRe = 2;

    private static LotSummary Summary(int tested, int defectives)
    {
        SamplingPlan plan = SamplingPlanner.Mil105E(1200, InspectionLevel.II, InspectionSeverity.Normal, 0.65);
        return new LotSummary(1, "VP-2611-0042", "TME-CF455-15", 1, "sha256:00", "Veltrane Piezo", "VZ-7731", "2544", 1200, "PO-1187",
            "Brackwater Shipyards", plan, "switching rules: normal", tested == 0 ? LotStatus.Open : LotStatus.InTest, tested, tested - defectives,
            defectives, 0, defectives, tested - defectives, 0, tested, LotDisposition.Decide(plan, tested, defectives), null,
            new DateTimeOffset(2026, 11, 3, 8, 0, 0, TimeSpan.Zero), "J. Lindqvist", null, null, null, false);
    }

    private static string Figure(IRenderedComponent<LotProgress> cut, string name) => cut.Find($"[data-figure={name}]").TextContent.Trim();

    [Fact]
    public void Shows_sample_size_tested_ac_re_and_defects_from_the_summary()
    {
        var cut = Render<LotProgress>(p => p.Add(x => x.Summary, Summary(tested: 17, defectives: 1)));
        Assert.Equal(TableSampleSize.ToString(System.Globalization.CultureInfo.InvariantCulture), Figure(cut, "sample-size"));
        Assert.Equal("17", Figure(cut, "tested"));
        Assert.Equal(TableAc.ToString(System.Globalization.CultureInfo.InvariantCulture), Figure(cut, "ac"));
        Assert.Equal(TableRe.ToString(System.Globalization.CultureInfo.InvariantCulture), Figure(cut, "re"));
        Assert.Equal("1", Figure(cut, "defects"));
        Assert.Equal("testing", cut.Find("section").GetAttribute("data-state"));
        // 80 − 17 = 63 still to test.
        Assert.Contains("63 more to test", cut.Find(".progress-state").TextContent, StringComparison.Ordinal);
        Assert.Equal("17", cut.Find("progress").GetAttribute("value"));
    }

    [Fact]
    public void A_full_sample_below_the_rejection_number_shows_sample_complete_and_the_plans_word()
    {
        var cut = Render<LotProgress>(p => p.Add(x => x.Summary, Summary(tested: TableSampleSize, defectives: TableAc)));
        Assert.Equal("sample-complete", cut.Find("section").GetAttribute("data-state"));
        // At most Ac defectives in the full sample: the plan accepts (MIL-STD-105E single sampling).
        Assert.Contains("Sample complete", cut.Find(".progress-state").TextContent, StringComparison.Ordinal);
        Assert.Contains("Accept", cut.Find(".progress-state").TextContent, StringComparison.Ordinal);
    }

    [Fact]
    public void Reaching_the_rejection_number_shows_it_before_the_sample_is_complete()
    {
        var cut = Render<LotProgress>(p => p.Add(x => x.Summary, Summary(tested: 30, defectives: TableRe)));
        Assert.Equal("reject-reached", cut.Find("section").GetAttribute("data-state"));
        Assert.Contains("Rejection number reached", cut.Find(".progress-state").TextContent, StringComparison.Ordinal);
    }
}
