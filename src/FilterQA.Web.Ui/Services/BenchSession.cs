using System.Security.Cryptography;
using FilterQA.Core.Formats;
using FilterQA.Core.Templates;
using FilterQA.Data;
using FilterQA.Data.Services;

namespace FilterQA.Web.Ui.Services;

/// <summary>
/// The bench's state for one operator's session: the open lot and what became of each sweep offered.
/// Every sweep goes through <see cref="SweepIntake.SubmitAsync"/>; this class only chooses serials, turns the
/// intake's refusals into plain words, and stops a drop at the first refusal (an expired thru refuses them all).
/// </summary>
public sealed class BenchSession(SweepIntake intake, LotService lots, TemplateCatalog templates, StationRegistry stations, PartDirectory parts,
    MeasurementStore store, TimeProvider clock)
{
    /// <summary>The lot being tested; null until one is opened.</summary>
    public LotSummary? Lot { get; private set; }

    /// <summary>The part's retest policy for the open lot.</summary>
    public RetestRule? Retest { get; private set; }

    /// <summary>Why the last attempt to open a lot failed; null when it succeeded.</summary>
    public string? LotProblem { get; private set; }

    /// <summary>Why testing is blocked (no or expired thru), from the last refusal; cleared by the next stored unit.</summary>
    public string? Blocked { get; private set; }

    /// <summary>The outcomes of the last drop, in file order.</summary>
    public IReadOnlyList<BenchOutcome> LastOutcomes { get; private set; } = [];

    /// <summary>Opens a lot by its number (as typed or scanned; surrounding spaces ignored).</summary>
    public async Task<bool> OpenLotAsync(string? lotNumber, CancellationToken cancellationToken = default)
    {
        string wanted = (lotNumber ?? "").Trim();
        LastOutcomes = [];
        Blocked = null;
        if (wanted.Length == 0)
        {
            (Lot, Retest, LotProblem) = (null, null, "Scan or type a lot number.");
            return false;
        }
        try
        {
            LotSummary lot = await lots.GetSummaryAsync(wanted, cancellationToken).ConfigureAwait(false);
            (Lot, Retest, LotProblem) = (lot, await parts.RetestRuleAsync(lot.PartNumber, cancellationToken).ConfigureAwait(false), null);
            return true;
        }
        catch (RecordNotFoundException e)
        {
            (Lot, Retest, LotProblem) = (null, null, $"No such lot: {e.Message}.");
            return false;
        }
    }

    /// <summary>Lifts the block once the station's thru is current again (the next sweep is still checked by the intake).</summary>
    public void ClearBlockWhenCurrent(ThruStatus? status)
    {
        if (status?.IsCurrent == true)
        {
            Blocked = null;
        }
    }

    /// <summary>The station's latest thru against the open lot's template (null when no lot is open).</summary>
    public async Task<ThruStatus?> ThruStatusAsync(string station, CancellationToken cancellationToken = default)
    {
        if (Lot is null || string.IsNullOrWhiteSpace(station))
        {
            return null;
        }
        LimitTemplate template = await templates.LoadAsync(Lot.PartNumber, Lot.TemplateRevision, cancellationToken).ConfigureAwait(false);
        ThruInfo? thru = await stations.LatestThruAsync(station, cancellationToken).ConfigureAwait(false);
        double? ageS = thru is null ? null : (clock.GetUtcNow() - thru.MeasuredAt).TotalSeconds;
        return new ThruStatus(station, thru, ageS, template.Sweep.MaximumThruAgeS);
    }

    /// <summary>
    /// Offers each file to the intake for the open lot. With one file the unit is <paramref name="typedSerial"/>;
    /// with several, each file's serial comes from its name (<see cref="SerialFromFileName"/>). The first refusal
    /// (no or expired thru) stops the drop: the files after it are skipped. <paramref name="progress"/> hears the
    /// number of files done.
    /// </summary>
    public async Task<IReadOnlyList<BenchOutcome>> SubmitAsync(IReadOnlyList<SweepFile> files, string? typedSerial, string station, Actor actor,
        string? retestReason = null, IProgress<int>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(files);
        ArgumentNullException.ThrowIfNull(actor);
        if (Lot is not { } lot)
        {
            throw new InvalidOperationException("open a lot before offering sweeps");
        }
        var outcomes = new List<BenchOutcome>(files.Count);
        bool refused = false;
        for (int i = 0; i < files.Count; i++)
        {
            SweepFile file = files[i];
            string? serial = files.Count == 1 ? (typedSerial ?? "").Trim() : SerialFromFileName.Extract(file.FileName);
            if (refused)
            {
                outcomes.Add(new BenchOutcome(file.FileName, serial, BenchOutcomeKind.Skipped, "Not offered: testing is blocked (see above)."));
            }
            else if (string.IsNullOrEmpty(serial))
            {
                outcomes.Add(new BenchOutcome(file.FileName, null, BenchOutcomeKind.NotTaken, files.Count == 1
                    ? "Scan or type the unit's serial before giving its sweep."
                    : $"The file name {file.FileName} carries no serial; name files like S0001.s2p or PART_S0001.s2p."));
            }
            else if (string.IsNullOrWhiteSpace(station))
            {
                outcomes.Add(new BenchOutcome(file.FileName, serial, BenchOutcomeKind.NotTaken, "Choose the station this bench measures with."));
            }
            else
            {
                BenchOutcome outcome = await OfferAsync(lot.LotNumber, file, serial, station, actor, retestReason, cancellationToken).ConfigureAwait(false);
                refused = outcome.Kind == BenchOutcomeKind.Refused;
                outcomes.Add(outcome);
            }
            progress?.Report(i + 1);
        }
        LastOutcomes = outcomes;
        return outcomes;
    }

    private async Task<BenchOutcome> OfferAsync(string lotNumber, SweepFile file, string serial, string station, Actor actor, string? retestReason,
        CancellationToken cancellationToken)
    {
        var submission = new SweepSubmission(lotNumber, serial, station, actor, file.Bytes, file.FileName)
        {
            // The same file dropped twice for the same unit is stored once; a new measurement has new bytes.
            IdempotencyKey = IdempotencyKey(lotNumber, serial, file.Bytes.Span),
            RetestReason = string.IsNullOrWhiteSpace(retestReason) ? null : retestReason.Trim(),
        };
        try
        {
            IntakeResult result = await intake.SubmitAsync(submission, cancellationToken).ConfigureAwait(false);
            Lot = result.Stored.Lot;
            Blocked = null;
            StoredMeasurement stored = result.Stored;
            string message = stored.WasAlreadyStored
                ? "This file was already stored for this unit; nothing new was written."
                : stored.Attempt == 1
                    ? "First measurement of this unit; it counts for the lot."
                    : stored.CountsForLot
                        ? $"Measurement {stored.Attempt} of this unit; it replaces the earlier one for the lot."
                        : $"Measurement {stored.Attempt} of this unit is recorded for information; the retest policy does not let it decide the unit.";
            return new BenchOutcome(file.FileName, serial, BenchOutcomeKind.Judged, message)
            {
                Result = result,
                Trace = await store.ReadTraceAsync(stored.MeasurementId, cancellationToken).ConfigureAwait(false),
                MayMeasureAgain = Retest?.AllowsAnotherAfter(stored.Attempt) == true,
            };
        }
        catch (IntakeRefusedException e)
        {
            Blocked = Words.Sentence(e.Message);
            return new BenchOutcome(file.FileName, serial, BenchOutcomeKind.Refused, Blocked);
        }
        catch (SweepReadException e)
        {
            return new BenchOutcome(file.FileName, serial, BenchOutcomeKind.Unreadable, e.Message) { Line = e.Line, Column = e.Column };
        }
        catch (Exception e) when (e is RecordNotFoundException or StorageRuleException)
        {
            return new BenchOutcome(file.FileName, serial, BenchOutcomeKind.NotTaken, Words.Sentence(e.Message));
        }
    }

    private static string IdempotencyKey(string lotNumber, string serial, ReadOnlySpan<byte> bytes)
    {
        using var hash = IncrementalHash.CreateHash(HashAlgorithmName.SHA256);
        hash.AppendData(System.Text.Encoding.UTF8.GetBytes(lotNumber + "\n" + serial + "\n"));
        hash.AppendData(bytes);
        return "bench:" + Convert.ToHexStringLower(hash.GetHashAndReset());
    }
}
