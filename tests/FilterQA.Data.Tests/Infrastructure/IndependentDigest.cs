using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Tests.Infrastructure;

/// <summary>
/// The lot-data digest computed here from the stored rows, written out again from the documented
/// serialisation (format version 1, see the remarks of LotDataDigest) and hashed with
/// System.Security.Cryptography's SHA-256: the outside reference the certificate digest is checked against.
/// </summary>
public static class IndependentDigest
{
    public static async Task<string> ComputeAsync(TestStore store, string lotNumber)
    {
        ArgumentNullException.ThrowIfNull(store);
        await using FilterQaDbContext context = store.NewContext();
        LotRecord lot = await context.Lots.AsNoTracking().Include(l => l.Part).Include(l => l.TemplateRevision).SingleAsync(l => l.LotNumber == lotNumber);
        var units = await context.Units.AsNoTracking().Where(u => u.LotId == lot.Id).ToDictionaryAsync(u => u.Id, u => u.Serial);
        List<MeasurementRecord> measurements = await context.Measurements.AsNoTracking().Include(m => m.Rules).Where(m => m.LotId == lot.Id).ToListAsync();

        var lines = new List<string> { "filterqa-lot-data 1" };
        void F(string key, string value) => lines.Add(key + "=" + value);
        F("lot.number", S(lot.LotNumber));
        F("lot.part", S(lot.Part!.PartNumber));
        F("lot.supplier", S(lot.Supplier));
        F("lot.supplier-lot", S(lot.SupplierLot));
        F("lot.date-code", S(lot.DateCode));
        F("lot.quantity-received", I(lot.QuantityReceived));
        F("lot.purchase-order", S(lot.PurchaseOrder));
        F("lot.customer", S(lot.Customer));
        F("lot.status", lot.Status.ToString());
        F("lot.sample-decision", lot.SampleDecision?.ToString() ?? "-");
        F("lot.disposition-by", S(lot.DispositionBy));
        F("lot.disposition-reason", S(lot.DispositionReason));
        F("lot.disposition-override", B(lot.DispositionIsOverride));
        LotPlan p = lot.Plan;
        F("plan.kind", p.Kind.ToString());
        F("plan.standard", S(p.StandardName));
        F("plan.lot-size", I(p.LotSize));
        F("plan.sample-size", I(p.SampleSize));
        F("plan.table-sample-size", I(p.TableSampleSize));
        F("plan.acceptance-number", I(p.AcceptanceNumber));
        F("plan.rejection-number", I(p.RejectionNumber));
        F("plan.full-inspection", B(p.IsFullInspection));
        F("plan.level", p.Level?.ToString() ?? "-");
        F("plan.severity", p.Severity?.ToString() ?? "-");
        F("plan.aql-percent", D(p.AqlPercent));
        F("plan.table-letter", p.TableLetter?.ToString() ?? "-");
        F("plan.letter-used", p.LetterUsed?.ToString() ?? "-");
        F("plan.ltpd-fraction", D(p.LtpdFraction));
        F("plan.confidence", D(p.Confidence));
        F("plan.severity-reason", S(p.SeverityReason));
        F("template.revision", I(lot.TemplateRevision!.Revision));
        F("template.hash", S(lot.TemplateRevision.ContentHash));
        foreach (MeasurementRecord m in measurements.OrderBy(m => units[m.UnitId], StringComparer.Ordinal).ThenBy(m => m.Attempt))
        {
            F("measurement", $"{S(units[m.UnitId])}|{I(m.Attempt)}|{B(m.CountsForLot)}|{m.Verdict}|{S(m.Sweep.RawSha256)}");
            foreach (RuleResultRecord r in m.Rules.OrderBy(r => r.Ordinal))
            {
                F("rule", $"{I(r.Ordinal)}|{S(r.RuleId)}|{r.Kind}|{S(r.Title)}|{r.Unit}|{D(r.MeasuredValue)}|{D(r.LimitValue)}|{r.Sense}|{D(r.Margin)}|{D(r.GuardBand)}|{r.Outcome}|{B(r.IsLowerBound)}|{D(r.AtHz)}|{S(r.Message)}");
            }
        }
        byte[] bytes = Encoding.UTF8.GetBytes(string.Concat(lines.Select(l => l + "\n")));
        return Convert.ToHexStringLower(SHA256.HashData(bytes));
    }

    private static string S(string? text) => text is null ? "-" : Encoding.UTF8.GetByteCount(text).ToString(CultureInfo.InvariantCulture) + ":" + text;

    private static string I(int value) => value.ToString(CultureInfo.InvariantCulture);

    private static string B(bool value) => value ? "true" : "false";

    private static string D(double? value) => value is not { } v ? "-" : v == 0 ? "0" : v.ToString("R", CultureInfo.InvariantCulture);
}
