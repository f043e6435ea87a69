using System.Security.Cryptography;
using System.Text;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Formats.Delimited;

/// <summary>
/// Reads a sweep exported as delimited text by instruments and spreadsheets: a frequency column, a
/// level column (a gain in dB, e.g. S21 dB, or a power in dBm, e.g. the max-hold trace of a stepped
/// generator and spectrum analyser) and an optional phase column in degrees.
/// </summary>
/// <remarks>
/// <para><b>Text.</b> UTF-8 (a byte-order mark is skipped and noted as a warning); lines end in CR, LF or
/// CRLF. Blank lines are skipped. A line whose first visible character is '#' or '!' is a comment, kept
/// in <see cref="SweepSource.Notes"/> without the mark, wherever it appears. Control characters (tab
/// aside) and bytes that are not UTF-8 are refused: they mean a binary file or another encoding.</para>
/// <para><b>Cells.</b> The delimiter is a comma, tab or semicolon, given in the options or detected from
/// the first row that is not a comment (a tab if it has one, else a semicolon, else a comma). Cells may
/// be quoted ("..." with "" for a quote); a quote closes on its own line. White space around a cell is
/// ignored. A decimal comma is accepted only in a semicolon-delimited file (where '.' also works); in a
/// comma or tab file it is an error naming the cell. An empty last cell on every row (a trailing
/// delimiter) is not a column. Every row has as many cells as the first.</para>
/// <para><b>Header.</b> The first row that is not a comment is the header when none of its cells is a
/// number; otherwise the file has no header and its columns are frequency, level and optional phase,
/// with the unit and quantity from the options (default hertz and a gain in dB). In a header the
/// columns are found by their words (case ignored): the first cell containing "freq" (or named "f", or
/// only a unit like "Hz") is the frequency; a cell containing "phase", "deg", "angle" or "°" is the
/// phase; a cell with "dBm" is a power, one with "dB" a gain (one naming S21 is preferred when there
/// are several; a phase naming the same S-parameter is preferred). A header of at most three cells
/// without any dB word takes the column after the frequency as the level. Other columns are ignored.
/// The frequency unit comes from the header ("Frequency (MHz)", "Freq [kHz]", "f/GHz",
/// "Frequency Hz", "freq_mhz") or the options; units are Hz, kHz, MHz, GHz, case ignored.</para>
/// <para><b>Values.</b> Decimal numbers only (sign, digits, one decimal mark, exponent). Frequencies are
/// scaled to hertz by shifting the decimal exponent (one rounding, so 10.7 MHz is exactly 10 700 000 Hz),
/// must be 0 Hz or more and strictly increase. NaN, infinities and values beyond the double range
/// (1e400) are refused.</para>
/// <para><b>Errors.</b> Any problem throws <see cref="SweepReadException"/> and nothing else, with the
/// 1-based line and column; the column is the 1-based <i>cell number</i> in the row (not a character
/// position); both are 0 when the problem concerns the whole file or line. No partial sweep is returned.
/// </para>
/// </remarks>
public static class DelimitedTextReader
{
    private static readonly UTF8Encoding Utf8 = new(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: false);

    /// <summary>Reads a sweep from the bytes of a delimited text file.</summary>
    /// <param name="content">The file's bytes, exactly as stored; their SHA-256 goes into the source.</param>
    /// <param name="fileName">Name shown in errors and kept in <see cref="SweepSource.FileName"/>; may be empty.</param>
    /// <param name="options">How to read; null detects everything (<see cref="DelimitedTextOptions.Detect"/>).</param>
    /// <returns>A scalar sweep (<see cref="SweepFormat.DelimitedText"/>) with level in dB (gain) or dBm (power).</returns>
    /// <exception cref="SweepReadException">The content is not a readable sweep; names line, cell and problem.</exception>
    /// <exception cref="ArgumentNullException"><paramref name="fileName"/> is null.</exception>
    public static Sweep Read(ReadOnlySpan<byte> content, string fileName, DelimitedTextOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(fileName);
        options ??= DelimitedTextOptions.Detect;
        string sha256 = Convert.ToHexStringLower(SHA256.HashData(content));
        var warnings = new List<string>();
        ReadOnlySpan<byte> bytes = content;
        if (bytes.StartsWith((ReadOnlySpan<byte>)[0xEF, 0xBB, 0xBF]))
        {
            bytes = bytes[3..];
            warnings.Add("the file starts with a UTF-8 byte-order mark, which was skipped");
        }
        if (bytes.IsEmpty)
        {
            throw new SweepReadException(fileName, 0, 0, "the file is empty; expected rows of frequency and level");
        }
        if (bytes.StartsWith((ReadOnlySpan<byte>)[0xFF, 0xFE]) || bytes.StartsWith((ReadOnlySpan<byte>)[0xFE, 0xFF]))
        {
            throw new SweepReadException(fileName, 0, 0, "the file is UTF-16 text; expected UTF-8 (save or export it as UTF-8)");
        }
        // Undecodable bytes become U+FFFD here and are refused with their line and cell by the parser.
        string text = Utf8.GetString(bytes);
        try
        {
            (ScalarTrace trace, IReadOnlyList<string> notes) = DelimitedTextParser.Parse(text, options);
            return Sweep.FromScalar(trace, new SweepSource(fileName, SweepFormat.DelimitedText, sha256, notes, warnings));
        }
        catch (DelimitedProblem problem)
        {
            throw new SweepReadException(fileName, problem.Line, problem.Column, problem.Message);
        }
    }

    /// <summary>Reads a sweep from a file; the source keeps the file name without its folder.</summary>
    /// <exception cref="SweepReadException">The file cannot be opened (line and column 0) or is not a readable sweep.</exception>
    /// <exception cref="ArgumentException"><paramref name="path"/> is null or empty.</exception>
    public static Sweep ReadFile(string path, DelimitedTextOptions? options = null)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        return Read(SweepFileBytes.Read(path), Path.GetFileName(path), options);
    }
}
