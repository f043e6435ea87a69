using Xunit.Abstractions;
using FilterQA.Reports.Documents;
using FilterQA.Reports.Pdf;
using FilterQA.Reports.Tests.Infrastructure;

namespace FilterQA.Reports.Tests.Documents;

/// <summary>
/// Renders a certificate and a yield report to PNG (pdftoppm, poppler) into tests/TestResults/documents/ for people
/// to look at. Under CI=true a missing pdftoppm fails; elsewhere the test says so and returns.
/// </summary>
public sealed class PreviewTests(ITestOutputHelper output)
{
    [Fact]
    public void Certificate_and_yield_report_render_to_png_previews()
    {
        string? tool = Artefacts.PdfToPpm();
        if (tool is null)
        {
            Assert.False(string.Equals(Environment.GetEnvironmentVariable("CI"), "true", StringComparison.OrdinalIgnoreCase),
                "pdftoppm (Debian poppler-utils) is missing; CI must install it");
            output.WriteLine("pdftoppm not found: previews skipped (install poppler-utils)");
            return;
        }
        string folder = Artefacts.Folder;
        var fonts = TestFonts.Default;
        var written = new List<string>();
        string certificate = Path.Combine(folder, "certificate-a4.pdf");
        using (FileStream file = File.Create(certificate))
        {
            new CertificateDocument(fonts).Render(SyntheticContent.Certificate(), PaperSize.A4, file);
        }
        written.AddRange(Artefacts.ToPng(tool, certificate));
        string yield = Path.Combine(folder, "yield-report-letter.pdf");
        using (FileStream file = File.Create(yield))
        {
            new YieldReportDocument(fonts).Render(SyntheticContent.Yield(400), PaperSize.Letter, file);
        }
        written.AddRange(Artefacts.ToPng(tool, yield));
        string rejection = Path.Combine(folder, "rejection-report-a4.pdf");
        using (FileStream file = File.Create(rejection))
        {
            new RejectionReportDocument(fonts).Render(SyntheticContent.Rejection(), PaperSize.A4, file);
        }
        written.AddRange(Artefacts.ToPng(tool, rejection));
        string unit = Path.Combine(folder, "unit-report-a4.pdf");
        using (FileStream file = File.Create(unit))
        {
            new UnitReportDocument(fonts).Render(SyntheticContent.Unit(), PaperSize.A4, file);
        }
        written.AddRange(Artefacts.ToPng(tool, unit));
        foreach (string png in written)
        {
            output.WriteLine(png);
            Assert.True(new FileInfo(png).Length > 10_000, $"{png} is nearly empty");
        }
    }
}
