using System.Globalization;
using FilterQA.Core.Decisions;
using FilterQA.Data;
using FilterQA.Data.Entities;
using FilterQA.Data.Services;
using FilterQA.Data.Services.Certificates;
using FilterQA.Reports.Documents;
using FilterQA.Reports.Pdf;
using FilterQA.Reports.Tests.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Reports.Tests.Sources;

/// <summary>
/// A certificate signed for a lot measured through the intake, printed, and read back with PdfPig: every number on it
/// is checked against the database rows it stands for, each computed here with the plain formula (count, min, mean,
/// max), not taken from the snapshot the document was drawn from.
/// </summary>
public sealed class StoredCertificateTests : IAsyncLifetime
{
    private const string LotNumber = "VP-2611-0103";
    private ReportStore _store = null!;

    public async Task InitializeAsync()
    {
        _store = await ReportStore.CreateAsync();
        await _store.LotAsync(LotNumber, 8, 0, 103, decide: true);
    }

    public async Task DisposeAsync() => await _store.DisposeAsync();

    private CertificateService Certificates()
    {
        var options = new CertificateOptions { IssuerName = "Tarnwell Marine Electronics", PublicBaseUrl = "http://127.0.0.1:5180", NumberPrefix = "TME-COC" };
        options.IssuerAddressLines.Add("Incoming quality control");
        return new CertificateService(_store.Contexts, _store.Lots, options, _store.Clock);
    }

    [Theory]
    [InlineData(PaperSize.A4)]
    [InlineData(PaperSize.Letter)]
    public async Task Every_number_printed_on_a_stored_lots_certificate_equals_the_database(PaperSize paper)
    {
        IssuedCertificate issued = await Certificates().IssueAsync(LotNumber, "lot released for shipment", ReportStore.Approver);
        using var stream = new MemoryStream();
        new CertificateDocument(TestFonts.Default).Render(issued.Snapshot, paper, stream);
        string text = Assert.Single(PdfText.Pages(stream.ToArray()));
        string squeezed = text.Replace(" ", string.Empty, StringComparison.Ordinal);

        await using FilterQaDbContext context = _store.NewContext();
        LotRecord lot = await context.Lots.AsNoTracking().SingleAsync(l => l.LotNumber == LotNumber);
        Assert.Equal(LotStatus.Accepted, lot.Status);
        TemplateRevisionRecord revision = await context.TemplateRevisions.AsNoTracking().SingleAsync(r => r.Id == lot.TemplateRevisionId);
        CertificateRecord certificate = await context.Certificates.AsNoTracking().SingleAsync(c => c.LotId == lot.Id);
        List<MeasurementRecord> counted = await context.Measurements.AsNoTracking().Where(m => m.LotId == lot.Id && m.CountsForLot).ToListAsync();
        long[] countedIds = counted.Select(m => m.Id).ToArray();
        List<RuleResultRecord> rules = await context.RuleResults.AsNoTracking().Where(r => countedIds.Contains(r.MeasurementId)).ToListAsync();

        Assert.Contains(certificate.CertificateNumber, text, StringComparison.Ordinal);
        // The digest in full, in groups of 8 hex digits as printed.
        Assert.Contains(string.Join(' ', Enumerable.Range(0, 8).Select(i => certificate.DataDigestSha256.Substring(i * 8, 8))), text, StringComparison.Ordinal);
        Assert.Contains(revision.ContentHash, squeezed, StringComparison.Ordinal);
        int conforming = counted.Count(m => m.Verdict == UnitVerdict.Go);
        foreach (string expected in new[]
        {
            "Template revision " + Invariant(revision.Revision),
            "Quantity received " + Invariant(lot.QuantityReceived),
            "Quantity sampled " + Invariant(counted.Count),
            "Sample size " + Invariant(lot.Plan.SampleSize),
            "Acceptance number (Ac) " + Invariant(lot.Plan.AcceptanceNumber),
            "(Re) " + Invariant(lot.Plan.RejectionNumber),
            "Units tested " + Invariant(counted.Count),
            "Units conforming " + Invariant(conforming),
            "non-conforming " + Invariant(counted.Count - conforming),
            lot.Supplier, lot.SupplierLot!, lot.DateCode!, lot.PurchaseOrder!, lot.Customer!,
        })
        {
            Assert.True(PdfText.HasWordsInOrder(text, expected), $"'{expected}' is not printed");
        }

        // Each parameter line: name, unit, count, minimum, mean, maximum (then its limits), over the counted units' values.
        string[] words = text.Split(' ');
        IGrouping<string, RuleResultRecord>[] parameters = rules.Where(r => r.MeasuredValue is { } v && double.IsFinite(v)).GroupBy(r => r.RuleId).ToArray();
        Assert.NotEmpty(parameters);
        foreach (IGrouping<string, RuleResultRecord> parameter in parameters)
        {
            double[] values = parameter.Select(r => r.MeasuredValue!.Value).ToArray();
            int at = Array.IndexOf(words, parameter.Key);
            Assert.True(at >= 0, $"parameter {parameter.Key} is not printed");
            double siPer = SiUnits.SiPer(words[at + 1]);
            Assert.Equal(Invariant(values.Length), words[at + 2]);
            Numbers.Equal(values.Min() / siPer, words[at + 3], parameter.Key + " minimum");
            Numbers.Equal(values.Sum() / values.Length / siPer, words[at + 4], parameter.Key + " mean");
            Numbers.Equal(values.Max() / siPer, words[at + 5], parameter.Key + " maximum");
        }
    }

    [Fact]
    public async Task Asking_again_prints_the_same_number_and_a_second_lot_gets_the_next_one()
    {
        CertificateService certificates = Certificates();
        IssuedCertificate first = await certificates.IssueAsync(LotNumber, "lot released for shipment", ReportStore.Approver);
        IssuedCertificate again = await certificates.IssueAsync(LotNumber, "asked twice", ReportStore.Approver);
        _store.Clock.Advance(TimeSpan.FromHours(1));
        await _store.LotAsync("VP-2611-0104", 4, 0, 104, decide: true);
        IssuedCertificate second = await certificates.IssueAsync("VP-2611-0104", "lot released for shipment", ReportStore.Approver);

        Assert.Equal((first.CertificateNumber, false), (again.CertificateNumber, again.NewlyIssued));
        Assert.NotEqual(first.CertificateNumber, second.CertificateNumber);
        await using FilterQaDbContext context = _store.NewContext();
        string[] numbers = await context.Certificates.AsNoTracking().Select(c => c.CertificateNumber).ToArrayAsync();
        Assert.Equal(numbers.Length, numbers.Distinct(StringComparer.Ordinal).Count());
        Assert.Equal(2, numbers.Length);
    }

    private static string Invariant(int value) => value.ToString(CultureInfo.InvariantCulture);
}
