using System.Globalization;
using FilterQA.Data.Services.Certificates;
using FilterQA.Reports.Charts;
using FilterQA.Reports.Pdf;
using FilterQA.Reports.Text;

namespace FilterQA.Reports.Documents;

/// <summary>
/// The certificate of conformance of a lot, one page, from its frozen <see cref="CertificateSnapshot"/>:
/// every field of the snapshot is printed, the digest in full, and a QR code of the verification address.
/// </summary>
public sealed class CertificateDocument(ReportFonts fonts)
{
    private const float QrSidePt = 92;

    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="InvalidOperationException">The snapshot holds more than one page can show (for instance hundreds of parameters).</exception>
    public void Render(CertificateSnapshot snapshot, PaperSize paper, Stream output)
    {
        ArgumentNullException.ThrowIfNull(snapshot);
        ArgumentNullException.ThrowIfNull(output);
        var header = new RunningHeader("Certificate of conformance " + snapshot.CertificateNumber,
            $"lot {snapshot.LotNumber} · part {snapshot.PartNumber}",
            $"{snapshot.Issuer.Name} · certificate {snapshot.CertificateNumber} · issued {Say.Time(snapshot.Signature.SignedAt)}");
        using var flow = new PageFlow(fonts, paper, header);

        float top = flow.CursorPt;
        float qrLeft = flow.LeftPt + flow.ContentWidthPt - QrSidePt;
        float textWidth = flow.ContentWidthPt - QrSidePt - 16;
        flow.Draw(canvas => QrCodeDrawing.Draw(canvas, SKRectAt(qrLeft, top, QrSidePt), snapshot.VerificationUrl));
        flow.Text(snapshot.Issuer.Name, TextStyle.Title, textWidth);
        foreach (string line in snapshot.Issuer.AddressLines)
        {
            flow.Text(line, TextStyle.Body with { Colour = TextStyle.Muted }, textWidth);
        }
        flow.Space(6);
        flow.Text("Certificate of conformance", TextStyle.Heading, textWidth);
        flow.Text("Number " + snapshot.CertificateNumber, TextStyle.BodyBold, textWidth);
        flow.Text("Verify at " + snapshot.VerificationUrl, TextStyle.Small, textWidth);
        float below = top + QrSidePt + 4;
        if (flow.CursorPt < below)
        {
            flow.Space(below - flow.CursorPt);
        }

        flow.Heading("Delivery");
        flow.Fields(
        [
            Field("Customer", Say.OrDash(snapshot.Customer)),
            Field("Purchase order", Say.OrDash(snapshot.PurchaseOrder)),
            Field("Lot", snapshot.LotNumber),
            Field("Part number", snapshot.PartNumber),
            Field("Part", snapshot.PartDescription),
            Field("Template revision", Say.Integer(snapshot.TemplateRevision)),
            Field("Supplier", snapshot.Supplier),
            Field("Supplier lot", Say.OrDash(snapshot.SupplierLot)),
            Field("Date code", Say.OrDash(snapshot.DateCode)),
            Field("Quantity received", Say.Integer(snapshot.QuantityReceived)),
            Field("Quantity sampled", Say.Integer(snapshot.QuantitySampled)),
        ]);
        flow.Fields([Field("Template hash", snapshot.TemplateHash)], 1);

        CertificatePlan plan = snapshot.Plan;
        flow.Heading("Sampling plan and result");
        flow.Fields(
        [
            Field("Standard", plan.Standard),
            Field("Inspection level", Say.OrDash(plan.InspectionLevel)),
            Field("Severity", Say.OrDash(plan.Severity)),
            Field("AQL", plan.AqlPercent is { } aql ? aql.ToString("0.###", CultureInfo.InvariantCulture) + " %" : "–"),
            Field("Code letter", Say.OrDash(plan.CodeLetter)),
            Field("Sample size", Say.Integer(plan.SampleSize)),
            Field("Acceptance number (Ac)", Say.Integer(plan.AcceptanceNumber)),
            Field("Rejection number (Re)", Say.Integer(plan.RejectionNumber)),
            Field("100 % inspection", plan.IsFullInspection ? "yes" : "no"),
            Field("Units tested", Say.Integer(snapshot.Result.UnitsTested)),
            Field("Units conforming", Say.Integer(snapshot.Result.UnitsConforming)),
            Field("Units non-conforming", Say.Integer(snapshot.Result.UnitsNonConforming)),
        ]);
        flow.Fields([Field("Lot decision", snapshot.Result.Decision)], 1);

        flow.Heading("Key parameters of the units tested");
        flow.Table(ParameterTable(snapshot.Parameters));

        flow.Heading("Statement");
        flow.Text(snapshot.Statement, TextStyle.Body);
        flow.Space(4);
        CertificateSignature signature = snapshot.Signature;
        flow.Fields(
        [
            Field("Signed by", signature.SignerName),
            Field("Role", signature.SignerRole),
            Field("Signed at (UTC)", Say.Time(signature.SignedAt)),
            Field("Reason", signature.Reason),
        ]);
        flow.Space(4);
        flow.Text("Data digest (SHA-256)", TextStyle.BodyBold with { SizePt = 8.5f });
        flow.Text(Say.Grouped(snapshot.DataDigestSha256), TextStyle.Mono);
        if (flow.PageCount > 1)
        {
            throw new InvalidOperationException(FormattableString.Invariant(
                $"certificate {snapshot.CertificateNumber} does not fit on one page ({snapshot.Parameters.Count} parameters, {snapshot.Statement.Length} characters of statement)"));
        }
        flow.Write(output, new DocumentMetadata("Certificate of conformance " + snapshot.CertificateNumber, signature.SignerName,
            $"Lot {snapshot.LotNumber}, part {snapshot.PartNumber}, supplier {snapshot.Supplier}", signature.SignedAt));
    }

    internal static ReportTable ParameterTable(IReadOnlyList<CertificateParameter> parameters)
    {
        var rows = new List<TableRow>(parameters.Count);
        foreach (CertificateParameter p in parameters)
        {
            double largest = new[] { p.Minimum, p.Maximum, p.LowerLimit ?? 0, p.UpperLimit ?? 0 }.Where(double.IsFinite).Select(Math.Abs).DefaultIfEmpty(0).Max();
            DisplayUnit unit = DisplayUnit.For(p.Unit, largest);
            int decimals = unit.DecimalsFor(unit.From(largest));
            rows.Add(new TableRow(
            [
                p.Parameter,
                unit.Symbol.Length == 0 ? "ratio" : unit.Symbol,
                Say.Integer(p.Count),
                unit.Number(p.Minimum, decimals),
                unit.Number(p.Mean, decimals),
                unit.Number(p.Maximum, decimals),
                unit.Number(p.LowerLimit, decimals),
                unit.Number(p.UpperLimit, decimals),
            ]));
        }
        return new ReportTable(null,
        [
            new TableColumn("Parameter", 3.2f),
            new TableColumn("Unit", 0.9f),
            new TableColumn("n", 0.7f, CellAlign.Right),
            new TableColumn("Minimum", 1.3f, CellAlign.Right),
            new TableColumn("Mean", 1.3f, CellAlign.Right),
            new TableColumn("Maximum", 1.3f, CellAlign.Right),
            new TableColumn("Lower limit", 1.3f, CellAlign.Right),
            new TableColumn("Upper limit", 1.3f, CellAlign.Right),
        ], rows);
    }

    private static KeyValuePair<string, string> Field(string label, string value) => new(label, value);

    private static SkiaSharp.SKRect SKRectAt(float left, float top, float side) => SkiaSharp.SKRect.Create(left, top, side, side);
}
