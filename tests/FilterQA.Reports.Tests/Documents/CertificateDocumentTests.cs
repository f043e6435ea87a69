using FilterQA.Data.Services.Certificates;
using FilterQA.Reports.Documents;
using FilterQA.Reports.Pdf;
using FilterQA.Reports.Tests.Infrastructure;
using UglyToad.PdfPig;

namespace FilterQA.Reports.Tests.Documents;

public sealed class CertificateDocumentTests
{
    private static byte[] Render(CertificateSnapshot snapshot, PaperSize paper = PaperSize.A4)
    {
        using var stream = new MemoryStream();
        new CertificateDocument(TestFonts.Default).Render(snapshot, paper, stream);
        return stream.ToArray();
    }

    [Theory]
    [InlineData(PaperSize.A4)]
    [InlineData(PaperSize.Letter)]
    public void The_certificate_is_one_page_and_prints_every_field_of_the_snapshot(PaperSize paper)
    {
        CertificateSnapshot s = SyntheticContent.Certificate();
        byte[] pdf = Render(s, paper);
        IReadOnlyList<string> pages = PdfText.Pages(pdf);
        Assert.Single(pages);
        string text = pages[0];
        string squeezed = text.Replace(" ", string.Empty, StringComparison.Ordinal);
        foreach (string expected in new[]
        {
            s.CertificateNumber, s.Issuer.Name, s.Customer!, s.PurchaseOrder!, s.LotNumber, s.PartNumber, s.PartDescription, s.Supplier, s.SupplierLot!,
            s.DateCode!, s.Plan.Standard, s.Plan.InspectionLevel!, s.Plan.Severity!, s.Plan.CodeLetter!, s.Result.Decision, s.Signature.SignerName,
            s.Signature.SignerRole, s.Signature.Reason,
        }.Concat(s.Issuer.AddressLines))
        {
            // A wrapped value's lines may be read apart from each other by the extractor: its words must appear in order.
            Assert.True(PdfText.HasWordsInOrder(text, expected), $"'{expected}' is not printed");
        }
        Assert.Contains(s.TemplateHash, squeezed, StringComparison.Ordinal);
        Assert.Contains(s.VerificationUrl, squeezed, StringComparison.Ordinal);
        Assert.True(PdfText.HasWordsInOrder(text, s.Statement), "the statement is not printed");
        // ISO 8601 UTC time of signing, as printed by the test's own format.
        Assert.Contains("Signed at (UTC) " + s.Signature.SignedAt.UtcDateTime.ToString("yyyy-MM-dd'T'HH:mm:ss'Z'", System.Globalization.CultureInfo.InvariantCulture),
            text, StringComparison.Ordinal);
        // The digest in full, in groups of 8 hex digits.
        string grouped = string.Join(' ', Enumerable.Range(0, 8).Select(i => s.DataDigestSha256.Substring(i * 8, 8)));
        Assert.Contains(grouped, text, StringComparison.Ordinal);

        Assert.True(PdfText.HasWordsInOrder(text, "Template revision " + s.TemplateRevision), "Template revision " + s.TemplateRevision);
        Assert.True(PdfText.HasWordsInOrder(text, "Quantity received " + s.QuantityReceived), "Quantity received " + s.QuantityReceived);
        Assert.True(PdfText.HasWordsInOrder(text, "Quantity sampled " + s.QuantitySampled), "Quantity sampled " + s.QuantitySampled);
        Assert.True(PdfText.HasWordsInOrder(text, "AQL 0.65 %"), "AQL");
        Assert.True(PdfText.HasWordsInOrder(text, "Sample size " + s.Plan.SampleSize), "Sample size " + s.Plan.SampleSize);
        Assert.True(PdfText.HasWordsInOrder(text, "Acceptance number (Ac) " + s.Plan.AcceptanceNumber), "Acceptance number (Ac) " + s.Plan.AcceptanceNumber);
        Assert.True(PdfText.HasWordsInOrder(text, "(Re) " + s.Plan.RejectionNumber), "(Re) " + s.Plan.RejectionNumber);
        Assert.True(PdfText.HasWordsInOrder(text, "Units tested " + s.Result.UnitsTested), "Units tested " + s.Result.UnitsTested);
        Assert.True(PdfText.HasWordsInOrder(text, "Units conforming " + s.Result.UnitsConforming), "Units conforming " + s.Result.UnitsConforming);
        Assert.True(PdfText.HasWordsInOrder(text, "non-conforming " + s.Result.UnitsNonConforming), "non-conforming " + s.Result.UnitsNonConforming);
    }

    [Fact]
    public void Every_parameter_number_equals_the_snapshot_value_in_the_printed_unit()
    {
        CertificateSnapshot s = SyntheticContent.Certificate();
        string[] words = PdfText.Pages(Render(s))[0].Split(' ');
        foreach (CertificateParameter p in s.Parameters)
        {
            int at = Array.IndexOf(words, p.Parameter);
            Assert.True(at >= 0, $"parameter {p.Parameter} not printed");
            string unit = words[at + 1];
            double siPer = SiUnits.SiPer(unit);
            Assert.Equal(p.Count.ToString(System.Globalization.CultureInfo.InvariantCulture), words[at + 2]);
            double?[] expected = [p.Minimum, p.Mean, p.Maximum, p.LowerLimit, p.UpperLimit];
            string[] names = ["minimum", "mean", "maximum", "lower limit", "upper limit"];
            for (int i = 0; i < expected.Length; i++)
            {
                string printed = words[at + 3 + i];
                if (expected[i] is { } value)
                {
                    // Tolerance: half the last printed digit (correct rounding).
                    Numbers.Equal(value / siPer, printed, $"{p.Parameter} {names[i]}");
                }
                else
                {
                    Assert.Equal("–", printed);
                }
            }
        }
    }

    [Fact]
    public void Metadata_names_the_certificate_and_its_signer()
    {
        CertificateSnapshot s = SyntheticContent.Certificate();
        using PdfDocument document = PdfDocument.Open(Render(s));
        Assert.Equal("Certificate of conformance " + s.CertificateNumber, document.Information.Title);
        Assert.Equal(s.Signature.SignerName, document.Information.Author);
        Assert.Contains(s.LotNumber, document.Information.Subject, StringComparison.Ordinal);
        Assert.Equal(s.Signature.SignedAt, document.Information.GetCreatedDateTimeOffset());
    }
}
