using System.Globalization;
using SkiaSharp;

namespace FilterQA.Reports.Pdf;

/// <summary>
/// A small layout engine: content is placed top to bottom between the margins and moves to a new page
/// when it does not fit. Everything is laid out first and drawn afterwards, so the footer knows the
/// page count ("page N of M"). Blocks (charts, a QR code) and table rows are never split.
/// </summary>
public sealed class PageFlow : IDisposable
{
    public const float MarginPt = 42;
    private const float HeaderBandPt = 26;
    private const float FooterBandPt = 22;
    private const float CellPadPt = 2.5f;

    private readonly ReportFonts _fonts;
    private readonly RunningHeader _header;
    private readonly List<List<Action<SKCanvas>>> _pages = [];
    private readonly Dictionary<(FontFace, float), SKFont> _fontCache = [];
    private float _y;

    public PageFlow(ReportFonts fonts, PaperSize paper, RunningHeader header)
    {
        _fonts = fonts ?? throw new ArgumentNullException(nameof(fonts));
        _header = header ?? throw new ArgumentNullException(nameof(header));
        Paper = paper;
        PageWidthPt = PaperSizes.WidthPt(paper);
        PageHeightPt = PaperSizes.HeightPt(paper);
        NewPage();
    }

    public PaperSize Paper { get; }

    public float PageWidthPt { get; }

    public float PageHeightPt { get; }

    public float LeftPt => MarginPt;

    public float ContentWidthPt => PageWidthPt - 2 * MarginPt;

    public float TopPt => MarginPt + HeaderBandPt;

    public float BottomPt => PageHeightPt - MarginPt - FooterBandPt;

    /// <summary>Space left on the current page, points.</summary>
    public float RemainingPt => BottomPt - _y;

    public int PageCount => _pages.Count;

    /// <summary>The vertical position of the next content, points from the top of the page.</summary>
    public float CursorPt => _y;

    public void NewPage()
    {
        _pages.Add([]);
        _y = TopPt;
    }

    public void Space(float heightPt) => _y = Math.Min(_y + heightPt, BottomPt);

    /// <summary>Starts a new page unless <paramref name="heightPt"/> still fits on this one.</summary>
    public void KeepTogether(float heightPt)
    {
        if (heightPt > RemainingPt && _y > TopPt)
        {
            NewPage();
        }
    }

    /// <summary>A paragraph wrapped to the content width (or <paramref name="widthPt"/>), moving on to the next page line by line.</summary>
    public void Text(string text, TextStyle style, float? widthPt = null, float indentPt = 0)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(style);
        SKFont font = Font(style);
        float lineHeight = LineHeight(style);
        foreach (string line in TextWrapper.Wrap(text, font, (widthPt ?? ContentWidthPt) - indentPt))
        {
            if (lineHeight > RemainingPt)
            {
                NewPage();
            }
            float baseline = _y - font.Metrics.Ascent;
            float x = LeftPt + indentPt;
            string captured = line;
            Draw(canvas => DrawLine(canvas, captured, x, baseline, CellAlign.Left, style));
            _y += lineHeight;
        }
    }

    public void Heading(string text)
    {
        KeepTogether(LineHeight(TextStyle.Heading) * 3);
        Space(6);
        Text(text, TextStyle.Heading);
        float y = _y + 1;
        Draw(canvas => Rule(canvas, LeftPt, y, LeftPt + ContentWidthPt, new SKColor(0x9a, 0xa3, 0xad), 0.6f));
        Space(5);
    }

    /// <summary>Label–value pairs in <paramref name="columns"/> columns, label in bold above nothing: "Label: value" wrapped within its column.</summary>
    public void Fields(IReadOnlyList<KeyValuePair<string, string>> fields, int columns = 2)
    {
        ArgumentNullException.ThrowIfNull(fields);
        ArgumentOutOfRangeException.ThrowIfLessThan(columns, 1);
        float columnWidth = ContentWidthPt / columns;
        float labelWidth = Math.Min(columnWidth * 0.5f, ContentWidthPt / 2 * 0.5f);
        TextStyle label = TextStyle.BodyBold with { SizePt = 8.5f };
        TextStyle value = TextStyle.Body with { SizePt = 8.5f };
        float lineHeight = LineHeight(value);
        for (int start = 0; start < fields.Count; start += columns)
        {
            var cells = new List<(float X, List<string> Label, List<string> Value)>();
            int lines = 1;
            for (int c = 0; c < columns && start + c < fields.Count; c++)
            {
                KeyValuePair<string, string> field = fields[start + c];
                List<string> labelLines = TextWrapper.Wrap(field.Key, Font(label), labelWidth - 4);
                List<string> valueLines = TextWrapper.Wrap(field.Value, Font(value), columnWidth - labelWidth - 6);
                lines = Math.Max(lines, Math.Max(labelLines.Count, valueLines.Count));
                cells.Add((LeftPt + c * columnWidth, labelLines, valueLines));
            }
            float height = lines * lineHeight + 2;
            if (height > RemainingPt)
            {
                NewPage();
            }
            float top = _y;
            foreach ((float x, List<string> labelLines, List<string> valueLines) in cells)
            {
                DrawLines(labelLines, x, top, label);
                DrawLines(valueLines, x + labelWidth, top, value);
            }
            _y += height;
        }
    }

    /// <summary>
    /// A table: its title, a header row repeated at the top of every page it continues on, and rows
    /// whose cells wrap within their column; a row that does not fit on the page moves whole to the next.
    /// </summary>
    /// <exception cref="InvalidOperationException">A single row is taller than a whole page.</exception>
    public void Table(ReportTable table)
    {
        ArgumentNullException.ThrowIfNull(table);
        TextStyle style = table.Style;
        TextStyle headerStyle = style with { Face = FontFace.Bold };
        float lineHeight = LineHeight(style);
        float totalWeight = table.Columns.Sum(c => c.Weight);
        float[] widths = table.Columns.Select(c => ContentWidthPt * c.Weight / totalWeight).ToArray();
        float[] lefts = new float[widths.Length];
        for (int i = 1; i < widths.Length; i++)
        {
            lefts[i] = lefts[i - 1] + widths[i - 1];
        }
        List<string>[] headerLines = table.Columns.Select((c, i) => TextWrapper.Wrap(c.Header, Font(headerStyle), widths[i] - 2 * CellPadPt)).ToArray();
        float headerHeight = headerLines.Max(l => l.Count) * LineHeight(headerStyle) + 2 * CellPadPt;
        float firstRowHeight = table.Rows.Count > 0 ? RowLines(table, 0, widths, style).Max(l => l.Count) * lineHeight + 2 * CellPadPt : 0;
        float titleHeight = table.Title is null ? 0 : LineHeight(TextStyle.BodyBold) + 2;
        KeepTogether(titleHeight + headerHeight + firstRowHeight);
        if (table.Title is not null)
        {
            Text(table.Title, TextStyle.BodyBold);
            Space(2);
        }
        DrawHeader();
        for (int r = 0; r < table.Rows.Count; r++)
        {
            List<string>[] cells = RowLines(table, r, widths, style);
            float height = cells.Max(l => l.Count) * lineHeight + 2 * CellPadPt;
            if (height + headerHeight > BottomPt - TopPt)
            {
                throw new InvalidOperationException(FormattableString.Invariant(
                    $"row {r + 1} of table '{table.Title}' is {height:F0} pt tall, more than a page holds"));
            }
            if (height > RemainingPt)
            {
                NewPage();
                if (table.Title is not null)
                {
                    Text(table.Title + " (continued)", TextStyle.BodyBold);
                    Space(2);
                }
                DrawHeader();
            }
            float top = _y;
            bool shaded = r % 2 == 1;
            TextStyle rowStyle = table.Rows[r].Alarm ? style.WithColour(TextStyle.Alarm) : style;
            Draw(canvas =>
            {
                if (shaded)
                {
                    Fill(canvas, SKRect.Create(LeftPt, top, ContentWidthPt, height), new SKColor(0xf4, 0xf6, 0xf8));
                }
                Rule(canvas, LeftPt, top + height, LeftPt + ContentWidthPt, new SKColor(0xd5, 0xda, 0xdf), 0.4f);
            });
            for (int c = 0; c < cells.Length; c++)
            {
                DrawCell(cells[c], LeftPt + lefts[c], widths[c], top, table.Columns[c].Align, rowStyle);
            }
            _y += height;
        }
        Space(4);

        void DrawHeader()
        {
            float top = _y;
            Draw(canvas =>
            {
                Fill(canvas, SKRect.Create(LeftPt, top, ContentWidthPt, headerHeight), new SKColor(0xe3, 0xe8, 0xee));
                Rule(canvas, LeftPt, top + headerHeight, LeftPt + ContentWidthPt, new SKColor(0x7d, 0x87, 0x92), 0.7f);
            });
            for (int c = 0; c < headerLines.Length; c++)
            {
                DrawCell(headerLines[c], LeftPt + lefts[c], widths[c], top, table.Columns[c].Align, headerStyle);
            }
            _y += headerHeight;
        }
    }

    /// <summary>
    /// A block of fixed height drawn by <paramref name="draw"/> (canvas, left, top, width, height in points), kept whole on one page.
    /// </summary>
    public void Block(float heightPt, Action<SKCanvas, SKRect> draw, float? widthPt = null, float indentPt = 0)
    {
        ArgumentNullException.ThrowIfNull(draw);
        if (heightPt > BottomPt - TopPt)
        {
            throw new ArgumentOutOfRangeException(nameof(heightPt), heightPt, FormattableString.Invariant($"a block must fit on a page ({BottomPt - TopPt:F0} pt)"));
        }
        KeepTogether(heightPt);
        if (heightPt > RemainingPt)
        {
            NewPage();
        }
        var rect = SKRect.Create(LeftPt + indentPt, _y, widthPt ?? ContentWidthPt - indentPt, heightPt);
        Draw(canvas => draw(canvas, rect));
        _y += heightPt;
    }

    /// <summary>Adds a drawing at absolute page coordinates to the current page (not moving the cursor).</summary>
    public void Draw(Action<SKCanvas> draw) => _pages[^1].Add(draw ?? throw new ArgumentNullException(nameof(draw)));

    /// <summary>Text at an absolute position of the current page (top of the line at <paramref name="topPt"/>).</summary>
    public void TextAt(string text, float xPt, float topPt, TextStyle style, CellAlign align = CellAlign.Left)
    {
        SKFont font = Font(style);
        float baseline = topPt - font.Metrics.Ascent;
        Draw(canvas => DrawLine(canvas, text, xPt, baseline, align, style));
    }

    public float LineHeight(TextStyle style) => Font(style).Spacing;

    public float MeasurePt(string text, TextStyle style) => Font(style).MeasureText(text);

    /// <summary>Draws every page into a PDF written to <paramref name="output"/>, with the running header and "page N of M".</summary>
    public void Write(Stream output, DocumentMetadata metadata)
    {
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(metadata);
        SKDocumentPdfMetadata pdf = SKDocumentPdfMetadata.Default;
        pdf.Title = metadata.Title;
        pdf.Author = metadata.Author;
        pdf.Subject = metadata.Subject;
        pdf.Creator = metadata.Creator;
        pdf.Producer = metadata.Producer;
        pdf.Creation = metadata.CreatedAt.UtcDateTime;
        pdf.Modified = metadata.CreatedAt.UtcDateTime;
        // Skia writes the PDF/A identification and XMP metadata; the output is not validated against PDF/A-2b.
        pdf.PdfA = true;
        using var managed = new SKManagedWStream(output, disposeManagedStream: false);
        using SKDocument document = SKDocument.CreatePdf(managed, pdf)
            ?? throw new InvalidOperationException("SkiaSharp could not create a PDF document on the output stream");
        for (int p = 0; p < _pages.Count; p++)
        {
            SKCanvas canvas = document.BeginPage(PageWidthPt, PageHeightPt);
            DrawRunning(canvas, p + 1, _pages.Count);
            foreach (Action<SKCanvas> draw in _pages[p])
            {
                canvas.Save();
                draw(canvas);
                canvas.Restore();
            }
            document.EndPage();
        }
        document.Close();
    }

    public void Dispose()
    {
        foreach (SKFont font in _fontCache.Values)
        {
            font.Dispose();
        }
        _fontCache.Clear();
    }

    internal SKFont Font(TextStyle style)
    {
        if (!_fontCache.TryGetValue((style.Face, style.SizePt), out SKFont? font))
        {
            font = new SKFont(_fonts.Typeface(style.Face), style.SizePt) { Subpixel = true, Edging = SKFontEdging.Antialias };
            _fontCache[(style.Face, style.SizePt)] = font;
        }
        return font;
    }

    private void DrawRunning(SKCanvas canvas, int page, int pages)
    {
        TextStyle head = TextStyle.BodyBold with { SizePt = 8.5f };
        TextStyle reference = TextStyle.Body with { SizePt = 8.5f, Colour = TextStyle.Muted };
        float headTop = MarginPt - 4;
        float right = PageWidthPt - MarginPt;
        float referenceWidth = MeasurePt(_header.Reference, reference);
        string title = Fit(_header.Title, head, ContentWidthPt - referenceWidth - 12);
        DrawLine(canvas, title, LeftPt, headTop - Font(head).Metrics.Ascent, CellAlign.Left, head);
        DrawLine(canvas, _header.Reference, right, headTop - Font(reference).Metrics.Ascent, CellAlign.Right, reference);
        Rule(canvas, LeftPt, headTop + LineHeight(head) + 2, right, new SKColor(0x7d, 0x87, 0x92), 0.6f);

        TextStyle foot = TextStyle.Small;
        float footTop = PageHeightPt - MarginPt - 10;
        Rule(canvas, LeftPt, footTop - 3, right, new SKColor(0xc0, 0xc6, 0xcc), 0.4f);
        string pageText = string.Create(CultureInfo.InvariantCulture, $"page {page} of {pages}");
        float pageWidth = MeasurePt(pageText, foot);
        DrawLine(canvas, Fit(_header.FooterNote, foot, ContentWidthPt - pageWidth - 12), LeftPt, footTop - Font(foot).Metrics.Ascent, CellAlign.Left, foot);
        DrawLine(canvas, pageText, right, footTop - Font(foot).Metrics.Ascent, CellAlign.Right, foot);
    }

    private string Fit(string text, TextStyle style, float widthPt)
    {
        if (MeasurePt(text, style) <= widthPt)
        {
            return text;
        }
        int length = text.Length;
        while (length > 1 && MeasurePt(text[..length] + "…", style) > widthPt)
        {
            length--;
        }
        return text[..length] + "…";
    }

    private List<string>[] RowLines(ReportTable table, int row, float[] widths, TextStyle style) =>
        table.Rows[row].Cells.Select((cell, c) => TextWrapper.Wrap(cell ?? string.Empty, Font(style), widths[c] - 2 * CellPadPt)).ToArray();

    private void DrawCell(List<string> lines, float left, float width, float top, CellAlign align, TextStyle style)
    {
        float x = align switch
        {
            CellAlign.Right => left + width - CellPadPt,
            CellAlign.Centre => left + width / 2,
            _ => left + CellPadPt,
        };
        DrawLines(lines, x, top + CellPadPt, style, align);
    }

    private void DrawLines(List<string> lines, float x, float top, TextStyle style, CellAlign align = CellAlign.Left)
    {
        SKFont font = Font(style);
        float lineHeight = font.Spacing;
        float ascent = font.Metrics.Ascent;
        string[] copy = [.. lines];
        Draw(canvas =>
        {
            for (int i = 0; i < copy.Length; i++)
            {
                DrawLine(canvas, copy[i], x, top + i * lineHeight - ascent, align, style);
            }
        });
    }

    private void DrawLine(SKCanvas canvas, string text, float x, float baseline, CellAlign align, TextStyle style)
    {
        if (text.Length == 0)
        {
            return;
        }
        using var paint = new SKPaint { Color = style.Colour, IsAntialias = true };
        SKTextAlign skAlign = align switch
        {
            CellAlign.Right => SKTextAlign.Right,
            CellAlign.Centre => SKTextAlign.Center,
            _ => SKTextAlign.Left,
        };
        canvas.DrawText(text, x, baseline, skAlign, Font(style), paint);
    }

    internal static void Rule(SKCanvas canvas, float x0, float y, float x1, SKColor colour, float widthPt)
    {
        using var paint = new SKPaint { Color = colour, StrokeWidth = widthPt, IsStroke = true, IsAntialias = true };
        canvas.DrawLine(x0, y, x1, y, paint);
    }

    internal static void Fill(SKCanvas canvas, SKRect rect, SKColor colour)
    {
        using var paint = new SKPaint { Color = colour, IsStroke = false };
        canvas.DrawRect(rect, paint);
    }
}
