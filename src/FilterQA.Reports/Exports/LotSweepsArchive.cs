using System.IO.Compression;
using System.Text;
using FilterQA.Core.Formats;
using FilterQA.Core.Formats.Delimited;
using FilterQA.Core.Sweeps;
using FilterQA.Data.Services.Exports;

namespace FilterQA.Reports.Exports;

/// <summary>
/// Every stored raw sweep of a lot in one zip, written as it is read, a few sweeps at a time, to a
/// stream that need not seek (an HTTP response), only asynchronously, so a lot of thousands of units
/// is never held in memory (at most one page of sweeps and one compressed entry). Entries are named <c>serial/attempt-N/file</c> so retests of one unit do not collide.
/// </summary>
public static class LotSweepsArchive
{
    /// <summary>The media type of the export.</summary>
    public const string ContentType = "application/zip";

    /// <summary>Reads "touchstone" or "csv" (any case); null for anything else.</summary>
    public static SweepExportFormat? ParseFormat(string? text) => text?.Trim().ToUpperInvariant() switch
    {
        "TOUCHSTONE" => SweepExportFormat.Touchstone,
        "CSV" => SweepExportFormat.Csv,
        _ => null,
    };

    /// <summary>Writes the zip to <paramref name="output"/> (left open); the lot is found before anything is written.</summary>
    /// <exception cref="FilterQA.Data.RecordNotFoundException">The lot does not exist (before anything is written).</exception>
    public static async Task WriteAsync(LotExportReader reader, string lotNumber, SweepExportFormat format, Stream output, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(reader);
        ArgumentNullException.ThrowIfNull(output);
        await using IAsyncEnumerator<ExportSweep> sweeps = reader.SweepsAsync(lotNumber, cancellationToken).GetAsyncEnumerator(cancellationToken);
        // The first read finds the lot (or throws) before the zip writes a byte.
        bool any = await sweeps.MoveNextAsync().ConfigureAwait(false);
        using var buffer = new ForwardBuffer();
        using (var zip = new ZipArchive(buffer, ZipArchiveMode.Create, leaveOpen: true, entryNameEncoding: Encoding.UTF8))
        {
            while (any)
            {
                ExportSweep sweep = sweeps.Current;
                (string name, byte[] bytes) = format == SweepExportFormat.Csv ? AsCsv(sweep) : (EntryName(sweep, sweep.FileName), sweep.Bytes);
                ZipArchiveEntry entry = zip.CreateEntry(name, CompressionLevel.Fastest);
                using (Stream target = entry.Open())
                {
                    target.Write(bytes);
                }
                await buffer.DrainAsync(output, cancellationToken).ConfigureAwait(false);
                any = await sweeps.MoveNextAsync().ConfigureAwait(false);
            }
        }
        // Disposing the archive wrote its central directory into the buffer.
        await buffer.DrainAsync(output, cancellationToken).ConfigureAwait(false);
        await output.FlushAsync(cancellationToken).ConfigureAwait(false);
    }

    /// <summary>The entry name of a sweep: serial, attempt and file name, each made safe as one path segment.</summary>
    public static string EntryName(ExportSweep sweep, string fileName)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        return $"{Segment(sweep.Serial)}/attempt-{sweep.Attempt}/{Segment(fileName)}";
    }

    private static (string Name, byte[] Bytes) AsCsv(ExportSweep sweep)
    {
        Sweep read = SweepFileReader.Read(sweep.Bytes, sweep.FileName);
        using var text = new StringWriter(System.Globalization.CultureInfo.InvariantCulture);
        DelimitedTextWriter.Write(read, text);
        string stem = Path.GetFileNameWithoutExtension(Segment(sweep.FileName));
        return (EntryName(sweep, stem + ".csv"), new UTF8Encoding(false).GetBytes(text.ToString()));
    }

    // A stored name came from a client: no folder parts, no "..", nothing a zip tool would treat as a path.
    private static string Segment(string name)
    {
        string leaf = name.Replace('\\', '/');
        leaf = leaf[(leaf.LastIndexOf('/') + 1)..];
        var safe = new StringBuilder(leaf.Length);
        foreach (char c in leaf)
        {
            safe.Append(char.IsControl(c) || c is ':' or '*' or '?' or '"' or '<' or '>' or '|' ? '_' : c);
        }
        string result = safe.ToString().Trim().TrimStart('.');
        return result.Length == 0 ? "sweep" : result;
    }
}
