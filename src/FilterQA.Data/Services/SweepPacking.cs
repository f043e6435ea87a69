using FilterQA.Core.Sweeps;
using FilterQA.Data.Codecs;
using FilterQA.Data.Entities;

namespace FilterQA.Data.Services;

/// <summary>Builds the stored form of a sweep and checks that the parsed sweep came from these bytes.</summary>
internal static class SweepPacking
{
    internal static StoredSweep Pack(ReadOnlyMemory<byte> raw, Sweep sweep, ResponseTrace response, string what)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        ArgumentNullException.ThrowIfNull(response);
        if (raw.IsEmpty)
        {
            throw new ArgumentException($"{what}: the original sweep file bytes are empty; the file itself must be stored", nameof(raw));
        }
        string sha = SweepBytes.Sha256Hex(raw.Span);
        if (sweep.Source.Sha256.Length > 0 && !string.Equals(sweep.Source.Sha256, sha, StringComparison.OrdinalIgnoreCase))
        {
            throw new ArgumentException($"{what}: the sweep was read from a file with SHA-256 {sweep.Source.Sha256}, but the bytes given hash to {sha}", nameof(raw));
        }
        return new StoredSweep
        {
            FileName = sweep.Source.FileName,
            Format = sweep.Source.Format,
            RawLength = raw.Length,
            RawSha256 = sha,
            RawCompressed = SweepBytes.Compress(raw.Span),
            Path = response.Path,
            PointCount = response.Grid.Count,
            StartHz = response.Grid.StartHz,
            StopHz = response.Grid.StopHz,
            Trace = ResponseTraceCodec.Encode(response),
        };
    }
}
