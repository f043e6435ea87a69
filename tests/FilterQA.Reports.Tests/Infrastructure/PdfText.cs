using UglyToad.PdfPig;
using UglyToad.PdfPig.Content;

namespace FilterQA.Reports.Tests.Infrastructure;

/// <summary>Reading a PDF back with PdfPig, an independent PDF reader.</summary>
public static class PdfText
{
    /// <summary>The text of each page, words joined by single spaces in reading order as PdfPig extracts them.</summary>
    public static IReadOnlyList<string> Pages(byte[] pdf)
    {
        using PdfDocument document = PdfDocument.Open(pdf);
        return document.GetPages().Select(p => string.Join(' ', p.GetWords().Select(w => w.Text))).ToArray();
    }

    /// <summary>True when the words of <paramref name="expected"/> appear in <paramref name="text"/> in the same order (others may come between).</summary>
    public static bool HasWordsInOrder(string text, string expected)
    {
        string[] words = text.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        int at = 0;
        foreach (string word in expected.Split(' ', StringSplitOptions.RemoveEmptyEntries))
        {
            while (at < words.Length && words[at] != word)
            {
                at++;
            }
            if (at == words.Length)
            {
                return false;
            }
            at++;
        }
        return true;
    }

    /// <summary>Printed lines, top to bottom on each page: words whose baselines lie within 2 pt, left to right.</summary>
    public static IReadOnlyList<string[]> Lines(byte[] pdf)
    {
        using PdfDocument document = PdfDocument.Open(pdf);
        var lines = new List<string[]>();
        foreach (Page page in document.GetPages())
        {
            var groups = new List<List<Word>>();
            foreach (Word word in page.GetWords().OrderByDescending(w => w.BoundingBox.Bottom))
            {
                List<Word>? line = groups.LastOrDefault();
                if (line is null || Math.Abs(line[0].BoundingBox.Bottom - word.BoundingBox.Bottom) > 2)
                {
                    groups.Add([word]);
                }
                else
                {
                    line.Add(word);
                }
            }
            lines.AddRange(groups.Select(g => g.OrderBy(w => w.BoundingBox.Left).Select(w => w.Text).ToArray()));
        }
        return lines;
    }

    public static string All(byte[] pdf) => string.Join('\n', Pages(pdf));

    public static IReadOnlyList<IReadOnlyList<Word>> Words(byte[] pdf)
    {
        using PdfDocument document = PdfDocument.Open(pdf);
        return document.GetPages().Select(p => (IReadOnlyList<Word>)p.GetWords().ToArray()).ToArray();
    }
}
