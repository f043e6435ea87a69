using FilterQA.Core.Decisions;
using FilterQA.Core.Formats;
using FilterQA.Core.Normalisation;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Synthesis;
using FilterQA.Data.Entities;
using FilterQA.Data.Services;
using FilterQA.Data.Tests.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Tests.Storage;

/// <summary>
/// The intake: a received sweep file becomes a stored unit with the verdict the decision engine gives that file, or
/// nothing is stored. The expected verdicts are the engine's own judgement of the same file, made here without the
/// intake, so what is checked is the intake's reading, thru handling and storing.
/// </summary>
public abstract class IntakeContract : ProviderTestBase
{
    // The shipped TME-CF455-15 template allows a thru of at most "max-thru-age: 8 h".
    private static readonly TimeSpan MaximumThruAge = TimeSpan.FromHours(8);

    [StorageFact]
    public async Task A_network_sweep_is_stored_with_the_verdict_the_engine_gives_the_same_file()
    {
        PreparedLot lot = await Store.PrepareLotAsync(PlanRequest.FullInspection());
        foreach ((int index, DefectKind defect) in new[] { (1, DefectKind.None), (2, DefectKind.HighLoss) })
        {
            var file = DemoFiles.NetworkUnit(index, defect);
            IntakeResult result = await Store.Intake.SubmitAsync(DemoFiles.Submission(lot, UnitSynthesiser.Serial(index), file));

            // A calibrated network analyser's sweep is judged as it is: no thru, thru age unknown.
            UnitEvaluation expected = TemplateEvaluator.Evaluate(lot.Template, MeasurementInput.FromSweep(SweepFileReader.Read(file.Bytes, file.FileName)));
            Assert.Equal(expected.Verdict, result.Stored.Verdict);
            Assert.Equal(expected.Verdict, result.Evaluation.Verdict);
            Assert.Null(result.ThruApplied);
            Assert.False(result.Stored.WasAlreadyStored);
            Assert.Equal(file.Bytes, await Store.Measurements.ReadSweepBytesAsync(result.Stored.MeasurementId));

            await using FilterQaDbContext context = Store.NewContext();
            RuleResultRecord[] rules = await context.RuleResults.Where(r => r.MeasurementId == result.Stored.MeasurementId).OrderBy(r => r.Ordinal).ToArrayAsync();
            Assert.Equal(expected.Rules.Select(r => r.RuleId), rules.Select(r => r.RuleId));
            // The same file judged by the same engine: the stored values are those doubles, to the last bit.
            Assert.Equal(expected.Rules.Select(r => r.MeasuredValue), rules.Select(r => r.MeasuredValue));
            Assert.Equal(expected.Rules.Select(r => r.Outcome), rules.Select(r => r.Outcome));
        }
        // The demo's high-loss defect is 8.0 dB against "maximum: 6 dB" with 0.3 dB uncertainty: a plain fail, so no-go.
        LotSummary summary = await Store.Lots.GetSummaryAsync(lot.LotNumber);
        Assert.Equal((2, 1), (summary.UnitsTested, summary.NoGo));
    }

    [StorageFact]
    public async Task An_unreadable_sweep_stores_nothing()
    {
        PreparedLot lot = await Store.PrepareLotAsync(PlanRequest.FullInspection());
        byte[] garbage = "# Hz S RI R 50\nthis line is not a frequency\n"u8.ToArray();

        var problem = await Assert.ThrowsAsync<SweepReadException>(() =>
            Store.Intake.SubmitAsync(new SweepSubmission(lot.LotNumber, "S0001", lot.Station, Samples.Operator, garbage, "S0001.s2p")));
        Assert.Contains("S0001.s2p", problem.Message, StringComparison.Ordinal);
        await AssertNothingStoredAsync(lot);
    }

    [StorageFact]
    public async Task A_power_trace_without_a_thru_is_refused_and_nothing_is_stored()
    {
        PreparedLot lot = await Store.PrepareLotAsync(PlanRequest.FullInspection());

        var problem = await Assert.ThrowsAsync<IntakeRefusedException>(() =>
            Store.Intake.SubmitAsync(DemoFiles.Submission(lot, "S0001", DemoFiles.PowerUnit(1, lot.Station))));
        Assert.Contains(lot.Station, problem.Message, StringComparison.Ordinal);
        await AssertNothingStoredAsync(lot);
    }

    [StorageFact]
    public async Task An_expired_thru_is_refused_and_nothing_is_stored()
    {
        PreparedLot lot = await Store.PrepareLotAsync(PlanRequest.FullInspection());
        // One minute past the template's maximum age.
        await DemoFiles.RecordThruAsync(Store, lot.Station, DemoFiles.PowerThru(lot.Station), Store.Clock.GetUtcNow() - MaximumThruAge - TimeSpan.FromMinutes(1));

        var problem = await Assert.ThrowsAsync<IntakeRefusedException>(() =>
            Store.Intake.SubmitAsync(DemoFiles.Submission(lot, "S0001", DemoFiles.PowerUnit(1, lot.Station))));
        Assert.Contains("8.0 h", problem.Message, StringComparison.Ordinal);
        await AssertNothingStoredAsync(lot);
    }

    [StorageFact]
    public async Task A_thru_dated_after_the_server_clock_is_refused_and_nothing_is_stored()
    {
        PreparedLot lot = await Store.PrepareLotAsync(PlanRequest.FullInspection());
        await DemoFiles.RecordThruAsync(Store, lot.Station, DemoFiles.PowerThru(lot.Station), Store.Clock.GetUtcNow() + TimeSpan.FromMinutes(5));

        var problem = await Assert.ThrowsAsync<IntakeRefusedException>(() =>
            Store.Intake.SubmitAsync(DemoFiles.Submission(lot, "S0001", DemoFiles.PowerUnit(1, lot.Station))));
        Assert.Contains("clock", problem.Message, StringComparison.Ordinal);
        await AssertNothingStoredAsync(lot);
    }

    [StorageFact]
    public async Task A_power_trace_is_normalised_by_the_stations_power_thru()
    {
        PreparedLot lot = await Store.PrepareLotAsync(PlanRequest.FullInspection());
        TimeSpan age = TimeSpan.FromHours(1);
        var thruFile = DemoFiles.PowerThru(lot.Station);
        ThruInfo thru = await DemoFiles.RecordThruAsync(Store, lot.Station, thruFile, Store.Clock.GetUtcNow() - age);
        var unitFile = DemoFiles.PowerUnit(1, lot.Station);

        IntakeResult result = await Store.Intake.SubmitAsync(DemoFiles.Submission(lot, "S0001", unitFile));

        // The engine judging the unit divided by the same thru, with the thru's age at the time of measurement.
        Sweep unit = SweepFileReader.Read(unitFile.Bytes, unitFile.FileName);
        NormalisedResponse normalised = ThruNormaliser.Normalise(unit, SweepFileReader.Read(thruFile.Bytes, thruFile.FileName));
        UnitEvaluation expected = TemplateEvaluator.Evaluate(lot.Template, MeasurementInput.FromSweep(unit, normalised, age));
        Assert.Equal(thru.Id, result.ThruApplied?.Id);
        Assert.Equal(expected.Verdict, result.Stored.Verdict);
        Assert.Equal(expected.Rules.Select(r => r.MeasuredValue), result.Evaluation.Rules.Select(r => r.MeasuredValue));
        Assert.DoesNotContain(result.Evaluation.Warnings, w => w.Contains("thru age is not known", StringComparison.Ordinal));

        await using FilterQaDbContext context = Store.NewContext();
        Assert.Equal(thru.Id, await context.Measurements.Where(m => m.Id == result.Stored.MeasurementId).Select(m => m.ThruReferenceId).SingleAsync());
        // The stored compact trace is the normalised response to float32 precision: relative error at most 2^-24
        // (IEEE 754 round to nearest), so 1e-7 relative plus 1e-9 dB absolute for values near 0 dB.
        ResponseTrace stored = await Store.Measurements.ReadTraceAsync(result.Stored.MeasurementId);
        ReadOnlySpan<double> want = normalised.Response.LossDb, got = stored.LossDb;
        Assert.Equal(want.Length, got.Length);
        for (int i = 0; i < want.Length; i++)
        {
            Assert.True(Math.Abs(want[i] - got[i]) <= 1e-7 * Math.Abs(want[i]) + 1e-9, $"point {i}: {got[i]} stored, {want[i]} normalised");
        }
    }

    [StorageFact]
    public async Task A_network_sweep_ignores_a_power_thru_and_is_taken_as_calibrated()
    {
        PreparedLot lot = await Store.PrepareLotAsync(PlanRequest.FullInspection());
        await DemoFiles.RecordThruAsync(Store, lot.Station, DemoFiles.PowerThru(lot.Station), Store.Clock.GetUtcNow() - TimeSpan.FromHours(1));

        IntakeResult result = await Store.Intake.SubmitAsync(DemoFiles.Submission(lot, "S0001", DemoFiles.NetworkUnit(1)));

        Assert.Null(result.ThruApplied);
        Assert.Contains(result.Evaluation.Warnings, w => w.Contains("thru age is not known", StringComparison.Ordinal));
    }

    [StorageFact]
    public async Task A_retried_submission_with_the_same_idempotency_key_stores_once()
    {
        PreparedLot lot = await Store.PrepareLotAsync(PlanRequest.FullInspection());
        SweepSubmission submission = DemoFiles.Submission(lot, "S0001", DemoFiles.NetworkUnit(1)) with { IdempotencyKey = "bench-7-post-1" };

        IntakeResult first = await Store.Intake.SubmitAsync(submission);
        IntakeResult again = await Store.Intake.SubmitAsync(submission);

        Assert.Equal((false, true), (first.Stored.WasAlreadyStored, again.Stored.WasAlreadyStored));
        Assert.Equal(first.Stored.MeasurementId, again.Stored.MeasurementId);
        LotSummary summary = await Store.Lots.GetSummaryAsync(lot.LotNumber);
        Assert.Equal((1, 1), (summary.UnitsTested, summary.Measurements));
    }

    private async Task AssertNothingStoredAsync(PreparedLot lot)
    {
        await using FilterQaDbContext context = Store.NewContext();
        Assert.Equal(0, await context.Units.CountAsync(u => u.LotId == lot.Lot.Id));
        Assert.Equal(0, await context.Measurements.CountAsync(m => m.LotId == lot.Lot.Id));
        LotSummary summary = await Store.Lots.GetSummaryAsync(lot.LotNumber);
        Assert.Equal((0, 0, LotStatus.Open), (summary.UnitsTested, summary.Measurements, summary.Status));
    }
}
