using System.Security.Cryptography;
using System.Text.RegularExpressions;
using FilterQA.Core.Decisions;
using FilterQA.Core.Sweeps;
using FilterQA.Data.Entities;
using FilterQA.Data.Services;
using FilterQA.Data.Tests.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Tests.Storage;

/// <summary>
/// Storing a unit: all or nothing, exact under parallel writers, once per idempotency key, and the
/// sweep given back byte for byte.
/// </summary>
public abstract partial class WritePathContract : ProviderTestBase
{
    [GeneratedRegex(@"UPDATE ""?lots""? ", RegexOptions.CultureInvariant)]
    private static partial Regex UpdateOfLots();

    [StorageFact]
    public async Task A_failure_in_the_middle_of_storing_a_unit_leaves_no_trace()
    {
        PreparedLot prepared = await Store.PrepareLotAsync(PlanRequest.FullInspection());
        var failure = new FailOnCommandInterceptor(UpdateOfLots());
        MeasurementStore failing = Store.MeasurementsWith(failure);

        // EF reports a failure during SaveChanges as a DbUpdateException around the cause.
        var problem = await Assert.ThrowsAsync<DbUpdateException>(() => failing.StoreAsync(
            Samples.Measurement(prepared.LotNumber, "S-0001", prepared.Template, UnitVerdict.NoGo, prepared.Station, Store.Clock.GetUtcNow(), 0, "loss")
            with { IdempotencyKey = "post-0001" }));
        Assert.IsType<InjectedFailureException>(problem.InnerException);

        // The failure came after the unit, the measurement and its rule results had been sent ...
        Assert.True(failure.Fired);
        Assert.Contains(failure.SentBeforeFailure, sql => sql.Contains("INSERT INTO", StringComparison.Ordinal) && sql.Contains("measurements", StringComparison.Ordinal));
        Assert.Contains(failure.SentBeforeFailure, sql => sql.Contains("INSERT INTO", StringComparison.Ordinal) && sql.Contains("rule_results", StringComparison.Ordinal));
        // ... and none of it is left.
        await using (FilterQaDbContext context = Store.NewContext())
        {
            Assert.Equal(0, await context.Units.CountAsync(u => u.LotId == prepared.Lot.Id));
            Assert.Equal(0, await context.Measurements.CountAsync(m => m.LotId == prepared.Lot.Id));
            Assert.Equal(0, await context.RuleResults.CountAsync(r => context.Measurements.Any(m => m.Id == r.MeasurementId && m.LotId == prepared.Lot.Id)));
        }
        LotSummary summary = await Store.Lots.GetSummaryAsync(prepared.LotNumber);
        Assert.Equal((0, 0, LotStatus.Open), (summary.UnitsTested, summary.Measurements, summary.Status));

        // The same post then stores as the first attempt, as if the failed one never happened.
        StoredMeasurement stored = await Store.Measurements.StoreAsync(
            Samples.Measurement(prepared.LotNumber, "S-0001", prepared.Template, UnitVerdict.NoGo, prepared.Station, Store.Clock.GetUtcNow(), 0, "loss")
            with { IdempotencyKey = "post-0001" });
        Assert.Equal((1, false), (stored.Attempt, stored.WasAlreadyStored));
        Assert.Equal((1, 1, 1), (stored.Lot.UnitsTested, stored.Lot.NoGo, stored.Lot.Measurements));
    }

    [StorageFact]
    public async Task Parallel_writers_on_one_lot_lose_nothing_and_duplicate_nothing()
    {
        const int writers = 4, unitsPerWriter = 10, shared = 5;
        PreparedLot prepared = await Store.PrepareLotAsync(PlanRequest.FullInspection(), quantity: writers * unitsPerWriter + shared);
        DateTimeOffset at = Store.Clock.GetUtcNow();
        static UnitVerdict VerdictOf(int index) => index % 7 == 0 ? UnitVerdict.NoGo : index % 11 == 0 ? UnitVerdict.NotVerifiable : UnitVerdict.Go;

        // Each writer stores its own units; all of them also post the same shared units with the
        // same idempotency keys, as a client retrying through several stations would.
        Task[] tasks = Enumerable.Range(0, writers).Select(w => Task.Run(async () =>
        {
            for (int i = 0; i < unitsPerWriter; i++)
            {
                int index = w * unitsPerWriter + i;
                await Store.Measurements.StoreAsync(Samples.Measurement(prepared.LotNumber, $"W{w}-{i:D2}", prepared.Template, VerdictOf(index),
                    prepared.Station, at, index));
                if (i < shared)
                {
                    int sharedIndex = writers * unitsPerWriter + i;
                    await Store.Measurements.StoreAsync(Samples.Measurement(prepared.LotNumber, $"D-{i}", prepared.Template, VerdictOf(sharedIndex),
                        prepared.Station, at, sharedIndex) with { IdempotencyKey = $"shared-{prepared.LotNumber}-{i}" });
                }
            }
        })).ToArray();
        await Task.WhenAll(tasks);

        int total = writers * unitsPerWriter + shared;
        int[] indices = Enumerable.Range(0, total).ToArray();
        int go = indices.Count(i => VerdictOf(i) == UnitVerdict.Go);
        int noGo = indices.Count(i => VerdictOf(i) == UnitVerdict.NoGo);
        int notVerifiable = indices.Count(i => VerdictOf(i) == UnitVerdict.NotVerifiable);

        LotSummary summary = await Store.Lots.GetSummaryAsync(prepared.LotNumber);
        Assert.Equal((total, go, noGo, notVerifiable, noGo + notVerifiable, go, total),
            (summary.UnitsTested, summary.Go, summary.NoGo, summary.NotVerifiable, summary.Defectives, summary.FirstPassGo, summary.Measurements));
        await using FilterQaDbContext context = Store.NewContext();
        int[] positions = await context.Units.Where(u => u.LotId == prepared.Lot.Id).Select(u => u.SamplePosition).OrderBy(p => p).ToArrayAsync();
        Assert.Equal(Enumerable.Range(1, total), positions);
        Assert.Equal(total, await context.Measurements.CountAsync(m => m.LotId == prepared.Lot.Id && m.Attempt == 1));
        Assert.Equal(total, await context.Measurements.CountAsync(m => m.LotId == prepared.Lot.Id));
        Assert.Equal(total * prepared.Template.Rules.Count,
            await context.RuleResults.CountAsync(r => context.Measurements.Any(m => m.Id == r.MeasurementId && m.LotId == prepared.Lot.Id)));
    }

    [StorageFact]
    public async Task A_retried_post_with_the_same_idempotency_key_stores_once()
    {
        PreparedLot prepared = await Store.PrepareLotAsync(PlanRequest.FullInspection());
        UnitMeasurement post = Samples.Measurement(prepared.LotNumber, "S-0042", prepared.Template, UnitVerdict.Go, prepared.Station, Store.Clock.GetUtcNow())
            with { IdempotencyKey = "station-IQC-1-post-9001" };

        StoredMeasurement first = await Store.Measurements.StoreAsync(post);
        StoredMeasurement again = await Store.Measurements.StoreAsync(post);

        Assert.False(first.WasAlreadyStored);
        Assert.True(again.WasAlreadyStored);
        Assert.Equal(first.MeasurementId, again.MeasurementId);
        Assert.Equal((1, 1), (again.Lot.UnitsTested, again.Lot.Measurements));
        await Assert.ThrowsAsync<StorageRuleException>(() => Store.Measurements.StoreAsync(post with { Serial = "S-0043" }));
        Assert.Equal(1, (await Store.Lots.GetSummaryAsync(prepared.LotNumber)).Measurements);
    }

    [StorageFact]
    public async Task The_sweep_comes_back_byte_exact_and_the_trace_within_float32_precision()
    {
        PreparedLot prepared = await Store.PrepareLotAsync(PlanRequest.FullInspection());
        UnitMeasurement post = Samples.Measurement(prepared.LotNumber, "S-0005", prepared.Template, UnitVerdict.Go, prepared.Station, Store.Clock.GetUtcNow(), 17);
        StoredMeasurement stored = await Store.Measurements.StoreAsync(post);

        byte[] bytes = await Store.Measurements.ReadSweepBytesAsync(stored.MeasurementId);
        Assert.Equal(post.SweepBytes.ToArray(), bytes);
        await using (FilterQaDbContext context = Store.NewContext())
        {
            StoredSweep sweep = await context.Measurements.Where(m => m.Id == stored.MeasurementId).Select(m => m.Sweep).SingleAsync();
            // SHA-256 computed here with the framework's implementation (FIPS 180-4), not the code under test.
            Assert.Equal(Convert.ToHexStringLower(SHA256.HashData(post.SweepBytes.Span)), sweep.RawSha256);
            Assert.Equal(post.SweepBytes.Length, sweep.RawLength);
            Assert.True(sweep.RawCompressed.Length < sweep.RawLength, "the text sweep compresses");
        }

        ResponseTrace trace = await Store.Measurements.ReadTraceAsync(stored.MeasurementId);
        Assert.Equal(post.Response.Grid.Hz.ToArray(), trace.Grid.Hz.ToArray());
        for (int i = 0; i < trace.Grid.Count; i++)
        {
            // float32 rounding to nearest: error at most |x|·2^-24 (IEEE 754 binary32, 24-bit significand).
            double x = post.Response.LossDb[i];
            Assert.True(Math.Abs(trace.LossDb[i] - x) <= Math.Abs(x) * Math.Pow(2, -24), $"loss at {i}: {trace.LossDb[i]} vs {x}");
        }
    }

    [StorageFact]
    public async Task An_evaluation_for_another_template_a_unit_beyond_the_sample_or_a_lot_on_hold_is_refused()
    {
        PreparedLot prepared = await Store.PrepareLotAsync(PlanRequest.FullInspection(), quantity: 2);
        DateTimeOffset at = Store.Clock.GetUtcNow();
        var otherTemplate = Samples.Released(Samples.UniquePart());
        await Assert.ThrowsAsync<StorageRuleException>(() => Store.Measurements.StoreAsync(
            Samples.Measurement(prepared.LotNumber, "S-1", otherTemplate, UnitVerdict.Go, prepared.Station, at)));

        await Store.Lots.HoldAsync(prepared.LotNumber, "supplier notified a mix-up", Samples.Engineer);
        await Assert.ThrowsAsync<StorageRuleException>(() => Store.Measurements.StoreAsync(
            Samples.Measurement(prepared.LotNumber, "S-1", prepared.Template, UnitVerdict.Go, prepared.Station, at)));
        await Store.Lots.ReleaseHoldAsync(prepared.LotNumber, Samples.Engineer);

        await Store.Measurements.StoreAsync(Samples.Measurement(prepared.LotNumber, "S-1", prepared.Template, UnitVerdict.Go, prepared.Station, at));
        await Store.Measurements.StoreAsync(Samples.Measurement(prepared.LotNumber, "S-2", prepared.Template, UnitVerdict.Go, prepared.Station, at));
        await Assert.ThrowsAsync<StorageRuleException>(() => Store.Measurements.StoreAsync(
            Samples.Measurement(prepared.LotNumber, "S-3", prepared.Template, UnitVerdict.Go, prepared.Station, at)));
        await Assert.ThrowsAsync<RecordNotFoundException>(() => Store.Measurements.StoreAsync(
            Samples.Measurement(prepared.LotNumber, "S-1", prepared.Template, UnitVerdict.Go, "IQC-unknown", at)));
        Assert.Equal((2, 2), ((await Store.Lots.GetSummaryAsync(prepared.LotNumber)).UnitsTested, (await Store.Lots.GetSummaryAsync(prepared.LotNumber)).Measurements));
    }

    [StorageFact]
    public async Task A_hold_racing_with_writers_loses_no_count()
    {
        PreparedLot prepared = await Store.PrepareLotAsync(PlanRequest.FullInspection(), quantity: 30);
        DateTimeOffset at = Store.Clock.GetUtcNow();
        int stored = 0;
        Task writer = Task.Run(async () =>
        {
            for (int i = 0; i < 30; i++)
            {
                try
                {
                    await Store.Measurements.StoreAsync(Samples.Measurement(prepared.LotNumber, $"S-{i:D2}", prepared.Template, UnitVerdict.Go, prepared.Station, at, i));
                    Interlocked.Increment(ref stored);
                }
                catch (StorageRuleException)
                {
                    // Refused while the lot is held: nothing stored, nothing counted.
                }
            }
        });
        for (int round = 0; round < 5; round++)
        {
            await Store.Lots.HoldAsync(prepared.LotNumber, "count check", Samples.Engineer);
            await Store.Lots.ReleaseHoldAsync(prepared.LotNumber, Samples.Engineer);
        }
        await writer;

        LotSummary summary = await Store.Lots.GetSummaryAsync(prepared.LotNumber);
        await using FilterQaDbContext context = Store.NewContext();
        int rows = await context.Measurements.CountAsync(m => m.LotId == prepared.Lot.Id);
        Assert.Equal((stored, stored, stored), (summary.Measurements, summary.UnitsTested, rows));
        // On a loaded machine every write can fall inside a hold; the lot is then still untested.
        Assert.Equal(stored > 0 ? LotStatus.InTest : LotStatus.Open, summary.Status);
    }
}
