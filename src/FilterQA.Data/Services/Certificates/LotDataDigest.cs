using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using FilterQA.Data.Entities;

namespace FilterQA.Data.Services.Certificates;

/// <summary>
/// The canonical serialisation of a lot's stored data and its SHA-256, which a certificate carries so
/// that anyone can tell later whether the records behind it are still the ones that were signed.
/// </summary>
/// <remarks>
/// Format version 1: UTF-8 text, lines ending in LF (also the last one), no BOM. The first line is
/// <c>filterqa-lot-data 1</c>; then one <c>key=value</c> line per lot field in this order:
/// <c>lot.number, lot.part, lot.supplier, lot.supplier-lot, lot.date-code, lot.quantity-received,
/// lot.purchase-order, lot.customer, lot.status, lot.sample-decision, lot.disposition-by,
/// lot.disposition-reason, lot.disposition-override, plan.kind, plan.standard, plan.lot-size,
/// plan.sample-size, plan.table-sample-size, plan.acceptance-number, plan.rejection-number,
/// plan.full-inspection, plan.level, plan.severity, plan.aql-percent, plan.table-letter,
/// plan.letter-used, plan.ltpd-fraction, plan.confidence, plan.severity-reason, template.revision,
/// template.hash</c>. Then, per measurement ordered by serial (ordinal, code unit by code unit) and
/// attempt, a line <c>measurement=serial|attempt|counts|verdict|raw-sha256</c> followed by one line
/// per rule result in ordinal order: <c>rule=ordinal|id|kind|title|unit|measured|limit|sense|margin|
/// guard-band|outcome|lower-bound|at-hz|message</c>.
/// Values: null is <c>-</c>; text is its UTF-8 byte count, a colon and the text as is (so no character
/// needs escaping); integers in invariant digits; booleans <c>true</c>/<c>false</c>; enums by member
/// name; doubles in invariant culture with the round-trip format "R" (negative zero written as 0,
/// since SQLite does not keep the sign of zero). Times are not part of it (the providers keep
/// different sub-second precision). The digest is the lower-case hex SHA-256 of the UTF-8 bytes.
/// </remarks>
internal static class LotDataDigest
{
    /// <summary>The first line of the serialisation, naming its version.</summary>
    public const string Header = "filterqa-lot-data 1";

    /// <summary>Lower-case hex SHA-256 of <see cref="Canonical"/>.</summary>
    public static string Compute(LotRecord lot, string partNumber, TemplateRevisionRecord revision, IEnumerable<DigestMeasurement> measurements) =>
        Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(Canonical(lot, partNumber, revision, measurements))));

    /// <summary>The canonical text described in the remarks; each measurement must carry its rule results.</summary>
    public static string Canonical(LotRecord lot, string partNumber, TemplateRevisionRecord revision, IEnumerable<DigestMeasurement> measurements)
    {
        ArgumentNullException.ThrowIfNull(lot);
        ArgumentNullException.ThrowIfNull(revision);
        ArgumentNullException.ThrowIfNull(measurements);
        var text = new StringBuilder();
        text.Append(Header).Append('\n');
        Field(text, "lot.number", Text(lot.LotNumber));
        Field(text, "lot.part", Text(partNumber));
        Field(text, "lot.supplier", Text(lot.Supplier));
        Field(text, "lot.supplier-lot", Text(lot.SupplierLot));
        Field(text, "lot.date-code", Text(lot.DateCode));
        Field(text, "lot.quantity-received", Int(lot.QuantityReceived));
        Field(text, "lot.purchase-order", Text(lot.PurchaseOrder));
        Field(text, "lot.customer", Text(lot.Customer));
        Field(text, "lot.status", lot.Status.ToString());
        Field(text, "lot.sample-decision", Enum(lot.SampleDecision));
        Field(text, "lot.disposition-by", Text(lot.DispositionBy));
        Field(text, "lot.disposition-reason", Text(lot.DispositionReason));
        Field(text, "lot.disposition-override", Bool(lot.DispositionIsOverride));
        LotPlan p = lot.Plan;
        Field(text, "plan.kind", p.Kind.ToString());
        Field(text, "plan.standard", Text(p.StandardName));
        Field(text, "plan.lot-size", Int(p.LotSize));
        Field(text, "plan.sample-size", Int(p.SampleSize));
        Field(text, "plan.table-sample-size", Int(p.TableSampleSize));
        Field(text, "plan.acceptance-number", Int(p.AcceptanceNumber));
        Field(text, "plan.rejection-number", Int(p.RejectionNumber));
        Field(text, "plan.full-inspection", Bool(p.IsFullInspection));
        Field(text, "plan.level", Enum(p.Level));
        Field(text, "plan.severity", Enum(p.Severity));
        Field(text, "plan.aql-percent", Number(p.AqlPercent));
        Field(text, "plan.table-letter", Enum(p.TableLetter));
        Field(text, "plan.letter-used", Enum(p.LetterUsed));
        Field(text, "plan.ltpd-fraction", Number(p.LtpdFraction));
        Field(text, "plan.confidence", Number(p.Confidence));
        Field(text, "plan.severity-reason", Text(p.SeverityReason));
        Field(text, "template.revision", Int(revision.Revision));
        Field(text, "template.hash", Text(revision.ContentHash));
        foreach (DigestMeasurement m in measurements.OrderBy(x => x.Serial, StringComparer.Ordinal).ThenBy(x => x.Attempt))
        {
            Field(text, "measurement", string.Join('|', Text(m.Serial), Int(m.Attempt), Bool(m.CountsForLot), m.Verdict.ToString(), Text(m.RawSha256)));
            foreach (RuleResultRecord r in m.Rules.OrderBy(r => r.Ordinal))
            {
                Field(text, "rule", string.Join('|', Int(r.Ordinal), Text(r.RuleId), r.Kind.ToString(), Text(r.Title), r.Unit.ToString(),
                    Number(r.MeasuredValue), Number(r.LimitValue), r.Sense.ToString(), Number(r.Margin), Number(r.GuardBand),
                    r.Outcome.ToString(), Bool(r.IsLowerBound), Number(r.AtHz), Text(r.Message)));
            }
        }
        return text.ToString();
    }

    private static void Field(StringBuilder text, string key, string value) => text.Append(key).Append('=').Append(value).Append('\n');

    private static string Text(string? value) =>
        value is null ? "-" : Encoding.UTF8.GetByteCount(value).ToString(CultureInfo.InvariantCulture) + ":" + value;

    private static string Int(long value) => value.ToString(CultureInfo.InvariantCulture);

    private static string Bool(bool value) => value ? "true" : "false";

    private static string Enum<T>(T? value)
        where T : struct, System.Enum => value is { } v ? v.ToString() : "-";

    private static string Number(double? value) => value switch
    {
        null => "-",
        0.0 => "0", // also negative zero
        { } v => v.ToString("R", CultureInfo.InvariantCulture),
    };
}
