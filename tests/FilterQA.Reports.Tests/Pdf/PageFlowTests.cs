using System.Globalization;
using System.Text.RegularExpressions;
using FilterQA.Reports.Pdf;
using FilterQA.Reports.Tests.Infrastructure;
using UglyToad.PdfPig;

namespace FilterQA.Reports.Tests.Pdf;

public sealed class PageFlowTests
{
    private static readonly DateTimeOffset Created = new(2026, 11, 4, 9, 30, 0, TimeSpan.Zero);

    private static byte[] Render(PaperSize paper, Action<PageFlow> content, DocumentMetadata? metadata = null)
    {
        using var flow = new PageFlow(TestFonts.Default, paper, new RunningHeader("Layout check", "lot VP-2611-0042", "footer note"));
        content(flow);
        using var stream = new MemoryStream();
        flow.Write(stream, metadata ?? new DocumentMetadata("Layout check", "J. Lindqvist", "Page flow test", Created));
        return stream.ToArray();
    }

    // ISO 216: A4 is 210 mm x 297 mm = 595.28 x 841.89 pt, written as 595 x 842 pt; ANSI/ASME Y14.1: Letter is 8.5 in x 11 in = 612 x 792 pt.
    [Theory]
    [InlineData(PaperSize.A4, 595, 842)]
    [InlineData(PaperSize.Letter, 612, 792)]
    public void Pages_have_the_size_of_the_paper(PaperSize paper, double widthPt, double heightPt)
    {
        byte[] pdf = Render(paper, flow => flow.Text("one line", TextStyle.Body));
        using PdfDocument document = PdfDocument.Open(pdf);
        var page = document.GetPage(1);
        // Tolerance 0.01 pt: the media box is written with integers; the slack only covers float printing.
        Assert.Equal(widthPt, page.Width, 0.01);
        Assert.Equal(heightPt, page.Height, 0.01);
    }

    [Theory]
    [InlineData("a4", PaperSize.A4, true)]
    [InlineData("A4", PaperSize.A4, true)]
    [InlineData("letter", PaperSize.Letter, true)]
    [InlineData(" Letter ", PaperSize.Letter, true)]
    [InlineData(null, PaperSize.A4, true)]
    [InlineData("", PaperSize.A4, true)]
    [InlineData("a3", PaperSize.A4, false)]
    [InlineData("legal", PaperSize.A4, false)]
    public void Paper_names_are_a4_or_letter(string? text, PaperSize expected, bool known)
    {
        Assert.Equal(known, PaperSizes.TryParse(text, out PaperSize paper));
        Assert.Equal(expected, paper);
    }

    [Fact]
    public void Metadata_is_written_and_read_back_by_an_independent_reader()
    {
        byte[] pdf = Render(PaperSize.A4, flow => flow.Text("metadata", TextStyle.Body),
            new DocumentMetadata("Yield report, lot VP-2611-0042", "J. Lindqvist", "Yield of part TME-CF455-15", Created));
        using PdfDocument document = PdfDocument.Open(pdf);
        Assert.Equal("Yield report, lot VP-2611-0042", document.Information.Title);
        Assert.Equal("J. Lindqvist", document.Information.Author);
        Assert.Equal("Yield of part TME-CF455-15", document.Information.Subject);
        Assert.Equal("FilterQA", document.Information.Creator);
        Assert.Equal("FilterQA Reports (SkiaSharp PDF)", document.Information.Producer);
        DateTimeOffset? created = document.Information.GetCreatedDateTimeOffset();
        Assert.Equal(Created, created);
        // PDF/A identification lives in the XMP packet (ISO 19005: pdfaid:part); it is flagged, not validated.
        Assert.True(document.TryGetXmpMetadata(out var xmp), "no XMP metadata: the PDF/A flag was not written");
        Assert.Contains("pdfaid", System.Text.Encoding.UTF8.GetString(xmp.GetXmlBytes().ToArray()), StringComparison.Ordinal);
    }

    [Fact]
    public void Fonts_are_embedded_once_per_face()
    {
        byte[] pdf = Render(PaperSize.A4, flow =>
        {
            for (int i = 0; i < 120; i++)
            {
                flow.Text("regular text that fills pages " + i.ToString(CultureInfo.InvariantCulture), TextStyle.Body);
                flow.Text("bold text", TextStyle.BodyBold);
                flow.Text("0123 abcd mono", TextStyle.Mono);
            }
        });
        using PdfDocument document = PdfDocument.Open(pdf);
        Assert.True(document.NumberOfPages > 1);
        var fontNames = document.GetPages().SelectMany(p => p.Letters).Select(l => l.FontName).Distinct().ToArray();
        Assert.All(fontNames, name => Assert.Contains("DejaVu", name, StringComparison.Ordinal));
        // Every font descriptor points to an embedded TrueType program (FontFile2, ISO 32000-1 table 126) and there is one
        // program per face for the whole document, not one per page.
        var descriptors = PdfObjects.Dictionaries(document).Where(d => d.ContainsKey("FontName") && d.ContainsKey("Flags")).ToArray();
        Assert.NotEmpty(descriptors);
        Assert.All(descriptors, d => Assert.True(d.ContainsKey("FontFile2") || d.ContainsKey("FontFile3") || d.ContainsKey("FontFile"), "a font is not embedded"));
        Assert.Equal(3, descriptors.Length);
    }

    [Fact]
    public void A_table_of_200_rows_breaks_across_pages_with_the_header_repeated_and_rows_whole()
    {
        var rows = Enumerable.Range(1, 200).Select(i => new TableRow(
        [
            "r" + i.ToString("000", CultureInfo.InvariantCulture),
            // Some rows wrap to several lines so that row heights differ.
            i % 7 == 0 ? "a longer description that wraps onto a second and a third line in this narrow column, row " + i.ToString(CultureInfo.InvariantCulture) : "short",
            "v" + i.ToString("000", CultureInfo.InvariantCulture),
        ])).ToArray();
        byte[] pdf = Render(PaperSize.Letter, flow =>
        {
            flow.Text("Before the table", TextStyle.Body);
            flow.Table(new ReportTable("Two hundred rows", [new TableColumn("Key", 1), new TableColumn("Description", 2), new TableColumn("Value", 1, CellAlign.Right)], rows));
        });
        IReadOnlyList<string> pages = PdfText.Pages(pdf);
        Assert.True(pages.Count >= 3, $"200 rows should need several pages, got {pages.Count}");
        var seen = new List<int>();
        for (int p = 0; p < pages.Count; p++)
        {
            string text = pages[p];
            Assert.Contains(FormattableString.Invariant($"page {p + 1} of {pages.Count}"), text, StringComparison.Ordinal);
            Assert.Contains("Key Description Value", text, StringComparison.Ordinal);
            if (p > 0)
            {
                Assert.Contains("Two hundred rows (continued)", text, StringComparison.Ordinal);
            }
            var keys = Regex.Matches(text, @"\br(\d{3})\b").Select(m => int.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture)).ToArray();
            var values = Regex.Matches(text, @"\bv(\d{3})\b").Select(m => int.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture)).ToArray();
            // A row is whole on its page: its key and its value cell are on the same page.
            Assert.Equal(keys, values);
            seen.AddRange(keys);
        }
        Assert.Equal(Enumerable.Range(1, 200), seen);
    }

    [Fact]
    public void Long_text_wraps_within_the_margins()
    {
        string words = string.Join(' ', Enumerable.Repeat("inspection", 300));
        byte[] pdf = Render(PaperSize.A4, flow => flow.Text(words, TextStyle.Body));
        using PdfDocument document = PdfDocument.Open(pdf);
        foreach (var page in document.GetPages())
        {
            foreach (var word in page.GetWords())
            {
                Assert.True(word.BoundingBox.Left >= PageFlow.MarginPt - 0.5 && word.BoundingBox.Right <= page.Width - PageFlow.MarginPt + 0.5,
                    $"'{word.Text}' at {word.BoundingBox} leaves the margins");
            }
        }
        Assert.Equal(300, PdfText.All(pdf).Split(' ').Count(w => w == "inspection"));
    }

    [Fact]
    public void A_font_folder_without_the_fonts_is_a_clear_error_naming_it()
    {
        string folder = Path.Combine(Path.GetTempPath(), "filterqa-no-fonts-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(folder);
        try
        {
            var error = Assert.Throws<ReportFontsMissingException>(() => ReportFonts.Load(folder));
            Assert.Contains(folder, error.Message, StringComparison.Ordinal);
            Assert.Contains("DejaVuSans.ttf", error.Message, StringComparison.Ordinal);
            Assert.Contains("fonts-dejavu-core", error.Message, StringComparison.Ordinal);
            Assert.Contains(Path.Combine(folder, "DejaVuSansMono.ttf"), error.SearchedPaths);
        }
        finally
        {
            Directory.Delete(folder, true);
        }
    }
}
