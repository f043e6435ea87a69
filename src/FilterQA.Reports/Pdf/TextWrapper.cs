using SkiaSharp;

namespace FilterQA.Reports.Pdf;

/// <summary>Breaks text into lines no wider than a width: at spaces, and inside a word only when the word alone is too wide.</summary>
internal static class TextWrapper
{
    public static List<string> Wrap(string text, SKFont font, float widthPt)
    {
        var lines = new List<string>();
        foreach (string paragraph in text.Replace("\r\n", "\n", StringComparison.Ordinal).Split('\n'))
        {
            WrapParagraph(paragraph, font, widthPt, lines);
        }
        return lines;
    }

    private static void WrapParagraph(string paragraph, SKFont font, float widthPt, List<string> lines)
    {
        string[] words = paragraph.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        if (words.Length == 0)
        {
            lines.Add(string.Empty);
            return;
        }
        string current = string.Empty;
        foreach (string word in words)
        {
            string candidate = current.Length == 0 ? word : current + " " + word;
            if (font.MeasureText(candidate) <= widthPt)
            {
                current = candidate;
                continue;
            }
            if (current.Length > 0)
            {
                lines.Add(current);
            }
            current = word;
            while (current.Length > 1 && font.MeasureText(current) > widthPt)
            {
                int fit = current.Length - 1;
                while (fit > 1 && font.MeasureText(current[..fit]) > widthPt)
                {
                    fit--;
                }
                lines.Add(current[..fit]);
                current = current[fit..];
            }
        }
        lines.Add(current);
    }
}
