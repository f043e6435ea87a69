using System.Globalization;
using System.Text.RegularExpressions;
using FilterQA.Core.Decisions;
using FilterQA.Data.Entities;
using FilterQA.Data.Services;
using FilterQA.Data.Services.Certificates;
using FilterQA.Data.Tests.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Tests.Storage;

/// <summary>Certificates of conformance: digest, refusals, numbering under concurrency, issue once, verification, immutability.</summary>
public abstract partial class CertificateContract : ProviderTestBase
{
    private static readonly UnitVerdict[] ThreeGood = [UnitVerdict.Go, UnitVerdict.Go, UnitVerdict.Go];

    [StorageFact]
    public async Task The_digest_is_the_SHA256_of_the_documented_serialisation_and_is_repeatable()
    {
        PreparedLot lot = await Store.DecidedLotAsync(ThreeGood);
        CertificateService certificates = Store.Certificates();

        string first = await certificates.ComputeDigestAsync(lot.LotNumber);
        string second = await certificates.ComputeDigestAsync(lot.LotNumber);

        // Reference: SHA-256 (FIPS 180-4) of the serialisation written out again in the test from the stored rows.
        Assert.Equal(await IndependentDigest.ComputeAsync(Store, lot.LotNumber), first);
        Assert.Equal(first, second);
        Assert.Matches("^[0-9a-f]{64}$", first);
    }

    [StorageFact]
    public async Task The_digest_changes_when_any_stored_lot_value_changes_and_returns_when_it_is_restored()
    {
        PreparedLot lot = await Store.DecidedLotAsync(ThreeGood);
        CertificateService certificates = Store.Certificates();
        string original = await certificates.ComputeDigestAsync(lot.LotNumber);
        // Measurement and rule rows are append-only (triggers refuse edits), so the values that can change are the lot's;
        // the measurement fields are covered by the equality with the independent serialisation above.
        (string Field, Action<LotRecord> Change, Action<LotRecord> Restore)[] changes =
        [
            ("customer", l => l.Customer = "Brackwater Shipyard", l => l.Customer = "Brackwater Shipyards"),
            ("purchase order", l => l.PurchaseOrder = "PO-7732", l => l.PurchaseOrder = "PO-7731"),
            ("date code", l => l.DateCode = "2545", l => l.DateCode = "2544"),
            ("supplier lot", l => l.SupplierLot = null, l => l.SupplierLot = "VPZ-88412"),
            ("quantity", l => l.QuantityReceived = 4, l => l.QuantityReceived = 3),
            ("disposition reason", l => l.DispositionReason += ".", l => l.DispositionReason = l.DispositionReason![..^1]),
            ("plan severity reason", l => l.Plan.SeverityReason += " ", l => l.Plan.SeverityReason = l.Plan.SeverityReason.TrimEnd()),
        ];
        foreach ((string field, Action<LotRecord> change, Action<LotRecord> restore) in changes)
        {
            await EditLotAsync(lot.LotNumber, change);
            string changed = await certificates.ComputeDigestAsync(lot.LotNumber);
            Assert.True(changed != original, $"the digest did not change with the {field}");
            Assert.Equal(await IndependentDigest.ComputeAsync(Store, lot.LotNumber), changed);
            await EditLotAsync(lot.LotNumber, restore);
            Assert.Equal(original, await certificates.ComputeDigestAsync(lot.LotNumber));
        }
    }

    [StorageFact]
    public async Task Issuing_stores_a_frozen_snapshot_with_the_lot_the_statistics_and_a_verification_link_and_audits_it()
    {
        PreparedLot lot = await Store.DecidedLotAsync(ThreeGood);
        DateTimeOffset signedAt = Store.Clock.GetUtcNow();

        IssuedCertificate issued = await Store.Certificates().IssueAsync(lot.LotNumber, "  lot meets the purchase order  ", Samples.Approver);

        Assert.True(issued.NewlyIssued);
        Assert.Matches(NumberPattern(), issued.CertificateNumber);
        Assert.Equal(await IndependentDigest.ComputeAsync(Store, lot.LotNumber), issued.DataDigestSha256);
        CertificateSnapshot s = issued.Snapshot;
        Assert.Equal((issued.CertificateNumber, "Tarnwell Marine Electronics", "Brackwater Shipyards", "PO-7731", lot.LotNumber, lot.PartNumber),
            (s.CertificateNumber, s.Issuer.Name, s.Customer, s.PurchaseOrder, s.LotNumber, s.PartNumber));
        Assert.Equal((1, lot.Template.ContentHash, Samples.Supplier, "VPZ-88412", "2544", 3, 3),
            (s.TemplateRevision, s.TemplateHash, s.Supplier, s.SupplierLot, s.DateCode, s.QuantityReceived, s.QuantitySampled));
        Assert.Equal((3, 3, 0), (s.Result.UnitsTested, s.Result.UnitsConforming, s.Result.UnitsNonConforming));
        Assert.Equal((3, 0, 1, true), (s.Plan.SampleSize, s.Plan.AcceptanceNumber, s.Plan.RejectionNumber, s.Plan.IsFullInspection));
        Assert.Equal((Samples.Approver.Name, "Approver", signedAt, "lot meets the purchase order"),
            (s.Signature.SignerName, s.Signature.SignerRole, s.Signature.SignedAt, s.Signature.Reason));
        Assert.Equal($"{CertificateSetup.BaseUrl}/verify?number={issued.CertificateNumber}&digest={issued.DataDigestSha256}", s.VerificationUrl);
        Assert.Equal(issued.DataDigestSha256, s.DataDigestSha256);
        Assert.False(string.IsNullOrWhiteSpace(s.Statement));

        // Samples.Evaluation: a passing rule at index k measures 10 + k + seed/100 against an upper limit of 100; seeds 1, 2, 3.
        int lossIndex = lot.Template.Rules.Select(r => r.Id).ToList().IndexOf("loss");
        double[] loss = [10 + lossIndex + 0.01, 10 + lossIndex + 0.02, 10 + lossIndex + 0.03];
        CertificateParameter p = Assert.Single(s.Parameters, p => p.Parameter == "loss");
        Assert.Equal(("dB", 3, (double?)null, (double?)100), (p.Unit, p.Count, p.LowerLimit, p.UpperLimit));
        // 1e-12 absolute: the mean is a sum of three values near 20, rounding of the order of 1e-15.
        Assert.Equal(loss.Min(), p.Minimum, 1e-12);
        Assert.Equal(loss.Average(), p.Mean, 1e-12);
        Assert.Equal(loss.Max(), p.Maximum, 1e-12);
        Assert.Equal(lot.Template.Rules.Count, s.Parameters.Count);

        await using FilterQaDbContext context = Store.NewContext();
        AuditEntry audit = await context.AuditEntries.SingleAsync(a => a.Action == AuditAction.CertificateIssued && a.SubjectKey == issued.CertificateNumber);
        Assert.Equal((Samples.Approver.Id, "lot meets the purchase order"), (audit.ActorId, audit.Reason));
        Assert.Contains(issued.DataDigestSha256, audit.Detail, StringComparison.Ordinal);
        IssuedCertificate? again = await Store.Certificates().GetAsync(lot.LotNumber);
        Assert.Equal(s, again!.Snapshot with { Issuer = s.Issuer, Parameters = s.Parameters });
        Assert.Equal(s.Parameters, again.Snapshot.Parameters);
        Assert.Equal(s.Issuer.AddressLines, again.Snapshot.Issuer.AddressLines);
    }

    [StorageFact]
    public async Task Issuing_is_refused_with_the_reason_and_stores_nothing()
    {
        PreparedLot inTest = await Store.StoredLotAsync(3, UnitVerdict.Go);
        PreparedLot rejected = await Store.DecidedLotAsync(UnitVerdict.Go, UnitVerdict.NoGo);
        PreparedLot held = await Store.StoredLotAsync(3, UnitVerdict.Go);
        await Store.Lots.HoldAsync(held.LotNumber, "connector damage seen on the reel", Samples.Approver);
        PreparedLot accepted = await Store.DecidedLotAsync(ThreeGood);
        CertificateService certificates = Store.Certificates();

        (string Lot, string? Reason, Actor Signer, CertificateRefusal Refusal, string Phrase)[] cases =
        [
            (inTest.LotNumber, "ok", Samples.Approver, CertificateRefusal.LotNotAccepted, "in test"),
            (rejected.LotNumber, "ok", Samples.Approver, CertificateRefusal.LotNotAccepted, "rejected"),
            (held.LotNumber, "ok", Samples.Approver, CertificateRefusal.LotNotAccepted, "on hold"),
            (accepted.LotNumber, null, Samples.Approver, CertificateRefusal.ReasonMissing, "needs a reason"),
            (accepted.LotNumber, "   ", Samples.Approver, CertificateRefusal.ReasonMissing, "needs a reason"),
            (accepted.LotNumber, "ok", Samples.Engineer, CertificateRefusal.NotApprover, "not an approver"),
        ];
        foreach ((string lotNumber, string? reason, Actor signer, CertificateRefusal refusal, string phrase) in cases)
        {
            CertificateRefusedException e = await Assert.ThrowsAsync<CertificateRefusedException>(() => certificates.IssueAsync(lotNumber, reason, signer));
            Assert.Equal(refusal, e.Refusal);
            Assert.Contains(phrase, e.Message, StringComparison.Ordinal);
        }
        await Assert.ThrowsAsync<RecordNotFoundException>(() => certificates.IssueAsync("VP-2611-NOSUCHLOT", "ok", Samples.Approver));

        await using FilterQaDbContext context = Store.NewContext();
        long[] lotIds = await context.Lots.Where(l => new[] { inTest.LotNumber, rejected.LotNumber, held.LotNumber, accepted.LotNumber }.Contains(l.LotNumber))
            .Select(l => l.Id).ToArrayAsync();
        Assert.Equal(4, lotIds.Length);
        Assert.False(await context.Certificates.AnyAsync(c => lotIds.Contains(c.LotId)));
        Assert.False(await context.AuditEntries.AnyAsync(a => a.Action == AuditAction.CertificateIssued && a.LotId != null && lotIds.Contains(a.LotId.Value)));
    }

    [StorageFact]
    public async Task Asking_again_returns_the_same_certificate_and_changed_data_is_refused()
    {
        PreparedLot lot = await Store.DecidedLotAsync(ThreeGood);
        CertificateService certificates = Store.Certificates();
        IssuedCertificate first = await certificates.IssueAsync(lot.LotNumber, "first signing", Samples.Approver);
        Store.Clock.Advance(TimeSpan.FromHours(1));

        IssuedCertificate second = await certificates.IssueAsync(lot.LotNumber, "asked again", Samples.Approver);

        Assert.False(second.NewlyIssued);
        Assert.Equal((first.CertificateNumber, first.DataDigestSha256, "first signing"), (second.CertificateNumber, second.DataDigestSha256, second.Snapshot.Signature.Reason));
        Assert.Equal(1, await CertificateCountAsync(lot.LotNumber));

        await EditLotAsync(lot.LotNumber, l => l.Customer = "Another Yard");
        CertificateRefusedException e = await Assert.ThrowsAsync<CertificateRefusedException>(() => certificates.IssueAsync(lot.LotNumber, "data changed", Samples.Approver));
        Assert.Equal(CertificateRefusal.DataChanged, e.Refusal);
        Assert.Contains(first.CertificateNumber, e.Message, StringComparison.Ordinal);
        Assert.Contains("changed", e.Message, StringComparison.Ordinal);
        Assert.Equal(1, await CertificateCountAsync(lot.LotNumber));

        // The certificate still verifies as issued, and says the lot's data is no longer what was signed.
        CertificateVerification check = await certificates.VerifyAsync(first.CertificateNumber, first.DataDigestSha256);
        Assert.Equal(CertificateVerificationOutcome.Valid, check.Outcome);
        Assert.False(check.Certificate!.LotDataUnchanged);
    }

    [StorageFact]
    public async Task A_certified_lot_refuses_every_change_of_its_record_and_keeps_its_digest()
    {
        PreparedLot lot = await Store.DecidedLotAsync(ThreeGood);
        CertificateService certificates = Store.Certificates();
        IssuedCertificate issued = await certificates.IssueAsync(lot.LotNumber, "for shipment", Samples.Approver);

        StorageRuleException overridden = await Assert.ThrowsAsync<StorageRuleException>(
            () => Store.Lots.OverrideAsync(lot.LotNumber, false, "field returns", Samples.Approver));
        Assert.Contains(issued.CertificateNumber, overridden.Message, StringComparison.Ordinal);
        await Assert.ThrowsAsync<StorageRuleException>(() => Store.Lots.HoldAsync(lot.LotNumber, "second look", Samples.Approver));
        await Assert.ThrowsAsync<StorageRuleException>(() => Store.Lots.DecideAsync(lot.LotNumber, Samples.Approver));

        Assert.Equal(issued.DataDigestSha256, await certificates.ComputeDigestAsync(lot.LotNumber));
        Assert.Equal(LotStatus.Accepted, (await Store.Lots.GetSummaryAsync(lot.LotNumber)).Status);
    }

    [StorageFact]
    public async Task Certificate_numbers_never_repeat_sequentially_or_under_concurrent_issuers()
    {
        var lots = new List<PreparedLot>();
        for (int i = 0; i < 9; i++)
        {
            lots.Add(await Store.DecidedLotAsync(ThreeGood));
        }
        CertificateService certificates = Store.Certificates();
        var sequential = new List<IssuedCertificate>();
        foreach (PreparedLot lot in lots.Take(3))
        {
            sequential.Add(await certificates.IssueAsync(lot.LotNumber, "sequential", Samples.Approver));
        }
        long[] running = sequential.Select(c => Sequence(c.CertificateNumber)).ToArray();
        Assert.True(running[0] < running[1] && running[1] < running[2], "sequential numbers must increase: " + string.Join(", ", running));

        // Six lots at once, each by its own service and connection; and the last lot asked for by four issuers at once.
        Task<IssuedCertificate>[] distinct = lots.Skip(3).Take(5)
            .Select(l => Task.Run(() => Store.Certificates().IssueAsync(l.LotNumber, "concurrent", Samples.Approver))).ToArray();
        Task<IssuedCertificate>[] same = Enumerable.Range(0, 4)
            .Select(_ => Task.Run(() => Store.Certificates().IssueAsync(lots[8].LotNumber, "same lot", Samples.Approver))).ToArray();
        IssuedCertificate[] concurrent = await Task.WhenAll(distinct);
        IssuedCertificate[] sameLot = await Task.WhenAll(same);

        Assert.Single(sameLot.Select(c => c.CertificateNumber).Distinct());
        Assert.Single(sameLot, c => c.NewlyIssued);
        string[] all = sequential.Concat(concurrent).Append(sameLot[0]).Select(c => c.CertificateNumber).ToArray();
        Assert.Equal(all.Length, all.Distinct(StringComparer.Ordinal).Count());
        Assert.All(all, n => Assert.Matches(NumberPattern(), n));
        await using FilterQaDbContext context = Store.NewContext();
        string[] stored = await context.Certificates.Select(c => c.CertificateNumber).ToArrayAsync();
        Assert.Equal(stored.Length, stored.Distinct(StringComparer.Ordinal).Count());
        Assert.All(lots, l => Assert.Equal(1, CertificateCountAsync(l.LotNumber).GetAwaiter().GetResult()));
    }

    [StorageFact]
    public async Task Verification_accepts_a_real_certificate_and_refuses_a_forged_digest_and_an_unknown_number()
    {
        PreparedLot lot = await Store.DecidedLotAsync(ThreeGood);
        CertificateService certificates = Store.Certificates();
        IssuedCertificate issued = await certificates.IssueAsync(lot.LotNumber, "for shipment", Samples.Approver);
        string forged = issued.DataDigestSha256[..^1] + (issued.DataDigestSha256[^1] == '0' ? '1' : '0');

        CertificateVerification real = await certificates.VerifyAsync(issued.CertificateNumber, issued.DataDigestSha256);
        CertificateVerification upper = await certificates.VerifyAsync(" " + issued.CertificateNumber.ToLowerInvariant() + " ", issued.DataDigestSha256.ToUpperInvariant());
        CertificateVerification wrong = await certificates.VerifyAsync(issued.CertificateNumber, forged);
        CertificateVerification unknown = await certificates.VerifyAsync("TME-COC-1999-999999", issued.DataDigestSha256);
        CertificateVerification empty = await certificates.VerifyAsync("", "");

        Assert.Equal(CertificateVerificationOutcome.Valid, real.Outcome);
        VerifiedCertificate facts = real.Certificate!;
        Assert.Equal((issued.CertificateNumber, "Brackwater Shipyards", lot.PartNumber, 1, lot.LotNumber, Samples.Supplier, Samples.Approver.Name, true),
            (facts.CertificateNumber, facts.IssuedTo, facts.PartNumber, facts.TemplateRevision, facts.LotNumber, facts.Supplier, facts.SignerName, facts.LotDataUnchanged));
        Assert.Equal(CertificateVerificationOutcome.Valid, upper.Outcome);
        Assert.Equal((CertificateVerificationOutcome.DigestMismatch, (VerifiedCertificate?)null), (wrong.Outcome, wrong.Certificate));
        Assert.Equal((CertificateVerificationOutcome.UnknownNumber, (VerifiedCertificate?)null), (unknown.Outcome, unknown.Certificate));
        Assert.Equal(CertificateVerificationOutcome.UnknownNumber, empty.Outcome);
    }

    [StorageFact]
    public async Task A_stored_certificate_cannot_be_edited_or_deleted()
    {
        PreparedLot lot = await Store.DecidedLotAsync(ThreeGood);
        IssuedCertificate issued = await Store.Certificates().IssueAsync(lot.LotNumber, "for shipment", Samples.Approver);

        await using (FilterQaDbContext context = Store.NewContext())
        {
            CertificateRecord record = await context.Certificates.SingleAsync(c => c.CertificateNumber == issued.CertificateNumber);
            record.Reason = "rewritten";
            await Assert.ThrowsAsync<StorageRuleException>(() => context.SaveChangesAsync());
        }
        await using (FilterQaDbContext context = Store.NewContext())
        {
            // SQL that bypasses the change tracker meets the database trigger.
            Exception update = await Assert.ThrowsAnyAsync<Exception>(() => context.Certificates.Where(c => c.CertificateNumber == issued.CertificateNumber)
                .ExecuteUpdateAsync(u => u.SetProperty(c => c.Reason, "rewritten")));
            Assert.Contains("append-only", update.Message + update.InnerException?.Message, StringComparison.Ordinal);
            Exception delete = await Assert.ThrowsAnyAsync<Exception>(() => context.Certificates.Where(c => c.CertificateNumber == issued.CertificateNumber).ExecuteDeleteAsync());
            Assert.Contains("append-only", delete.Message + delete.InnerException?.Message, StringComparison.Ordinal);
        }
        Assert.Equal("for shipment", (await Store.Certificates().GetAsync(lot.LotNumber))!.Snapshot.Signature.Reason);
    }

    private async Task EditLotAsync(string lotNumber, Action<LotRecord> change)
    {
        await using FilterQaDbContext context = Store.NewContext();
        LotRecord lot = await context.Lots.SingleAsync(l => l.LotNumber == lotNumber);
        change(lot);
        await context.SaveChangesAsync();
    }

    private async Task<int> CertificateCountAsync(string lotNumber)
    {
        await using FilterQaDbContext context = Store.NewContext();
        return await context.Certificates.Join(context.Lots.Where(l => l.LotNumber == lotNumber), c => c.LotId, l => l.Id, (c, l) => c).CountAsync();
    }

    private static long Sequence(string number) => long.Parse(number[(number.LastIndexOf('-') + 1)..], CultureInfo.InvariantCulture);

    // Prefix, the year of the test clock (2026) and six digits.
    [GeneratedRegex("^TME-COC-2026-[0-9]{6}$")]
    private static partial Regex NumberPattern();
}
