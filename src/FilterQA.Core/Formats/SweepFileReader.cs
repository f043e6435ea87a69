using System.Text.RegularExpressions;
using FilterQA.Core.Formats.Delimited;
using FilterQA.Core.Formats.Touchstone;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Formats;

/// <summary>
/// Reads a sweep file of any supported format, chosen by the name's extension (<c>.sNp</c> and
/// <c>.ts</c>: Touchstone; <c>.csv</c>, <c>.tsv</c>, <c>.txt</c>, <c>.dat</c>: delimited text) or, for
/// other names, by the content (a Touchstone option line or <c>[Version]</c> keyword before any data).
/// </summary>
public static partial class SweepFileReader
{
    /// <summary>Reads a sweep from its bytes.</summary>
    /// <param name="content">The file's bytes.</param>
    /// <param name="fileName">The file's name (its extension picks the format); used in messages.</param>
    /// <param name="delimitedOptions">Options for delimited text; ignored for Touchstone.</param>
    /// <exception cref="SweepReadException">The content cannot be read; nothing is returned.</exception>
    public static Sweep Read(ReadOnlySpan<byte> content, string fileName, DelimitedTextOptions? delimitedOptions = null)
    {
        ArgumentNullException.ThrowIfNull(fileName);
        return IsTouchstone(content, fileName)
            ? TouchstoneReader.Read(content, fileName)
            : DelimitedTextReader.Read(content, fileName, delimitedOptions);
    }

    /// <summary>Reads a sweep file; the sweep is named by the file name without its folder.</summary>
    /// <exception cref="SweepReadException">The file cannot be opened or read; nothing is returned.</exception>
    public static Sweep ReadFile(string path, DelimitedTextOptions? delimitedOptions = null)
    {
        byte[] content = SweepFileBytes.Read(path);
        return Read(content, Path.GetFileName(path), delimitedOptions);
    }

    /// <summary>True when the name or, failing that, the content says Touchstone.</summary>
    public static bool IsTouchstone(ReadOnlySpan<byte> content, string fileName)
    {
        ArgumentNullException.ThrowIfNull(fileName);
        string extension = Path.GetExtension(fileName);
        if (TouchstoneExtension().IsMatch(extension) || extension.Equals(".ts", StringComparison.OrdinalIgnoreCase))
        {
            return true;
        }
        if (DelimitedExtension().IsMatch(extension))
        {
            return false;
        }
        return StartsLikeTouchstone(content);
    }

    // The first line that is neither blank nor a '!' comment decides: Touchstone opens with its option
    // line or [Version]; a delimited file opens with a header, a '#' comment in words, or numbers.
    private static bool StartsLikeTouchstone(ReadOnlySpan<byte> content)
    {
        int limit = Math.Min(content.Length, 64 * 1024);
        int start = 0;
        while (start < limit)
        {
            int end = content[start..limit].IndexOf((byte)'\n');
            end = end < 0 ? limit : start + end;
            string line = System.Text.Encoding.ASCII.GetString(content[start..end]).Trim().TrimStart('\uFEFF');
            start = end + 1;
            if (line.Length == 0 || line[0] == '!')
            {
                continue;
            }
            return line.StartsWith("[version]", StringComparison.OrdinalIgnoreCase) || OptionLine().IsMatch(line);
        }
        return false;
    }

    [GeneratedRegex(@"^\.s\d{1,3}p$", RegexOptions.IgnoreCase | RegexOptions.CultureInvariant)]
    private static partial Regex TouchstoneExtension();

    [GeneratedRegex(@"^\.(csv|tsv|txt|dat)$", RegexOptions.IgnoreCase | RegexOptions.CultureInvariant)]
    private static partial Regex DelimitedExtension();

    [GeneratedRegex(@"^#(\s+(hz|khz|mhz|ghz|s|y|z|h|g|db|ma|ri|r\s+[-+0-9.eE]+))*\s*(!.*)?$", RegexOptions.IgnoreCase | RegexOptions.CultureInvariant)]
    private static partial Regex OptionLine();
}
