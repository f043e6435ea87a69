using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using FilterQA.Core.Statistics;
using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Services.Certificates;

/// <summary>
/// Certificates of conformance: an approver signs one for an accepted lot; it is numbered, carries the
/// digest of the lot's stored data (<see cref="LotDataDigest"/>) and is stored once, frozen, with its
/// snapshot. Anyone can verify a number and digest pair.
/// </summary>
public sealed class CertificateService(IDbContextFactory<FilterQaDbContext> contexts, LotService lots, CertificateOptions options, TimeProvider clock)
{
    private const int MaxAttempts = 10;

    /// <summary>
    /// Signs and stores the certificate of <paramref name="lotNumber"/>, or returns the one already issued
    /// when the lot's data still has its digest (nothing is issued twice). The number is the next free one
    /// (unique indexes and a retry make it so across concurrent issuers). Audited.
    /// </summary>
    /// <param name="lotNumber">The lot, which must be accepted.</param>
    /// <param name="reason">Why the approver signs; not empty.</param>
    /// <param name="signer">The signer; must be an approver (<see cref="Actor.IsApprover"/>).</param>
    /// <param name="cancellationToken">Stops the work; nothing is stored then.</param>
    /// <exception cref="CertificateRefusedException">Not an approver, no reason, the lot not accepted, or its data changed since its certificate.</exception>
    /// <exception cref="RecordNotFoundException">The lot does not exist.</exception>
    /// <exception cref="InvalidOperationException">The issuer name or public base URL is not configured.</exception>
    public async Task<IssuedCertificate> IssueAsync(string lotNumber, string? reason, Actor signer, CancellationToken cancellationToken = default)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(lotNumber);
        ArgumentNullException.ThrowIfNull(signer);
        if (!signer.IsApprover)
        {
            throw new CertificateRefusedException(CertificateRefusal.NotApprover,
                $"{signer.Name} is not an approver; signing the certificate of lot {lotNumber} needs the approver role");
        }
        if (string.IsNullOrWhiteSpace(reason))
        {
            throw new CertificateRefusedException(CertificateRefusal.ReasonMissing, $"signing the certificate of lot {lotNumber} needs a reason");
        }
        reason = reason.Trim();
        (string issuerName, Uri baseUrl) = CheckedOptions();

        for (int attempt = 1; ; attempt++)
        {
            // Read outside the transaction: the statistics of an accepted lot cannot change (no measurement is stored for it).
            LotStatistics statistics = await lots.GetStatisticsAsync(lotNumber, cancellationToken).ConfigureAwait(false);
            await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
            await using var transaction = await context.Database.BeginTransactionAsync(cancellationToken).ConfigureAwait(false);
            await LotLock.AcquireAsync(context, lotNumber, cancellationToken).ConfigureAwait(false);
            LotData data = await ReadLotAsync(context, lotNumber, cancellationToken).ConfigureAwait(false);
            CertificateRecord? existing = await context.Certificates.AsNoTracking().SingleOrDefaultAsync(c => c.LotId == data.Lot.Id, cancellationToken).ConfigureAwait(false);
            if (existing is not null)
            {
                return existing.DataDigestSha256 == data.Digest
                    ? Issued(existing, data.Lot.LotNumber, newlyIssued: false)
                    : throw new CertificateRefusedException(CertificateRefusal.DataChanged, string.Create(CultureInfo.InvariantCulture,
                        $"lot {lotNumber} already has certificate {existing.CertificateNumber} (signed {existing.IssuedAt:yyyy-MM-dd HH:mm} UTC by {existing.SignerName}), but its stored data has changed since: it no longer has that certificate's digest. A certificate is not issued again for changed data; investigate the change."));
            }
            if (data.Lot.Status != LotStatus.Accepted)
            {
                throw new CertificateRefusedException(CertificateRefusal.LotNotAccepted,
                    $"lot {lotNumber} is {Words(data.Lot.Status)}; a certificate of conformance is signed only for an accepted lot");
            }

            long sequence = (await context.Certificates.MaxAsync(c => (long?)c.Sequence, cancellationToken).ConfigureAwait(false) ?? 0) + 1;
            DateTimeOffset now = clock.GetUtcNow();
            string number = string.Create(CultureInfo.InvariantCulture, $"{options.NumberPrefix}-{now.UtcDateTime.Year:0000}-{sequence:000000}");
            CertificateSnapshot snapshot = Snapshot(data, statistics, number, issuerName, baseUrl, signer, now, reason);
            var record = new CertificateRecord
            {
                CertificateNumber = number,
                Sequence = sequence,
                LotId = data.Lot.Id,
                DataDigestSha256 = data.Digest,
                IssuedAt = now,
                SignerId = signer.Id,
                SignerName = signer.Name,
                Reason = reason,
                SnapshotJson = CertificateJson.Serialize(snapshot),
            };
            context.Certificates.Add(record);
            Audit.Add(context, clock, signer, AuditAction.CertificateIssued, "certificate", number,
                $"certificate {number} for lot {data.Lot.LotNumber} ({data.PartNumber} revision {data.Revision.Revision}); data digest sha256:{data.Digest}",
                data.Lot.Id, reason);
            try
            {
                await context.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
                await transaction.CommitAsync(cancellationToken).ConfigureAwait(false);
                return Issued(record, data.Lot.LotNumber, newlyIssued: true);
            }
            catch (DbUpdateException) when (attempt < MaxAttempts)
            {
                // Another issuer took this number (or certified this lot) first; decide again on the fresh rows.
                await transaction.RollbackAsync(CancellationToken.None).ConfigureAwait(false);
                await Task.Delay(TimeSpan.FromMilliseconds(5 * attempt + Random.Shared.Next(10)), cancellationToken).ConfigureAwait(false);
            }
        }
    }

    /// <summary>The lot's certificate, or null when none has been issued.</summary>
    /// <exception cref="RecordNotFoundException">The lot does not exist.</exception>
    public async Task<IssuedCertificate?> GetAsync(string lotNumber, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        long lotId = await context.Lots.Where(l => l.LotNumber == lotNumber).Select(l => (long?)l.Id).SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException($"lot {lotNumber} does not exist");
        CertificateRecord? record = await context.Certificates.AsNoTracking().SingleOrDefaultAsync(c => c.LotId == lotId, cancellationToken).ConfigureAwait(false);
        return record is null ? null : Issued(record, lotNumber, newlyIssued: false);
    }

    /// <summary>The digest the lot's stored data has now (<see cref="LotDataDigest"/>), lower-case hex.</summary>
    /// <exception cref="RecordNotFoundException">The lot does not exist.</exception>
    public async Task<string> ComputeDigestAsync(string lotNumber, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        return (await ReadLotAsync(context, lotNumber, cancellationToken).ConfigureAwait(false)).Digest;
    }

    /// <summary>
    /// Checks a certificate number and digest pair (case and surrounding spaces ignored). For a valid pair the answer
    /// carries the certificate's public facts and whether the lot's data today still has the digest; for any other
    /// pair it carries nothing, and never the real digest.
    /// </summary>
    public async Task<CertificateVerification> VerifyAsync(string? certificateNumber, string? digestSha256, CancellationToken cancellationToken = default)
    {
        string number = (certificateNumber ?? "").Trim();
        string digest = (digestSha256 ?? "").Trim().ToLowerInvariant();
        if (number.Length == 0 || number.Length > 80)
        {
            return new CertificateVerification(CertificateVerificationOutcome.UnknownNumber, null);
        }
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        string upper = number.ToUpperInvariant();
        var found = await context.Certificates.AsNoTracking().Where(c => c.CertificateNumber == number || c.CertificateNumber == upper)
            .Join(context.Lots, c => c.LotId, l => l.Id, (c, l) => new { Certificate = c, l.LotNumber })
            .FirstOrDefaultAsync(cancellationToken).ConfigureAwait(false);
        if (found is null)
        {
            return new CertificateVerification(CertificateVerificationOutcome.UnknownNumber, null);
        }
        // Compared in constant time, so the time taken says nothing about how much of a guess was right.
        if (!CryptographicOperations.FixedTimeEquals(Encoding.ASCII.GetBytes(found.Certificate.DataDigestSha256), Encoding.ASCII.GetBytes(digest)))
        {
            return new CertificateVerification(CertificateVerificationOutcome.DigestMismatch, null);
        }
        string current = (await ReadLotAsync(context, found.LotNumber, cancellationToken).ConfigureAwait(false)).Digest;
        CertificateSnapshot s = CertificateJson.Deserialize(found.Certificate.SnapshotJson, found.Certificate.CertificateNumber);
        return new CertificateVerification(CertificateVerificationOutcome.Valid, new VerifiedCertificate(s.CertificateNumber, s.Customer, s.PartNumber,
            s.TemplateRevision, s.LotNumber, s.Supplier, s.Signature.SignedAt, s.Signature.SignerName, s.Signature.SignerRole,
            current == found.Certificate.DataDigestSha256));
    }

    private (string IssuerName, Uri BaseUrl) CheckedOptions()
    {
        if (string.IsNullOrWhiteSpace(options.IssuerName))
        {
            throw new InvalidOperationException($"{CertificateOptions.Section}:{nameof(CertificateOptions.IssuerName)} is not configured; a certificate needs its issuer's name");
        }
        if (!Uri.TryCreate(options.PublicBaseUrl, UriKind.Absolute, out Uri? baseUrl) || baseUrl.Scheme is not ("http" or "https"))
        {
            throw new InvalidOperationException(
                $"{CertificateOptions.Section}:{nameof(CertificateOptions.PublicBaseUrl)} is '{options.PublicBaseUrl}'; give the absolute http(s) address the verification page is reached at");
        }
        if (string.IsNullOrWhiteSpace(options.NumberPrefix) || options.NumberPrefix.Length > 40)
        {
            throw new InvalidOperationException($"{CertificateOptions.Section}:{nameof(CertificateOptions.NumberPrefix)} must be 1 to 40 characters");
        }
        return (options.IssuerName.Trim(), baseUrl);
    }

    private static IssuedCertificate Issued(CertificateRecord record, string lotNumber, bool newlyIssued) =>
        new(record.CertificateNumber, lotNumber, record.DataDigestSha256, record.IssuedAt, record.SignerName,
            CertificateJson.Deserialize(record.SnapshotJson, record.CertificateNumber), newlyIssued);

    private CertificateSnapshot Snapshot(LotData data, LotStatistics statistics, string number, string issuerName, Uri baseUrl, Actor signer,
        DateTimeOffset now, string reason)
    {
        LotRecord lot = data.Lot;
        LotPlan p = lot.Plan;
        var plan = new CertificatePlan(p.StandardName, p.Level?.ToString(), p.Severity?.ToString(), p.AqlPercent, p.LetterUsed?.ToString(),
            p.SampleSize, p.AcceptanceNumber, p.RejectionNumber, p.IsFullInspection);
        string decision = lot.DispositionIsOverride
            ? $"Accepted by {lot.DispositionBy} against the plan's decision ({lot.SampleDecision}): {lot.DispositionReason}"
            : $"Accepted by the sampling plan ({lot.SampleDecision})";
        var result = new CertificateResult(lot.Counters.UnitsTested, lot.Counters.UnitsTested - lot.Counters.Defectives, lot.Counters.Defectives, decision);
        CertificateParameter[] parameters = statistics.Parameters.Select(Parameter).ToArray();
        string url = $"{baseUrl.AbsoluteUri.TrimEnd('/')}/verify?number={Uri.EscapeDataString(number)}&digest={data.Digest}";
        return new CertificateSnapshot(number, new CertificateIssuer(issuerName, options.IssuerAddressLines.ToArray()), lot.Customer, lot.PurchaseOrder,
            lot.LotNumber, data.PartNumber, data.PartDescription, data.Revision.Revision, data.Revision.ContentHash, lot.Supplier, lot.SupplierLot,
            lot.DateCode, lot.QuantityReceived, lot.Counters.UnitsTested, plan, result, parameters, options.Statement,
            new CertificateSignature(signer.Name, "Approver", now, reason), data.Digest, url);
    }

    private static CertificateParameter Parameter(ParameterSummary summary) =>
        new(summary.Parameter, summary.Unit, summary.Moments.Count, summary.Moments.Minimum, summary.Moments.Mean, summary.Moments.Maximum,
            summary.Limits?.Lower, summary.Limits?.Upper);

    private static string Words(LotStatus status) => status switch
    {
        LotStatus.Open => "open (nothing tested yet)",
        LotStatus.InTest => "still in test (not decided)",
        LotStatus.Held => "on hold",
        LotStatus.Rejected => "rejected",
        _ => status.ToString(),
    };

    private static async Task<LotData> ReadLotAsync(FilterQaDbContext context, string lotNumber, CancellationToken cancellationToken)
    {
        var row = await context.Lots.AsNoTracking().Where(l => l.LotNumber == lotNumber)
            .Select(l => new { Lot = l, l.Part!.PartNumber, l.Part.Description, Revision = l.TemplateRevision! })
            .SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException($"lot {lotNumber} does not exist");
        // Only the digested fields: the sweeps' bytes stay in the database.
        var measurements = await context.Measurements.AsNoTracking().Where(m => m.LotId == row.Lot.Id)
            .Join(context.Units, m => m.UnitId, u => u.Id, (m, u) => new { m.Id, u.Serial, m.Attempt, m.CountsForLot, m.Verdict, m.Sweep.RawSha256 })
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        List<RuleResultRecord> rules = await context.RuleResults.AsNoTracking()
            .Join(context.Measurements.Where(m => m.LotId == row.Lot.Id), r => r.MeasurementId, m => m.Id, (r, m) => r)
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        ILookup<long, RuleResultRecord> byMeasurement = rules.ToLookup(r => r.MeasurementId);
        string digest = LotDataDigest.Compute(row.Lot, row.PartNumber, row.Revision, measurements.Select(m =>
            new DigestMeasurement(m.Serial, m.Attempt, m.CountsForLot, m.Verdict, m.RawSha256, byMeasurement[m.Id].ToArray())));
        return new LotData(row.Lot, row.PartNumber, row.Description, row.Revision, digest);
    }

    private sealed record LotData(LotRecord Lot, string PartNumber, string PartDescription, TemplateRevisionRecord Revision, string Digest);
}
