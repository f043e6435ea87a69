using System.Globalization;
using FilterQA.Core.Statistics;
using FilterQA.Reports.Charts;
using FilterQA.Reports.Documents;
using FilterQA.Reports.Pdf;
using FilterQA.Reports.Tests.Infrastructure;
using UglyToad.PdfPig;

namespace FilterQA.Reports.Tests.Documents;

/// <summary>The renderers fed with content made in the test (no database): what they print is what they were given.</summary>
public sealed class ReportDocumentTests
{
    private static byte[] Pdf(Action<Stream> render)
    {
        using var stream = new MemoryStream();
        render(stream);
        return stream.ToArray();
    }

    [Fact]
    public void The_yield_report_prints_the_yields_and_capability_of_its_content()
    {
        YieldReportContent content = SyntheticContent.Yield(300);
        byte[] pdf = Pdf(s => new YieldReportDocument(TestFonts.Default).Render(content, PaperSize.A4, s));
        IReadOnlyList<string[]> lines = PdfText.Lines(pdf);
        int tested = content.Lots.Sum(l => l.UnitsTested);
        // Yield = go / tested (plain ratio), printed in percent with two decimals: ±0.005 percentage points.
        AssertAfter(lines, ["First-pass", "yield"], 100.0 * content.Lots.Sum(l => l.FirstPassGo) / tested);
        AssertAfter(lines, ["Final", "yield"], 100.0 * content.Lots.Sum(l => l.FinalGo) / tested);
        foreach (ParameterSummary p in content.Parameters)
        {
            string[] row = Assert.Single(lines, l => l.Length > 8 && l[0] == p.Parameter);
            string[] numbers = Numbers.Tokens(row).Select(t => t.Number).ToArray();
            double siPer = SiUnits.SiPer(row[1]);
            Assert.Equal(p.Moments.Count.ToString(CultureInfo.InvariantCulture), numbers[0]);
            Numbers.Equal(p.Moments.Mean / siPer, numbers[1], p.Parameter + " mean");
            Numbers.Equal(p.Moments.StandardDeviation / siPer, numbers[2], p.Parameter + " standard deviation");
            CapabilityIndices c = p.Capability!;
            // Cpk = min(USL − mean, mean − LSL) / (3 s), written out here (Montgomery, Introduction to Statistical Quality Control, §8.3).
            double cpk = Math.Min(p.Limits!.Upper is { } u ? (u - p.Moments.Mean) / (3 * p.Moments.StandardDeviation) : double.PositiveInfinity,
                p.Limits.Lower is { } l ? (p.Moments.Mean - l) / (3 * p.Moments.StandardDeviation) : double.PositiveInfinity);
            // The row ends with Cpk, its lower bound and "(95 %)": two decimals each, ±0.005.
            Numbers.Equal(cpk, numbers[^2], p.Parameter + " Cpk");
            Numbers.Equal(c.CpkLowerBound, numbers[^1], p.Parameter + " Cpk lower bound");
            Assert.Equal("(95", row[^2]);
            if (p.Limits.Lower is { } lsl && p.Limits.Upper is { } usl)
            {
                // Cp = (USL − LSL) / (6 s), same source.
                Numbers.Equal((usl - lsl) / (6 * p.Moments.StandardDeviation), numbers[^3], p.Parameter + " Cp");
            }
        }
        string text = PdfText.All(pdf);
        Assert.Contains(FormattableString.Invariant($"range of all {content.Envelope.TraceCount} units"), text, StringComparison.Ordinal);
        foreach (NonConformingUnit unit in content.NonConforming)
        {
            Assert.Contains(lines, l => l.Length > 2 && l[0] == unit.LotNumber && l[1] == unit.Serial);
        }
    }

    [Fact]
    public void The_rejection_report_prints_its_pareto_counts_and_shares()
    {
        RejectionReportContent content = SyntheticContent.Rejection(9);
        byte[] pdf = Pdf(s => new RejectionReportDocument(TestFonts.Default).Render(content, PaperSize.Letter, s));
        IReadOnlyList<string[]> lines = PdfText.Lines(pdf);
        int total = content.FailingUnits.Sum(u => u.FailingRules.Count);
        double cumulative = 0;
        foreach (IGrouping<string, string> rule in content.FailingUnits.SelectMany(u => u.FailingRules).Select(r => r.RuleId).GroupBy(r => r)
            .OrderByDescending(g => g.Count()))
        {
            string[] row = Assert.Single(lines, l => l.Length <= 6 && l.Length >= 4 && l[0] == rule.Key && l[^1] == "%");
            string[] numbers = Numbers.Tokens(row).Select(t => t.Number).ToArray();
            Assert.Equal(rule.Count().ToString(CultureInfo.InvariantCulture), numbers[0]);
            // Share = failures of the rule / all failures; cumulative over the rules in descending order (Juran's Pareto table).
            double share = (double)rule.Count() / total;
            cumulative += share;
            Numbers.Equal(100 * share, numbers[1], rule.Key + " share");
            Numbers.Equal(100 * cumulative, numbers[2], rule.Key + " cumulative");
        }
        using PdfDocument document = PdfDocument.Open(pdf);
        Assert.Equal(612, document.GetPage(1).Width, 0.01);
        Assert.Equal("Rejection report, lot " + content.Lot.LotNumber, document.Information.Title);
    }

    [Fact]
    public void Many_failing_units_spread_over_pages_with_page_n_of_m()
    {
        RejectionReportContent content = SyntheticContent.Rejection(180);
        IReadOnlyList<string> pages = PdfText.Pages(Pdf(s => new RejectionReportDocument(TestFonts.Default).Render(content, PaperSize.A4, s)));
        Assert.True(pages.Count > 2);
        for (int p = 0; p < pages.Count; p++)
        {
            Assert.Contains(FormattableString.Invariant($"page {p + 1} of {pages.Count}"), pages[p], StringComparison.Ordinal);
        }
        string all = string.Join(' ', pages);
        foreach (NonConformingUnit unit in content.FailingUnits)
        {
            Assert.Contains(" " + unit.Serial + " ", all, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void The_envelope_holds_the_least_and_greatest_loss_of_every_point_in_each_bin()
    {
        var sweeps = SyntheticContent.Sweeps(40);
        const int bins = 50;
        LossEnvelope envelope = EnvelopeBuilder.Build(sweeps, bins);
        double start = sweeps.Min(t => t.Grid.StartHz), stop = sweeps.Max(t => t.Grid.StopHz);
        double width = (stop - start) / bins;
        // Brute force: for each bin centre, scan every point of every sweep that falls in [centre − w/2, centre + w/2).
        for (int b = 0; b < envelope.CentresHz.Length; b++)
        {
            double lo = envelope.CentresHz[b] - width / 2, hi = envelope.CentresHz[b] + width / 2;
            bool last = Math.Abs(hi - stop) < width * 1e-9;
            var values = sweeps.SelectMany(t => t.Grid.Hz.ToArray().Select((hz, i) => (hz, loss: t.LossDb[i])))
                .Where(p => p.hz >= lo - 1e-6 && (p.hz < hi - 1e-6 || last)).Select(p => p.loss).ToArray();
            Assert.NotEmpty(values);
            // Exact: the envelope copies measured values, it computes none.
            Assert.Equal(values.Min(), envelope.MinLossDb[b]);
            Assert.Equal(values.Max(), envelope.MaxLossDb[b]);
        }
        Assert.Equal(sweeps.Length, envelope.TraceCount);
    }

    [Fact]
    public void Envelopes_filled_by_separate_workers_merge_to_the_envelope_of_all_sweeps()
    {
        var sweeps = SyntheticContent.Sweeps(40);
        double start = sweeps.Min(t => t.Grid.StartHz), stop = sweeps.Max(t => t.Grid.StopHz);
        var whole = new EnvelopeAccumulator(start, stop, 50);
        var even = new EnvelopeAccumulator(start, stop, 50);
        var odd = new EnvelopeAccumulator(start, stop, 50);
        for (int i = 0; i < sweeps.Length; i++)
        {
            whole.Add(sweeps[i]);
            (i % 2 == 0 ? even : odd).Add(sweeps[i]);
        }
        even.Merge(odd);
        // The least of the least and the greatest of the greatest per bin is the least and greatest of all: exact,
        // and the single accumulator is itself checked against a brute-force scan above.
        LossEnvelope merged = even.ToEnvelope(), expected = whole.ToEnvelope();
        Assert.Equal(expected.CentresHz.ToArray(), merged.CentresHz.ToArray());
        Assert.Equal(expected.MinLossDb.ToArray(), merged.MinLossDb.ToArray());
        Assert.Equal(expected.MaxLossDb.ToArray(), merged.MaxLossDb.ToArray());
        Assert.Equal(sweeps.Length, merged.TraceCount);
        Assert.Throws<ArgumentException>(() => even.Merge(new EnvelopeAccumulator(start, stop, 49)));
    }

    private static void AssertAfter(IReadOnlyList<string[]> lines, string[] label, double expected)
    {
        foreach (string[] line in lines)
        {
            for (int i = 0; i + label.Length < line.Length; i++)
            {
                if (line.Skip(i).Take(label.Length).SequenceEqual(label))
                {
                    Numbers.Equal(expected, line[i + label.Length], string.Join(' ', label));
                    return;
                }
            }
        }
        Assert.Fail($"'{string.Join(' ', label)}' is not printed");
    }
}
