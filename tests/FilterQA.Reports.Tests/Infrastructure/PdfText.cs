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

    public static string All(byte[] pdf) => string.Join('\n', Pages(pdf));

    public static IReadOnlyList<IReadOnlyList<Word>> Words(byte[] pdf)
    {
        using PdfDocument document = PdfDocument.Open(pdf);
        return document.GetPages().Select(p => (IReadOnlyList<Word>)p.GetWords().ToArray()).ToArray();
    }
}
