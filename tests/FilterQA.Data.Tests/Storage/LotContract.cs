using FilterQA.Core.Decisions;
using FilterQA.Core.Sampling;
using FilterQA.Core.Statistics;
using FilterQA.Data.Entities;
using FilterQA.Data.Services;
using FilterQA.Data.Tests.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Tests.Storage;

/// <summary>Lots: the stored plan and delivery, the running summary, statistics, disposition, switching, thrus and the audit trail.</summary>
public abstract class LotContract : ProviderTestBase
{
    [StorageFact]
    public async Task A_lot_keeps_every_delivery_and_plan_field()
    {
        PreparedLot prepared = await Store.PrepareLotAsync(PlanRequest.Mil105E(InspectionLevel.II, 0.65), quantity: 500);
        LotSummary lot = await Store.Lots.GetSummaryAsync(prepared.LotNumber);

        Assert.Equal((prepared.PartNumber, 1, prepared.Template.ContentHash), (lot.PartNumber, lot.TemplateRevision, lot.TemplateHash));
        Assert.Equal((Samples.Supplier, "VPZ-88412", "2544", 500, "PO-7731", "Brackwater Shipyards"),
            (lot.Supplier, lot.SupplierLot, lot.DateCode, lot.QuantityReceived, lot.PurchaseOrder, lot.Customer));
        // MIL-STD-105E Table I: 281 to 500 units at general level II is code letter H; Table II-A
        // (normal): at AQL 0.65 row H carries an arrow down to row J, n = 80, Ac = 1, Re = 2 (from memory).
        Assert.Equal((SamplingPlanKind.Mil105ESingle, 500, 80, 1, 2), (lot.Plan.Kind, lot.Plan.LotSize, lot.Plan.SampleSize, lot.Plan.AcceptanceNumber, lot.Plan.RejectionNumber));
        Assert.Equal((InspectionLevel.II, InspectionSeverity.Normal, 0.65, CodeLetter.H, CodeLetter.J),
            (lot.Plan.Level, lot.Plan.Severity, lot.Plan.AqlPercent, lot.Plan.TableLetter, lot.Plan.LetterUsed));
        Assert.Equal(SamplingPlanner.Mil105E(500, InspectionLevel.II, InspectionSeverity.Normal, 0.65), await Store.Lots.GetPlanAsync(prepared.LotNumber));
        Assert.StartsWith("switching rules:", lot.SeverityReason, StringComparison.Ordinal);
        Assert.Equal((LotStatus.Open, LotDecision.Pending, Store.Clock.GetUtcNow(), Samples.Engineer.Name), (lot.Status, lot.Decision, lot.CreatedAt, lot.CreatedBy));
        await Assert.ThrowsAsync<StorageRuleException>(() => Store.Lots.CreateLotAsync(
            new NewLot(prepared.LotNumber, prepared.PartNumber, null, Samples.Supplier, 10, PlanRequest.FullInspection()), Samples.Engineer));
    }

    [StorageFact]
    public async Task The_summary_and_statistics_follow_the_stored_units_under_the_retest_policy()
    {
        PreparedLot prepared = await Store.PrepareLotAsync(PlanRequest.FullInspection(), quantity: 6, retests: new RetestPolicy(1), retestCounts: true);
        // Per unit, its attempts in order: verdict and failing rule. U6's third attempt is beyond
        // the policy (one retest), so it is stored but does not decide the unit.
        (string Serial, UnitVerdict Verdict, string? Failing)[][] units =
        [
            [("U1", UnitVerdict.Go, null)],
            [("U2", UnitVerdict.NoGo, "loss"), ("U2", UnitVerdict.Go, null)],
            [("U3", UnitVerdict.NoGo, "loss"), ("U3", UnitVerdict.NoGo, "loss")],
            [("U4", UnitVerdict.NotVerifiable, null)],
            [("U5", UnitVerdict.Go, null)],
            [("U6", UnitVerdict.NoGo, "bw-6db"), ("U6", UnitVerdict.NoGo, "bw-6db"), ("U6", UnitVerdict.Go, null)],
        ];
        var lossValues = new List<double>();
        int lossIndex = prepared.Template.Rules.Select(r => r.Id).ToList().IndexOf("loss");
        StoredMeasurement? last = null;
        for (int u = 0; u < units.Length; u++)
        {
            for (int a = 0; a < units[u].Length; a++)
            {
                (string serial, UnitVerdict verdict, string? failing) = units[u][a];
                int seed = 10 * (u + 1) + (a + 1);
                last = await Store.Measurements.StoreAsync(Samples.Measurement(prepared.LotNumber, serial, prepared.Template, verdict, prepared.Station,
                    Store.Clock.GetUtcNow(), seed, failing is null ? [] : [failing]));
                Store.Clock.Advance(TimeSpan.FromMinutes(1));
                bool counted = a == Math.Min(units[u].Length, 2) - 1;
                if (counted)
                {
                    // Samples.Evaluation: a passing rule measures 10 + index + seed/100, a failing one 150.
                    lossValues.Add(failing == "loss" ? 150 : 10 + lossIndex + seed / 100.0);
                }
            }
        }
        Assert.False(last!.CountsForLot);

        // Counted by hand from the table: Go U1 U2 U5; no-go U3 U6; not verifiable U4; first-pass Go U1 U5;
        // retested (within the policy) U2 U3 U6; 10 measurements.
        LotSummary summary = await Store.Lots.GetSummaryAsync(prepared.LotNumber);
        Assert.Equal((6, 3, 2, 1, 3, 2, 3, 10),
            (summary.UnitsTested, summary.Go, summary.NoGo, summary.NotVerifiable, summary.Defectives, summary.FirstPassGo, summary.UnitsRetested, summary.Measurements));
        Assert.Equal(LotDecision.Reject, summary.Decision);

        LotStatistics statistics = await Store.Lots.GetStatisticsAsync(prepared.LotNumber);
        Assert.Equal((6, 2, 3, 3, 1), (statistics.Yield.UnitsTested, statistics.Yield.FirstPassGo, statistics.Yield.FinalGo,
            statistics.Yield.UnitsRetested, statistics.Yield.UnitsBeyondPolicy));
        Assert.Equal(2.0 / 6, statistics.Yield.FirstPassYield, 15);
        Assert.Equal([("bw-6db", 1), ("loss", 1)], statistics.FailingRules.Entries.Select(e => (e.Rule, e.Count)));
        ParameterSummary loss = Assert.Single(statistics.Parameters, p => p.Parameter == "loss");
        Assert.Equal("dB", loss.Unit);
        Assert.Equal(6, loss.Moments.Count);
        // Mean of the six counted values, summed here; 1e-12 allows for summation order.
        Assert.Equal(lossValues.Sum() / lossValues.Count, loss.Moments.Mean, 1e-12);
        Assert.Equal(new SpecLimits(null, 100), loss.Limits);
    }

    [StorageFact]
    public async Task A_trend_follows_one_rule_across_the_lots_of_a_part_in_registration_order()
    {
        PreparedLot first = await Store.PrepareLotAsync(PlanRequest.FullInspection(), quantity: 2);
        Store.Clock.Advance(TimeSpan.FromDays(1));
        LotSummary second = await Store.Lots.CreateLotAsync(
            new NewLot(Samples.UniqueLot(), first.PartNumber, null, Samples.Supplier, 2, PlanRequest.FullInspection()), Samples.Engineer);
        int lossIndex = first.Template.Rules.Select(r => r.Id).ToList().IndexOf("loss");
        var expectedMeans = new List<double>();
        foreach ((string lot, int[] seeds) in new[] { (first.LotNumber, new[] { 1, 2 }), (second.LotNumber, new[] { 30, 50 }) })
        {
            foreach (int seed in seeds)
            {
                await Store.Measurements.StoreAsync(Samples.Measurement(lot, $"T-{seed}", first.Template, UnitVerdict.Go, first.Station,
                    Store.Clock.GetUtcNow(), seed));
            }
            // Samples.Evaluation: a passing rule measures 10 + index + seed/100; the mean is summed here.
            expectedMeans.Add(seeds.Average(seed => 10 + lossIndex + seed / 100.0));
        }

        LotTrend trend = await Store.Lots.GetTrendAsync(first.PartNumber, Samples.Supplier, "loss");

        Assert.Equal([first.LotNumber, second.LotNumber], trend.Points.Select(p => p.LotId));
        // 1e-12 allows for summation order.
        Assert.Equal(expectedMeans[0], trend.Points[0].Mean, 1e-12);
        Assert.Equal(expectedMeans[1], trend.Points[1].Mean, 1e-12);
        Assert.All(trend.Points, p => Assert.Equal((1.0, 1.0), (p.FirstPassYield, p.FinalYield)));
        Assert.Empty((await Store.Lots.GetTrendAsync(first.PartNumber, "Another Supplier", "loss")).Points);
    }

    [StorageFact]
    public async Task The_plan_accepts_a_complete_good_sample_and_an_override_needs_an_approver_and_a_reason()
    {
        PreparedLot prepared = await Store.PrepareLotAsync(PlanRequest.FullInspection(), quantity: 3);
        for (int i = 1; i <= 2; i++)
        {
            await Store.Measurements.StoreAsync(Samples.Measurement(prepared.LotNumber, $"S-{i}", prepared.Template, UnitVerdict.Go, prepared.Station, Store.Clock.GetUtcNow(), i));
        }
        var early = await Assert.ThrowsAsync<StorageRuleException>(() => Store.Lots.DecideAsync(prepared.LotNumber, Samples.Engineer));
        Assert.Contains("2 of 3 tested", early.Message, StringComparison.Ordinal);
        await Store.Measurements.StoreAsync(Samples.Measurement(prepared.LotNumber, "S-3", prepared.Template, UnitVerdict.Go, prepared.Station, Store.Clock.GetUtcNow(), 3));
        Store.Clock.Advance(TimeSpan.FromHours(1));

        LotSummary accepted = await Store.Lots.DecideAsync(prepared.LotNumber, Samples.Engineer);
        Assert.Equal((LotStatus.Accepted, LotDecision.Accept, false), (accepted.Status, accepted.SampleDecision, accepted.DispositionIsOverride));
        Assert.Equal((Store.Clock.GetUtcNow(), Samples.Engineer.Name), (accepted.DispositionAt, accepted.DispositionBy));
        await Assert.ThrowsAsync<StorageRuleException>(() => Store.Measurements.StoreAsync(
            Samples.Measurement(prepared.LotNumber, "S-1", prepared.Template, UnitVerdict.Go, prepared.Station, Store.Clock.GetUtcNow())));

        await Assert.ThrowsAsync<StorageRuleException>(() => Store.Lots.OverrideAsync(prepared.LotNumber, false, "customer complaint", Samples.Engineer));
        await Assert.ThrowsAsync<StorageRuleException>(() => Store.Lots.OverrideAsync(prepared.LotNumber, false, " ", Samples.Approver));
        LotSummary rejected = await Store.Lots.OverrideAsync(prepared.LotNumber, false, "customer complaint 2611-07 on this date code", Samples.Approver);
        Assert.Equal((LotStatus.Rejected, true, "customer complaint 2611-07 on this date code"), (rejected.Status, rejected.DispositionIsOverride, rejected.DispositionReason));

        await using FilterQaDbContext context = Store.NewContext();
        AuditEntry[] trail = await context.AuditEntries.AsNoTracking().Where(a => a.LotId == prepared.Lot.Id).OrderBy(a => a.Id).ToArrayAsync();
        Assert.Equal([AuditAction.LotCreated, AuditAction.LotDispositioned, AuditAction.LotDispositionOverridden], trail.Select(a => a.Action));
        Assert.Equal((Samples.Approver.Id, "customer complaint 2611-07 on this date code"), (trail[2].ActorId, trail[2].Reason));
    }

    [StorageFact]
    public async Task A_zero_acceptance_plan_rejects_at_the_first_defective()
    {
        PreparedLot prepared = await Store.PrepareLotAsync(PlanRequest.ZeroAcceptance(0.2, 0.9), quantity: 40);
        // c = 0 sample size n = ceil(ln(1 − C) / ln(1 − p1)) for LTPD p1 at confidence C
        // (binomial, common practice): ln 0.1 / ln 0.8 = 10.32, so n = 11.
        Assert.Equal((int)Math.Ceiling(Math.Log(0.1) / Math.Log(0.8)), prepared.Lot.Plan.SampleSize);
        await Store.Measurements.StoreAsync(Samples.Measurement(prepared.LotNumber, "S-1", prepared.Template, UnitVerdict.Go, prepared.Station, Store.Clock.GetUtcNow()));
        await Assert.ThrowsAsync<StorageRuleException>(() => Store.Lots.DecideAsync(prepared.LotNumber, Samples.Engineer));
        await Store.Measurements.StoreAsync(Samples.Measurement(prepared.LotNumber, "S-2", prepared.Template, UnitVerdict.NotVerifiable, prepared.Station, Store.Clock.GetUtcNow()));

        LotSummary rejected = await Store.Lots.DecideAsync(prepared.LotNumber, Samples.Engineer);
        Assert.Equal((LotStatus.Rejected, LotDecision.RejectDecided, 1), (rejected.Status, rejected.SampleDecision, rejected.Defectives));
    }

    [StorageFact]
    public async Task Two_rejected_lots_put_the_next_lot_of_the_part_and_supplier_on_tightened_inspection()
    {
        PreparedLot first = await Store.PrepareLotAsync(PlanRequest.Mil105E(InspectionLevel.II, 0.65), quantity: 10);
        Assert.Equal(InspectionSeverity.Normal, first.Lot.Plan.Severity);
        foreach (int round in new[] { 1, 2 })
        {
            string lotNumber = round == 1 ? first.LotNumber : (await Store.Lots.CreateLotAsync(
                new NewLot(Samples.UniqueLot(), first.PartNumber, null, Samples.Supplier, 10, PlanRequest.Mil105E(InspectionLevel.II, 0.65)), Samples.Engineer)).LotNumber;
            await Store.Measurements.StoreAsync(Samples.Measurement(lotNumber, "S-1", first.Template, UnitVerdict.NoGo, first.Station, Store.Clock.GetUtcNow(), 0, "loss"));
            Store.Clock.Advance(TimeSpan.FromDays(1));
            Assert.Equal(LotStatus.Rejected, (await Store.Lots.DecideAsync(lotNumber, Samples.Engineer)).Status);
        }
        LotSummary other = await Store.Lots.CreateLotAsync(
            new NewLot(Samples.UniqueLot(), first.PartNumber, null, "Quorra Quartz", 10, PlanRequest.Mil105E(InspectionLevel.II, 0.65)), Samples.Engineer);
        LotSummary third = await Store.Lots.CreateLotAsync(
            new NewLot(Samples.UniqueLot(), first.PartNumber, null, Samples.Supplier, 10, PlanRequest.Mil105E(InspectionLevel.II, 0.65)), Samples.Engineer);

        // MIL-STD-105E 8.3.1: normal to tightened when 2 of 2 to 5 consecutive lots are rejected (from memory).
        Assert.Equal(InspectionSeverity.Tightened, third.Plan.Severity);
        Assert.Contains("tightened", third.SeverityReason, StringComparison.Ordinal);
        // The history is per supplier: another supplier's lot of the part stays on normal.
        Assert.Equal(InspectionSeverity.Normal, other.Plan.Severity);
    }

    [StorageFact]
    public async Task A_thru_reference_keeps_its_bytes_time_and_flatness_and_belongs_to_its_station()
    {
        PreparedLot prepared = await Store.PrepareLotAsync(PlanRequest.FullInspection());
        SampleSweep older = Samples.Sweep(1, "thru-0800.csv");
        SampleSweep newer = Samples.Sweep(2, "thru-1200.csv");
        DateTimeOffset morning = Store.Clock.GetUtcNow();
        ThruInfo first = await Store.Stations.RecordThruAsync(new ThruInput(prepared.Station, older.Bytes, older.Sweep, older.Response, morning, Samples.Operator));
        ThruInfo second = await Store.Stations.RecordThruAsync(new ThruInput(prepared.Station, newer.Bytes, newer.Sweep, newer.Response, morning.AddHours(4), Samples.Operator));

        // Flatness = peak-to-peak loss over the sweep, computed here from the response.
        double[] loss = older.Response.LossDb.ToArray();
        Assert.Equal(loss.Max() - loss.Min(), first.FlatnessDb, 1e-12);
        Assert.Equal(second.Id, (await Store.Stations.LatestThruAsync(prepared.Station))!.Id);
        Assert.Equal(older.Bytes, await Store.Stations.ReadThruBytesAsync(first.Id));

        StoredMeasurement stored = await Store.Measurements.StoreAsync(
            Samples.Measurement(prepared.LotNumber, "S-1", prepared.Template, UnitVerdict.Go, prepared.Station, morning.AddHours(5)) with { ThruReferenceId = second.Id });
        string otherStation = Samples.UniqueStation();
        await Store.Stations.RegisterStationAsync(otherStation, "second bench", Samples.Engineer);
        await Assert.ThrowsAsync<RecordNotFoundException>(() => Store.Measurements.StoreAsync(
            Samples.Measurement(prepared.LotNumber, "S-2", prepared.Template, UnitVerdict.Go, otherStation, morning.AddHours(5)) with { ThruReferenceId = second.Id }));
        await using FilterQaDbContext context = Store.NewContext();
        Assert.Equal(second.Id, (await context.Measurements.SingleAsync(m => m.Id == stored.MeasurementId)).ThruReferenceId);
    }

    [StorageFact]
    public async Task Lots_are_found_by_part_supplier_status_and_date()
    {
        PreparedLot a = await Store.PrepareLotAsync(PlanRequest.FullInspection(), quantity: 2);
        Store.Clock.Advance(TimeSpan.FromDays(1));
        DateTimeOffset secondDay = Store.Clock.GetUtcNow();
        LotSummary b = await Store.Lots.CreateLotAsync(new NewLot(Samples.UniqueLot(), a.PartNumber, null, "Ostmark Acoustic", 2, PlanRequest.FullInspection()), Samples.Engineer);
        await Store.Lots.HoldAsync(b.LotNumber, "paperwork missing", Samples.Engineer);

        IReadOnlyList<LotSummary> ofPart = await Store.Lots.FindLotsAsync(new LotQuery { PartNumber = a.PartNumber });
        Assert.Equal([b.LotNumber, a.LotNumber], ofPart.Select(l => l.LotNumber));
        Assert.Equal([b.LotNumber], (await Store.Lots.FindLotsAsync(new LotQuery { PartNumber = a.PartNumber, Supplier = "Ostmark Acoustic" })).Select(l => l.LotNumber));
        Assert.Equal([b.LotNumber], (await Store.Lots.FindLotsAsync(new LotQuery { PartNumber = a.PartNumber, Status = LotStatus.Held })).Select(l => l.LotNumber));
        Assert.Equal([a.LotNumber], (await Store.Lots.FindLotsAsync(new LotQuery { PartNumber = a.PartNumber, CreatedTo = secondDay })).Select(l => l.LotNumber));
        Assert.Equal([b.LotNumber], (await Store.Lots.FindLotsAsync(new LotQuery { PartNumber = a.PartNumber, CreatedFrom = secondDay })).Select(l => l.LotNumber));
    }
}
