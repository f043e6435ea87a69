using System.Globalization;
using FilterQA.Core.Decisions;
using FilterQA.Core.Formats;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;

namespace FilterQA.Data.Services;

/// <summary>
/// The one path from a received sweep file to a stored, judged unit: read the file, apply the station's thru,
/// evaluate against the lot's template revision, store the unit with its verdict in one transaction.
/// Used by the bench, the intake API, watched folders and imports alike.
/// </summary>
/// <remarks>
/// The station's latest thru applies to sweeps of its own kind: a power trace (dBm) needs a power-trace thru, a
/// gain trace or network data a gain thru. A network-analyser sweep with no thru of its kind is taken as corrected
/// by the analyser's own calibration; its thru age is then not known, and the evaluation says so. A power trace
/// without a thru, or any sweep whose applicable thru is older than the template allows, is refused before anything
/// is stored: testing waits for a new thru.
/// </remarks>
public sealed class SweepIntake(LotService lots, TemplateCatalog templates, StationRegistry stations, MeasurementStore store, TimeProvider clock)
{
    /// <summary>Reads, normalises, evaluates and stores one sweep.</summary>
    /// <exception cref="SweepReadException">The sweep (or the station's stored thru) cannot be read or used; nothing is stored.</exception>
    /// <exception cref="IntakeRefusedException">No usable thru, or an expired one; nothing is stored.</exception>
    /// <exception cref="RecordNotFoundException">The lot or its template revision does not exist.</exception>
    public async Task<IntakeResult> SubmitAsync(SweepSubmission submission, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(submission);
        LotSummary lot = await lots.GetSummaryAsync(submission.LotNumber, cancellationToken).ConfigureAwait(false);
        LimitTemplate template = await templates.LoadAsync(lot.PartNumber, lot.TemplateRevision, cancellationToken).ConfigureAwait(false);
        Sweep sweep = SweepFileReader.Read(submission.SweepBytes.Span, submission.FileName);

        // One instant for the thru's age, its expiry check and the stored measurement time, so the three agree.
        DateTimeOffset now = clock.GetUtcNow();
        (Sweep? thruSweep, ThruInfo? thru) = await ApplicableThruAsync(sweep, submission.Station, template, now, cancellationToken).ConfigureAwait(false);
        MeasurementInput input = EvaluationInputs.FromSweep(sweep, thruSweep, thru is null ? null : now - thru.MeasuredAt, submission.FileName);
        UnitEvaluation evaluation = TemplateEvaluator.Evaluate(template, input);

        var measurement = new UnitMeasurement(lot.LotNumber, submission.Serial, submission.Station, submission.Operator, now,
            submission.SweepBytes, sweep, input.Primary, evaluation)
        {
            ThruReferenceId = thru?.Id,
            IdempotencyKey = submission.IdempotencyKey,
            RetestReason = submission.RetestReason,
            SamplePosition = submission.SamplePosition,
        };
        StoredMeasurement stored = await store.StoreAsync(measurement, cancellationToken).ConfigureAwait(false);
        return new IntakeResult(stored, evaluation, thru);
    }

    private async Task<(Sweep?, ThruInfo?)> ApplicableThruAsync(Sweep sweep, string station, LimitTemplate template, DateTimeOffset now,
        CancellationToken cancellationToken)
    {
        bool powerTrace = sweep.Scalar?.Quantity == ScalarQuantity.PowerDbm;
        if (sweep.Network is { PortCount: 1 })
        {
            return (null, null); // a reflection measurement has no thru to divide by
        }
        ThruInfo? thru = await stations.LatestThruAsync(station, cancellationToken).ConfigureAwait(false);
        if (thru is null)
        {
            return powerTrace
                ? throw new IntakeRefusedException($"station {station} has no thru reference; record a thru before testing power traces")
                : (null, null);
        }
        Sweep thruSweep = SweepFileReader.Read(await stations.ReadThruBytesAsync(thru.Id, cancellationToken).ConfigureAwait(false), thru.FileName);
        bool thruIsPower = thruSweep.Scalar?.Quantity == ScalarQuantity.PowerDbm;
        if (thruIsPower != powerTrace)
        {
            return powerTrace
                ? throw new IntakeRefusedException($"the latest thru of station {station} is not a power trace; record a power-trace thru before testing power traces")
                : (null, null);
        }
        double ageS = (now - thru.MeasuredAt).TotalSeconds;
        if (ageS < 0)
        {
            // Before this check a thru dated ahead of the server clock reached the evaluation as a negative age and was
            // reported as an unreadable sweep; the sweep is fine, the clocks disagree.
            throw new IntakeRefusedException(string.Create(CultureInfo.InvariantCulture,
                $"the thru of station {station} is dated {thru.MeasuredAt:u}, {-ageS / 60:0.#} min after this server's time {now:u}; check the station's clock and record the thru again"));
        }
        if (ageS > template.Sweep.MaximumThruAgeS)
        {
            throw new IntakeRefusedException(string.Create(CultureInfo.InvariantCulture,
                $"the thru of station {station} was recorded {ageS / 3600:0.0} h ago; {template.PartNumber} allows {template.Sweep.MaximumThruAgeS / 3600:0.0} h. Record a new thru before testing"));
        }
        return (thruSweep, thru);
    }
}
