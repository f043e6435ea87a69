using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Formats.Delimited;

/// <summary>What the words of one header cell say about its column. Matching ignores case.</summary>
internal static class DelimitedHeaderWords
{
    /// <summary>
    /// A frequency column: the cell contains "freq", or its name is just "f" ("f/GHz", "f (MHz)"),
    /// or it is only a frequency unit ("Hz", "[MHz]").
    /// </summary>
    public static bool IsFrequency(string header)
    {
        if (header.Contains("freq", StringComparison.OrdinalIgnoreCase))
        {
            return true;
        }
        ReadOnlySpan<char> name = LeadingLetters(header.AsSpan().TrimStart());
        if (name.Equals("f", StringComparison.OrdinalIgnoreCase))
        {
            return true;
        }
        ReadOnlySpan<char> bare = header.AsSpan().Trim().Trim("()[] ");
        return FrequencyUnitExtensions.TryParse(bare, out _);
    }

    /// <summary>A phase column: "phase", "deg", "angle" or a degree sign.</summary>
    public static bool IsPhase(string header) =>
        header.Contains("phase", StringComparison.OrdinalIgnoreCase)
        || header.Contains("deg", StringComparison.OrdinalIgnoreCase)
        || header.Contains("angle", StringComparison.OrdinalIgnoreCase)
        || header.Contains('\u00B0', StringComparison.Ordinal);

    /// <summary>A phase column in radians: a "rad" word and no degree word.</summary>
    public static bool IsRadians(string header) =>
        HasWord(header, "rad") || HasWord(header, "radians")
            ? !header.Contains("deg", StringComparison.OrdinalIgnoreCase) && !header.Contains('\u00B0', StringComparison.Ordinal)
            : false;

    /// <summary>
    /// A level that is a linear magnitude or a real/imaginary part, not dB: a "mag", "lin", "re", "im",
    /// "real" or "imag" word without a dB unit. Reading such a column as dB would be silently wrong.
    /// </summary>
    public static bool LooksLinear(string header) =>
        LevelUnitOf(header, out _) == DelimitedLevelUnit.None
        && (HasWord(header, "mag") || HasWord(header, "magnitude") || HasWord(header, "lin") || HasWord(header, "linear")
            || HasWord(header, "re") || HasWord(header, "im") || HasWord(header, "real") || HasWord(header, "imag"));

    /// <summary>
    /// The dB unit named by the cell: "db" that does not continue a word ("S21 dB", "S21dB", "gain_db",
    /// "dB(S21)") is dB; "dbm" is dBm; "db" followed by other letters (dBuV, dBc) is another unit,
    /// returned in <paramref name="unitText"/>.
    /// </summary>
    public static DelimitedLevelUnit LevelUnitOf(string header, out string unitText)
    {
        for (int k = 0; k + 1 < header.Length; k++)
        {
            if (char.ToLowerInvariant(header[k]) != 'd' || char.ToLowerInvariant(header[k + 1]) != 'b')
            {
                continue;
            }
            if (k > 0 && char.IsLetter(header[k - 1]))
            {
                continue;
            }
            int end = k + 2;
            while (end < header.Length && char.IsLetter(header[end]))
            {
                end++;
            }
            unitText = header[k..end];
            if (end == k + 2)
            {
                return DelimitedLevelUnit.Db;
            }
            return unitText.Equals("dbm", StringComparison.OrdinalIgnoreCase) ? DelimitedLevelUnit.Dbm : DelimitedLevelUnit.Other;
        }
        unitText = "";
        return DelimitedLevelUnit.None;
    }

    /// <summary>The S-parameter named in the cell ("s21" for "S21 dB"), lower case; null when none.</summary>
    public static string? SParameterOf(string header)
    {
        for (int k = 0; k + 2 < header.Length; k++)
        {
            if ((header[k] is 's' or 'S') && (k == 0 || !char.IsLetter(header[k - 1]))
                && char.IsAsciiDigit(header[k + 1]) && char.IsAsciiDigit(header[k + 2])
                && (k + 3 == header.Length || !char.IsAsciiDigit(header[k + 3])))
            {
                return string.Concat("s", header.AsSpan(k + 1, 2));
            }
        }
        return null;
    }

    /// <summary>
    /// The frequency unit a frequency header names: the text in brackets or after a slash
    /// ("Frequency (MHz)", "Freq [kHz]", "f/GHz"), else a word ending in "hz" ("Frequency Hz",
    /// "freq_mhz", "FreqGHz").
    /// </summary>
    /// <returns>
    /// True with <paramref name="unit"/> null when the header names no unit; false when it names one
    /// that is not Hz, kHz, MHz or GHz, with that text in <paramref name="unknown"/>.
    /// </returns>
    public static bool TryFrequencyUnitOf(string header, out FrequencyUnit? unit, out string unknown)
    {
        unit = null;
        unknown = "";
        int open = header.IndexOfAny(['(', '[', '/']);
        if (open >= 0)
        {
            char close = header[open] switch { '(' => ')', '[' => ']', _ => '\0' };
            int end = close == '\0' ? header.Length : header.IndexOf(close, open + 1);
            ReadOnlySpan<char> inside = header.AsSpan(open + 1, (end < 0 ? header.Length : end) - open - 1).Trim();
            if (inside.IsEmpty)
            {
                return true;
            }
            if (FrequencyUnitExtensions.TryParse(inside, out FrequencyUnit bracketed))
            {
                unit = bracketed;
                return true;
            }
            unknown = inside.ToString();
            return false;
        }
        int i = 0;
        while (i < header.Length)
        {
            while (i < header.Length && !char.IsLetter(header[i]))
            {
                i++;
            }
            int start = i;
            while (i < header.Length && char.IsLetter(header[i]))
            {
                i++;
            }
            ReadOnlySpan<char> word = header.AsSpan(start, i - start);
            if (!word.EndsWith("hz", StringComparison.OrdinalIgnoreCase))
            {
                continue;
            }
            ReadOnlySpan<char> candidate = StripPrefix(StripPrefix(word, "frequency"), "freq");
            if (FrequencyUnitExtensions.TryParse(candidate, out FrequencyUnit named))
            {
                unit = named;
                return true;
            }
            unknown = candidate.ToString();
            return false;
        }
        return true;
    }

    private static ReadOnlySpan<char> StripPrefix(ReadOnlySpan<char> word, string prefix) =>
        word.StartsWith(prefix, StringComparison.OrdinalIgnoreCase) ? word[prefix.Length..] : word;

    private static ReadOnlySpan<char> LeadingLetters(ReadOnlySpan<char> text)
    {
        int n = 0;
        while (n < text.Length && char.IsLetter(text[n]))
        {
            n++;
        }
        return text[..n];
    }

    private static bool HasWord(string header, string word)
    {
        int i = 0;
        while (i < header.Length)
        {
            while (i < header.Length && !char.IsLetter(header[i]))
            {
                i++;
            }
            int start = i;
            while (i < header.Length && char.IsLetter(header[i]))
            {
                i++;
            }
            if (header.AsSpan(start, i - start).Equals(word, StringComparison.OrdinalIgnoreCase))
            {
                return true;
            }
        }
        return false;
    }
}
