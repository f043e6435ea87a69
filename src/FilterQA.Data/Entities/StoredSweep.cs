using FilterQA.Core.Sweeps;

namespace FilterQA.Data.Entities;

/// <summary>
/// A sweep as stored: the original file bytes compressed (byte-exact recoverable, with their
/// SHA-256) and the measured response in the compact trace form for fast re-evaluation.
/// Mapped as a complex type into the owning row.
/// </summary>
public sealed class StoredSweep
{
    public required string FileName { get; set; }

    public SweepFormat Format { get; set; }

    /// <summary>Length of the original file in bytes.</summary>
    public long RawLength { get; set; }

    /// <summary>Lower-case hex SHA-256 of the original file bytes.</summary>
    public required string RawSha256 { get; set; }

    /// <summary>The original bytes, compressed (see <c>SweepBytes</c>).</summary>
    public required byte[] RawCompressed { get; set; }

    public ResponsePath Path { get; set; }

    public int PointCount { get; set; }

    public double StartHz { get; set; }

    public double StopHz { get; set; }

    /// <summary>The response in the compact trace form (see <c>ResponseTraceCodec</c>).</summary>
    public required byte[] Trace { get; set; }
}
