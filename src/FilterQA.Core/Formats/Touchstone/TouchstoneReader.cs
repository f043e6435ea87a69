using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Formats.Touchstone;

/// <summary>
/// Reads Touchstone files (IBIS Open Forum standard, versions 1.0, 1.1 and 2.0) into a <see cref="Sweep"/> of S-parameters.
/// </summary>
/// <remarks>
/// <para>Port count: from the name's <c>.sNp</c> extension, from <c>[Number of Ports]</c> in a version 2.0 file, or from
/// the caller; they must agree where more than one is given. A version 1 file without a <c>.sNp</c> name needs the caller's count.</para>
/// <para>Frequencies are returned in Hz. Y and Z data are converted to S with the reference impedance of each port
/// (version 1: values normalised to R; version 2: ohms and siemens). H and G data are refused. The two-port noise block
/// is returned apart in <see cref="Sweep.Noise"/>, with Rn in ohms.</para>
/// <para>Full-line comments become <see cref="SweepSource.Notes"/>; accepted oddities (a later option line, a UTF-8
/// byte-order mark) become <see cref="SweepSource.Warnings"/>. <see cref="SweepSource.Sha256"/> is the lower-case hex
/// SHA-256 of the bytes given.</para>
/// <para>Every problem with the content throws <see cref="SweepReadException"/> naming the file, the line and column and
/// what was expected; nothing is returned then. No other exception escapes for bad content.</para>
/// </remarks>
public static class TouchstoneReader
{
    /// <summary>Reads a Touchstone file from its bytes; the port count comes from the name or the version 2.0 keywords.</summary>
    /// <param name="content">The file's bytes (ASCII; a UTF-8 byte-order mark is accepted with a warning).</param>
    /// <param name="fileName">Name of the file, used for the port count (".s2p") and in messages; a directory part is allowed.</param>
    /// <exception cref="SweepReadException">The content is not a readable Touchstone file.</exception>
    /// <exception cref="ArgumentNullException"><paramref name="fileName"/> is null.</exception>
    public static Sweep Read(ReadOnlySpan<byte> content, string fileName)
    {
        ArgumentNullException.ThrowIfNull(fileName);
        return ReadCore(content, fileName, 0);
    }

    /// <summary>Reads a Touchstone file from its bytes with a port count given by the caller (for names without .sNp).</summary>
    /// <param name="content">The file's bytes.</param>
    /// <param name="fileName">Name of the file, used in messages; if it ends in .sNp, N must equal <paramref name="portCount"/>.</param>
    /// <param name="portCount">Number of ports, 1 to 999; must agree with the name and with [Number of Ports] where given.</param>
    /// <exception cref="SweepReadException">The content is not a readable Touchstone file, or the port counts disagree.</exception>
    /// <exception cref="ArgumentNullException"><paramref name="fileName"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="portCount"/> is outside 1..999.</exception>
    public static Sweep Read(ReadOnlySpan<byte> content, string fileName, int portCount)
    {
        ArgumentNullException.ThrowIfNull(fileName);
        ArgumentOutOfRangeException.ThrowIfLessThan(portCount, 1);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(portCount, 999);
        return ReadCore(content, fileName, portCount);
    }

    /// <summary>Reads a Touchstone file from disk; the sweep is named by the file's name without its directory.</summary>
    /// <param name="path">Path of the file.</param>
    /// <exception cref="SweepReadException">The file cannot be opened or read, or its content is not a readable Touchstone file.</exception>
    /// <exception cref="ArgumentNullException"><paramref name="path"/> is null.</exception>
    public static Sweep ReadFile(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        return ReadCore(SweepFileBytes.Read(path), Path.GetFileName(path), 0);
    }

    private static Sweep ReadCore(ReadOnlySpan<byte> content, string fileName, int portCount)
    {
        try
        {
            return new TouchstoneParser(content, fileName, portCount).Parse();
        }
        catch (SweepReadException)
        {
            throw;
        }
        catch (Exception ex) when (ex is ArgumentException or ArithmeticException or FormatException or InvalidOperationException or IndexOutOfRangeException)
        {
            // The model validates again what the reader built; should it refuse, that is still a fault of the file, never a half-read sweep.
            throw new SweepReadException(fileName, 0, 0, $"the data cannot be used: {ex.Message}", ex);
        }
    }
}
