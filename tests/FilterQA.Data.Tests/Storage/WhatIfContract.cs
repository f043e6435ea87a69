using FilterQA.Core.Decisions;
using FilterQA.Core.Formats;
using FilterQA.Core.Statistics;
using FilterQA.Core.Synthesis;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;
using FilterQA.Data.Entities;
using FilterQA.Data.Services;
using FilterQA.Data.Tests.Infrastructure;
using Microsoft.EntityFrameworkCore;
using TemplateBand = FilterQA.Core.Templates.FrequencyBand;

namespace FilterQA.Data.Tests.Storage;

/// <summary>
/// What-if re-evaluation of stored lots. The expected flips are worked out here from each unit's stored measured value
/// and the draft's limit under the decision rule (ILAC-G8:09/2019 guarded acceptance: a pass needs a margin of at
/// least the rule's uncertainty), not from the what-if itself.
/// </summary>
public abstract class WhatIfContract : ProviderTestBase
{
    private const int Units = 12;

    // The shipped TME-CF455-15 loss rule: "maximum: 6 dB", "uncertainty: 0.3 dB", guarded acceptance.
    private const double LossUncertaintyDb = 0.3;

    [StorageFact]
    public async Task A_tightened_loss_limit_flips_exactly_the_go_units_whose_stored_loss_no_longer_passes()
    {
        PreparedLot lot = await StoreLotAsync();
        IReadOnlyList<(string Serial, UnitVerdict Verdict, double? LossDb)> units = await CountedLossesAsync(lot);

        // Put the guarded pass threshold (limit − uncertainty) in the widest gap between two neighbouring stored losses
        // of the go units, so no unit sits within float32 precision of it (the what-if reads float32 traces).
        double[] goLosses = units.Where(u => u.Verdict == UnitVerdict.Go).Select(u => u.LossDb!.Value).Order().ToArray();
        Assert.True(goLosses.Length >= 4, "the demo lot should give several go units");
        int widest = Enumerable.Range(1, goLosses.Length - 3).MaxBy(i => goLosses[i + 1] - goLosses[i]);
        Assert.True(goLosses[widest + 1] - goLosses[widest] > 1e-3, "two stored losses 1 mdB apart leave no room for a clear threshold");
        double thresholdDb = (goLosses[widest] + goLosses[widest + 1]) / 2;
        double newLimitDb = thresholdDb + LossUncertaintyDb;

        // Tightening one rule: a go unit above the threshold becomes no-go; a not-verifiable one above it becomes no-go
        // (a verifiable failing rule decides); a no-go unit stays no-go; everything else keeps its verdict.
        var expected = units.Where(u => u.LossDb is { } loss && loss > thresholdDb && u.Verdict != UnitVerdict.NoGo)
            .Select(u => u.Serial).Order(StringComparer.Ordinal).ToArray();
        Assert.NotEmpty(expected);

        WhatIfReport report = await Store.WhatIf.ReevaluateAsync(lot.PartNumber, WithLossLimit(lot.Template, newLimitDb));

        Assert.Equal(expected, report.Flips.Where(f => f.IsCounted).Select(f => f.Serial).ToArray());
        foreach (WhatIfFlip flip in report.Flips)
        {
            Assert.Equal(UnitVerdict.NoGo, flip.WhatIfVerdict);
            RuleResult loss = Assert.Single(flip.DecidingRules, r => r.RuleId == "loss");
            Assert.Equal(newLimitDb, loss.LimitValue);
        }
        WhatIfLot judged = Assert.Single(report.Lots);
        int recordedGo = units.Count(u => u.Verdict == UnitVerdict.Go);
        int flippedFromGo = units.Count(u => u.Verdict == UnitVerdict.Go && expected.Contains(u.Serial));
        Assert.Equal((Units, recordedGo, recordedGo - flippedFromGo), (judged.UnitsTested, judged.RecordedGo, judged.WhatIfGo));
        // Yields are exact ratios of small counts.
        Assert.Equal((double)(recordedGo - flippedFromGo) / Units, judged.WhatIfYield);
        Assert.Equal(Units, report.MeasurementsEvaluated);
        Assert.Equal(0, report.FromOriginalFiles);
        Assert.Null(report.WhyOriginalFiles);
    }

    [StorageFact]
    public async Task The_released_revision_as_a_draft_reproduces_the_recorded_yield()
    {
        PreparedLot lot = await StoreLotAsync();
        LotSummary summary = await Store.Lots.GetSummaryAsync(lot.LotNumber);
        LotStatistics statistics = await Store.Lots.GetStatisticsAsync(lot.LotNumber);

        WhatIfReport report = await Store.WhatIf.ReevaluateAsync(lot.PartNumber, AsDraft(lot.Template, lot.Template.Rules));

        Assert.Empty(report.Flips);
        WhatIfLot judged = Assert.Single(report.Lots);
        Assert.Equal((summary.Go, summary.Go, summary.FirstPassGo, summary.FirstPassGo), (judged.RecordedGo, judged.WhatIfGo, judged.RecordedFirstPassGo, judged.WhatIfFirstPassGo));
        Assert.Equal(statistics.Yield.FinalYield, judged.WhatIfYield);
        Assert.Equal(statistics.Yield.FirstPassYield, judged.WhatIfFirstPassYield);
    }

    [StorageFact]
    public async Task Progress_reaches_the_total_which_counts_a_retested_units_first_and_counted_measurements()
    {
        PreparedLot lot = await StoreLotAsync(new RetestPolicy(1));
        Store.Clock.Advance(TimeSpan.FromMinutes(5));
        await Store.Intake.SubmitAsync(DemoFiles.Submission(lot, UnitSynthesiser.Serial(1), DemoFiles.NetworkUnit(1)) with { RetestReason = "reseated" });
        var reports = new List<WhatIfProgress>();

        WhatIfReport report = await Store.WhatIf.ReevaluateAsync(lot.PartNumber, AsDraft(lot.Template, lot.Template.Rules),
            new SynchronousProgress(reports.Add), new WhatIfOptions { PageSize = 5, ProgressInterval = 1 });

        // 12 first measurements and the retest, which counts under a policy of one retest: 13.
        Assert.Equal(Units + 1, report.MeasurementsEvaluated);
        Assert.Equal(new WhatIfProgress(Units + 1, Units + 1), reports[^1]);
        Assert.All(reports, r => Assert.Equal(Units + 1, r.Total));
        Assert.Equal(Enumerable.Range(1, Units + 1), reports.Take(Units + 1).Select(r => r.Evaluated).Order());
    }

    [StorageFact]
    public async Task Cancelling_stops_the_run_early()
    {
        PreparedLot lot = await StoreLotAsync();
        using var cancel = new CancellationTokenSource();
        int seen = 0;
        var progress = new SynchronousProgress(p =>
        {
            seen = Math.Max(seen, p.Evaluated);
            if (p.Evaluated >= 3)
            {
                cancel.Cancel();
            }
        });

        await Assert.ThrowsAnyAsync<OperationCanceledException>(() => Store.WhatIf.ReevaluateAsync(lot.PartNumber, AsDraft(lot.Template, lot.Template.Rules),
            progress, new WhatIfOptions { PageSize = 2, MaxDegreeOfParallelism = 1, ProgressInterval = 1 }, cancel.Token));
        Assert.True(seen < Units, $"{seen} of {Units} were judged after cancelling at 3");
    }

    [StorageFact]
    public async Task A_return_loss_rule_is_judged_from_the_original_files_and_agrees_with_judging_them_directly()
    {
        PreparedLot lot = await StoreLotAsync();
        // 10 dB at port 1 over ±5 kHz: a rule the compact trace (transmission only) cannot judge.
        var returnLoss = new ReturnLossRule("s11", "Return loss at least 10 dB within ±5 kHz", new TemplateBand(FrequencyAnchor.NominalOffset, -5e3, 5e3), 10, 1, 0.5);
        SweepRequirements sweep = lot.Template.Sweep;
        LimitTemplate draft = LimitTemplate.Create(lot.PartNumber, 2, lot.Template.Description, lot.Template.Device, lot.Template.NominalHz, TemplateStatus.Draft,
            lot.Template.Author, null, new SweepRequirements(sweep.SpanStartHz, sweep.SpanStopHz, sweep.NarrowestFeatureHz, sweep.PointsPerFeature,
                sweep.MaximumThruAgeS, sweep.NeedsPhase, needsS11: true, sweep.NeedsS22), lot.Template.DecisionRule, [.. lot.Template.Rules, returnLoss]);

        WhatIfReport report = await Store.WhatIf.ReevaluateAsync(lot.PartNumber, draft);

        var expected = new List<string>();
        await using (FilterQaDbContext context = Store.NewContext())
        {
            var measurements = await context.Measurements.Where(m => m.LotId == lot.Lot.Id).Select(m => new { m.Id, m.Verdict, m.Unit!.Serial, m.Sweep.FileName }).ToListAsync();
            foreach (var m in measurements)
            {
                byte[] raw = await Store.Measurements.ReadSweepBytesAsync(m.Id);
                UnitEvaluation direct = TemplateEvaluator.Evaluate(draft, MeasurementInput.FromSweep(SweepFileReader.Read(raw, m.FileName)));
                if (direct.Verdict != m.Verdict)
                {
                    expected.Add(m.Serial);
                }
            }
        }
        Assert.Equal(expected.Order(StringComparer.Ordinal), report.Flips.Select(f => f.Serial));
        Assert.Equal((Units, Units), (report.MeasurementsEvaluated, report.FromOriginalFiles));
        Assert.Contains("s11", report.WhyOriginalFiles, StringComparison.Ordinal);
    }

    [StorageFact]
    public async Task The_what_if_stores_nothing()
    {
        PreparedLot lot = await StoreLotAsync();
        int before = await CountRowsAsync();

        await Store.WhatIf.ReevaluateAsync(lot.PartNumber, WithLossLimit(lot.Template, 4.0));

        Assert.Equal(before, await CountRowsAsync());
    }

    /// <summary>A lot of 12 demo units of the 455 kHz filter stored through the intake: 10 good, one high-loss, one low-rejection.</summary>
    [StorageFact]
    public async Task A_flipped_units_chart_has_its_stored_trace_and_the_limit_lines_of_both_revisions()
    {
        PreparedLot lot = await StoreLotAsync();
        // Raising the relative rejection minimum by 10 dB moves that rule's limit line 10 dB deeper on the same unit:
        // both lines sit at "least loss + minimum" (the template's relative reference), so they differ by exactly 10 dB.
        LimitTemplate draft = AsDraft(lot.Template, lot.Template.Rules.Select(r => r is StopbandRejectionRule { Id: "reject-low" } s
            ? new StopbandRejectionRule(s.Id, s.Title, s.Band, s.MinimumDb + 10, s.Reference, s.Uncertainty)
            : r).ToArray());
        long measurementId;
        await using (FilterQaDbContext context = Store.NewContext())
        {
            measurementId = await context.Units.Where(u => u.LotId == lot.Lot.Id && u.Serial == UnitSynthesiser.Serial(3))
                .Select(u => u.CountedMeasurementId!.Value).SingleAsync();
        }
        var reader = new WhatIfUnitReader(Store.Contexts, Store.Catalog);

        WhatIfUnitView unit = await reader.ReadAsync(measurementId, draft);

        Assert.Equal((lot.LotNumber, UnitSynthesiser.Serial(3), 1, 1), (unit.LotNumber, unit.Serial, unit.Attempt, unit.RecordedRevision));
        Assert.Null(unit.Note);
        MaskLine recorded = Assert.Single(unit.RecordedMaskLines, l => l.RuleId == "reject-low");
        MaskLine tried = Assert.Single(unit.DraftMaskLines, l => l.RuleId == "reject-low");
        Assert.Equal(recorded.FrequenciesHz.ToArray(), tried.FrequenciesHz.ToArray());
        for (int i = 0; i < recorded.LossDb.Length; i++)
        {
            // 1e-9 dB: the same least loss plus two minimums; rounding only.
            Assert.Equal(recorded.LossDb[i] + 10, tried.LossDb[i], 1e-9);
        }
        Assert.Equal(unit.RecordedMaskLines.Count, unit.DraftMaskLines.Count);
        Assert.True(unit.Trace.Grid.Count > 100);

        await Assert.ThrowsAsync<RecordNotFoundException>(() => reader.ReadAsync(long.MaxValue, draft));
        var other = LimitTemplate.Create("TME-OTHER-1", 1, draft.Description, draft.Device, draft.NominalHz, TemplateStatus.Draft, null, null,
            draft.Sweep, draft.DecisionRule, draft.Rules);
        var e = await Assert.ThrowsAsync<ArgumentException>(() => reader.ReadAsync(measurementId, other));
        Assert.Contains("of part " + lot.PartNumber, e.Message, StringComparison.Ordinal);
    }

    private async Task<PreparedLot> StoreLotAsync(RetestPolicy? retests = null)
    {
        PreparedLot lot = await Store.PrepareLotAsync(PlanRequest.FullInspection(), quantity: Units, retests: retests);
        for (int i = 1; i <= Units; i++)
        {
            DefectKind defect = i switch { 4 => DefectKind.HighLoss, 9 => DefectKind.LowRejection, _ => DefectKind.None };
            await Store.Intake.SubmitAsync(DemoFiles.Submission(lot, UnitSynthesiser.Serial(i), DemoFiles.NetworkUnit(i, defect)));
        }
        return lot;
    }

    private async Task<IReadOnlyList<(string Serial, UnitVerdict Verdict, double? LossDb)>> CountedLossesAsync(PreparedLot lot)
    {
        await using FilterQaDbContext context = Store.NewContext();
        var rows = await context.Units.Where(u => u.LotId == lot.Lot.Id)
            .Join(context.RuleResults.Where(r => r.RuleId == "loss"), u => u.CountedMeasurementId, r => (long?)r.MeasurementId,
                (u, r) => new { u.Serial, u.CountedVerdict, r.MeasuredValue })
            .ToListAsync();
        return rows.Select(r => (r.Serial, r.CountedVerdict, r.MeasuredValue)).ToArray();
    }

    private async Task<int> CountRowsAsync()
    {
        await using FilterQaDbContext context = Store.NewContext();
        return await context.Measurements.CountAsync() + await context.RuleResults.CountAsync() + await context.Units.CountAsync()
            + await context.AuditEntries.CountAsync() + await context.TemplateRevisions.CountAsync();
    }

    private static LimitTemplate WithLossLimit(LimitTemplate template, double maximumDb) => AsDraft(template,
        template.Rules.Select(r => r is InsertionLossRule loss
            ? new InsertionLossRule(loss.Id, loss.Title, maximumDb, loss.Measure, loss.At, loss.Uncertainty)
            : r).ToArray());

    private static LimitTemplate AsDraft(LimitTemplate template, IReadOnlyList<LimitRule> rules) =>
        LimitTemplate.Create(template.PartNumber, template.Revision + 1, template.Description, template.Device, template.NominalHz, TemplateStatus.Draft,
            template.Author, null, template.Sweep, template.DecisionRule, rules);

    /// <summary>Calls back on the reporting thread (<see cref="Progress{T}"/> would post to the thread pool, after the run).</summary>
    private sealed class SynchronousProgress(Action<WhatIfProgress> report) : IProgress<WhatIfProgress>
    {
        public void Report(WhatIfProgress value) => report(value);
    }
}
