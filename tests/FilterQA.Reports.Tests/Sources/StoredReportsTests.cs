using System.Globalization;
using FilterQA.Core.Decisions;
using FilterQA.Data;
using FilterQA.Data.Entities;
using FilterQA.Reports.Documents;
using FilterQA.Reports.Pdf;
using FilterQA.Reports.Sources;
using FilterQA.Reports.Tests.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Reports.Tests.Sources;

/// <summary>
/// Documents built from a real database (SQLite, migrated; units submitted through the intake and judged against the
/// shipped template): every count and yield printed equals what the test computes from the stored rows itself.
/// </summary>
public sealed class StoredReportsTests(StoredLotsFixture fixture) : IClassFixture<StoredLotsFixture>
{
    private const string RejectedLot = StoredLotsFixture.RejectedLot;
    private const string AcceptedLot = StoredLotsFixture.AcceptedLot;
    private readonly ReportStore _store = fixture.Store;

    private sealed record StoredUnit(string Lot, string Serial, UnitVerdict Counted, UnitVerdict First, long CountedId);

    private async Task<List<StoredUnit>> UnitsAsync(string lotNumber)
    {
        await using FilterQaDbContext context = _store.NewContext();
        return await context.Units.Where(u => u.Lot!.LotNumber == lotNumber).OrderBy(u => u.SamplePosition)
            .Select(u => new StoredUnit(lotNumber, u.Serial, u.CountedVerdict,
                context.Measurements.Where(m => m.UnitId == u.Id && m.Attempt == 1).Select(m => m.Verdict).First(), u.CountedMeasurementId!.Value))
            .ToListAsync();
    }

    private async Task<List<RuleResultRecord>> RulesAsync(long measurementId)
    {
        await using FilterQaDbContext context = _store.NewContext();
        return await context.RuleResults.Where(r => r.MeasurementId == measurementId).OrderBy(r => r.Ordinal).ToListAsync();
    }

    // The shipped template uses guarded acceptance (ILAC-G8:09/2019 §4.2.3): only a plain pass accepts.
    private static bool Blocks(RuleOutcome outcome) => outcome != RuleOutcome.Pass;

    private static byte[] Pdf(Action<Stream> render)
    {
        using var stream = new MemoryStream();
        render(stream);
        return stream.ToArray();
    }

    [Fact]
    public async Task The_rejection_report_prints_the_stored_counts_failing_units_and_their_values()
    {
        List<StoredUnit> units = await UnitsAsync(RejectedLot);
        List<StoredUnit> failing = units.Where(u => u.Counted != UnitVerdict.Go).ToList();
        Assert.NotEmpty(failing);
        RejectionReportContent content = await _store.Source.RejectionAsync(RejectedLot, "J. Lindqvist");
        byte[] pdf = Pdf(s => new RejectionReportDocument(TestFonts.Default).Render(content, PaperSize.A4, s));
        string text = PdfText.All(pdf);
        Assert.Contains("Units tested " + units.Count.ToString(CultureInfo.InvariantCulture), text, StringComparison.Ordinal);
        Assert.Contains("Defectives " + failing.Count.ToString(CultureInfo.InvariantCulture), text, StringComparison.Ordinal);

        IReadOnlyList<string[]> lines = PdfText.Lines(pdf);
        var failureCounts = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (StoredUnit unit in failing)
        {
            List<RuleResultRecord> blocking = (await RulesAsync(unit.CountedId)).Where(r => Blocks(r.Outcome)).ToList();
            foreach (RuleResultRecord r in blocking)
            {
                failureCounts[r.RuleId] = failureCounts.GetValueOrDefault(r.RuleId) + 1;
            }
            string[] line = Assert.Single(lines, l => l.Length > 0 && l[0] == unit.Serial);
            RuleResultRecord first = blocking[0];
            Assert.Contains(first.RuleId, line);
            var numbers = Numbers.Tokens(line).Where(n => n.Unit is not null && !n.Unit.All(char.IsDigit)).ToList();
            double?[] expected = [first.MeasuredValue, first.LimitValue];
            var present = expected.Where(v => v is not null).Select(v => v!.Value).ToArray();
            // Measured value and limit are the last numbers of the row; each within half its last printed digit.
            var printed = numbers.Skip(numbers.Count - present.Length).ToArray();
            for (int i = 0; i < present.Length; i++)
            {
                Numbers.Equal(present[i] / SiUnits.SiPer(printed[i].Unit!), printed[i].Number, $"{unit.Serial} {first.RuleId}");
            }
        }
        // Pareto: failures per rule over the counted measurements, from the stored rule results.
        foreach ((string rule, int count) in failureCounts)
        {
            string[] row = Assert.Single(lines, l => l.Length >= 4 && l[0] == rule && l[^1] == "%" && l.Length <= 6);
            Assert.Equal(count.ToString(CultureInfo.InvariantCulture), row[1]);
        }
    }

    [Fact]
    public async Task A_lot_that_is_not_rejected_gets_no_rejection_report()
    {
        var error = await Assert.ThrowsAsync<ReportRefusedException>(() => _store.Source.RejectionAsync(AcceptedLot, "J. Lindqvist"));
        Assert.Contains(AcceptedLot, error.Message, StringComparison.Ordinal);
        Assert.Contains("not rejected", error.Message, StringComparison.Ordinal);
        var missing = await Assert.ThrowsAsync<RecordNotFoundException>(() => _store.Source.RejectionAsync("VP-0000-0000", "J. Lindqvist"));
        Assert.Contains("VP-0000-0000", missing.Message, StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_lot_yield_report_prints_the_yields_computed_from_the_stored_attempts()
    {
        List<StoredUnit> units = await UnitsAsync(RejectedLot);
        // First-pass yield = units go at their first attempt / units tested; final yield = units counted go / units tested.
        double firstPass = (double)units.Count(u => u.First == UnitVerdict.Go) / units.Count;
        double final = (double)units.Count(u => u.Counted == UnitVerdict.Go) / units.Count;
        YieldReportContent content = await _store.Source.LotYieldAsync(RejectedLot, "J. Lindqvist");
        byte[] pdf = Pdf(s => new YieldReportDocument(TestFonts.Default).Render(content, PaperSize.Letter, s));
        IReadOnlyList<string[]> lines = PdfText.Lines(pdf);
        AssertYield(lines, "First-pass yield", firstPass);
        AssertYield(lines, "Final yield", final);
        string text = PdfText.All(pdf);
        Assert.Contains("Units tested " + units.Count.ToString(CultureInfo.InvariantCulture), text, StringComparison.Ordinal);
        foreach (StoredUnit unit in units.Where(u => u.Counted != UnitVerdict.Go))
        {
            Assert.Contains(lines, l => l.Length > 1 && l[0] == RejectedLot && l[1] == unit.Serial);
        }
        Assert.Equal(units.Count, content.Envelope.TraceCount);
        Assert.Equal(3, content.ExampleSweeps.Count);
    }

    [Fact]
    public async Task The_part_yield_report_over_a_period_sums_its_lots()
    {
        List<StoredUnit> all = [.. await UnitsAsync(RejectedLot), .. await UnitsAsync(AcceptedLot)];
        var from = new DateOnly(2026, 11, 1);
        var to = new DateOnly(2026, 11, 30);
        YieldReportContent content = await _store.Source.PartYieldAsync(ReportStore.PartNumber, from, to, "J. Lindqvist");
        byte[] pdf = Pdf(s => new YieldReportDocument(TestFonts.Default).Render(content, PaperSize.A4, s));
        File.WriteAllBytes(Path.Combine(Artefacts.Folder, "stored-part-yield-report-a4.pdf"), pdf);
        IReadOnlyList<string[]> lines = PdfText.Lines(pdf);
        AssertYield(lines, "First-pass yield", (double)all.Count(u => u.First == UnitVerdict.Go) / all.Count);
        AssertYield(lines, "Final yield", (double)all.Count(u => u.Counted == UnitVerdict.Go) / all.Count);
        foreach (string lot in new[] { RejectedLot, AcceptedLot })
        {
            var mine = all.Where(u => u.Lot == lot).ToList();
            string[] row = Assert.Single(lines, l => l.Length > 8 && l[0] == lot && l.Contains("Veltrane"));
            var numbers = Numbers.Tokens(row).Select(n => n.Number).ToArray();
            // Tested, first-pass go, final go, then the two yields in percent.
            Assert.Equal(mine.Count.ToString(CultureInfo.InvariantCulture), numbers[0]);
            Assert.Equal(mine.Count(u => u.First == UnitVerdict.Go).ToString(CultureInfo.InvariantCulture), numbers[1]);
            Assert.Equal(mine.Count(u => u.Counted == UnitVerdict.Go).ToString(CultureInfo.InvariantCulture), numbers[2]);
        }
        Assert.True(PdfText.Pages(pdf).Count > 1, "a yield report with histograms and a unit list spans pages");
    }

    [Theory]
    [InlineData(2026, 12, 1, 2026, 12, 31, "no lot")]
    [InlineData(2026, 11, 30, 2026, 11, 1, "before it starts")]
    public async Task A_period_without_lots_or_reversed_is_refused(int y0, int m0, int d0, int y1, int m1, int d1, string phrase)
    {
        var error = await Assert.ThrowsAsync<ReportRefusedException>(() =>
            _store.Source.PartYieldAsync(ReportStore.PartNumber, new DateOnly(y0, m0, d0), new DateOnly(y1, m1, d1), "J. Lindqvist"));
        Assert.Contains(phrase, error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_unit_report_prints_each_stored_rule_value_limit_and_margin()
    {
        StoredUnit unit = (await UnitsAsync(RejectedLot)).First(u => u.Counted != UnitVerdict.Go);
        UnitReportContent content = await _store.Source.UnitAsync(unit.CountedId, "R. Haldane");
        byte[] pdf = Pdf(s => new UnitReportDocument(TestFonts.Default).Render(content, PaperSize.A4, s));
        File.WriteAllBytes(Path.Combine(Artefacts.Folder, "stored-unit-report-a4.pdf"), pdf);
        Assert.Single(PdfText.Pages(pdf));
        IReadOnlyList<string[]> lines = PdfText.Lines(pdf);
        int checkedRules = 0;
        foreach (RuleResultRecord rule in await RulesAsync(unit.CountedId))
        {
            string[] line = Assert.Single(lines, l => l.Length > 0 && l[0] == rule.RuleId);
            if (rule.MeasuredValue is not { } measured || rule.LimitValue is not { } limit || rule.Margin is not { } margin)
            {
                continue;
            }
            var numbers = Numbers.Tokens(line).ToArray();
            var last = numbers[^3..];
            double?[] expected = [measured, limit, margin];
            for (int i = 0; i < 3; i++)
            {
                // The printed unit is the word after the number (SI prefix table), or none for a ratio.
                double siPer = last[i].Unit is { } u && u != "≤" && u != "≥" && u.Any(char.IsLetter) && u != "pass" && u != "fail" && u != "conditional" && u != "not"
                    ? SiUnits.SiPer(u) : 1;
                Numbers.Equal(expected[i]!.Value / siPer, last[i].Number, $"{rule.RuleId} column {i}");
            }
            checkedRules++;
        }
        Assert.True(checkedRules >= 3, $"only {checkedRules} rules had a value, limit and margin to check");
        Assert.Contains(unit.Serial, PdfText.All(pdf), StringComparison.Ordinal);
        await Assert.ThrowsAsync<RecordNotFoundException>(() => _store.Source.UnitAsync(987654321, "R. Haldane"));
    }

    private static void AssertYield(IReadOnlyList<string[]> lines, string label, double expectedFraction)
    {
        string[] labelWords = label.Split(' ');
        string[] line = lines.First(l => Enumerable.Range(0, l.Length - labelWords.Length + 1).Any(i => l.Skip(i).Take(labelWords.Length).SequenceEqual(labelWords)));
        int at = Enumerable.Range(0, line.Length).First(i => line.Skip(i).Take(labelWords.Length).SequenceEqual(labelWords)) + labelWords.Length;
        Assert.Equal("%", line[at + 1]);
        // Printed as a percentage with two decimals: within 0.005 percentage points.
        Numbers.Equal(100 * expectedFraction, line[at], label);
    }
}
