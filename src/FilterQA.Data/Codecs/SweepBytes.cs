using System.Globalization;
using System.IO.Compression;
using System.Security.Cryptography;

namespace FilterQA.Data.Codecs;

/// <summary>
/// Lossless compression of a sweep file's original bytes (Brotli), and their SHA-256, so that the
/// file a certificate cites can be given back byte for byte and shown to be the same.
/// </summary>
public static class SweepBytes
{
    // Quality 6 of 11: within a few per cent of the best ratio on Touchstone text at a fraction of the time.
    private const int Quality = 6;
    private const int Window = 22;

    /// <summary>Lower-case hex SHA-256 of <paramref name="raw"/>.</summary>
    public static string Sha256Hex(ReadOnlySpan<byte> raw) => Convert.ToHexStringLower(SHA256.HashData(raw));

    /// <summary>Compresses <paramref name="raw"/>; an empty input gives an empty Brotli stream.</summary>
    public static byte[] Compress(ReadOnlySpan<byte> raw)
    {
        var buffer = new byte[BrotliEncoder.GetMaxCompressedLength(raw.Length)];
        if (!BrotliEncoder.TryCompress(raw, buffer, out int written, Quality, Window))
        {
            throw new InvalidOperationException(string.Create(CultureInfo.InvariantCulture, $"Brotli could not compress {raw.Length} bytes"));
        }
        return buffer.AsSpan(0, written).ToArray();
    }

    /// <summary>
    /// Decompresses and checks length and SHA-256 against what was stored; throws
    /// <see cref="InvalidDataException"/> naming the difference when the bytes are not the original.
    /// </summary>
    public static byte[] Decompress(byte[] compressed, long expectedLength, string expectedSha256)
    {
        ArgumentNullException.ThrowIfNull(compressed);
        if (expectedLength < 0 || expectedLength > Array.MaxLength)
        {
            throw new InvalidDataException(string.Create(CultureInfo.InvariantCulture, $"stored sweep length {expectedLength} is out of range"));
        }
        var raw = new byte[expectedLength];
        if (!BrotliDecoder.TryDecompress(compressed, raw, out int written) || written != expectedLength)
        {
            throw new InvalidDataException(string.Create(CultureInfo.InvariantCulture,
                $"stored sweep bytes do not decompress to the recorded {expectedLength} bytes"));
        }
        string actual = Sha256Hex(raw);
        if (!string.Equals(actual, expectedSha256, StringComparison.Ordinal))
        {
            throw new InvalidDataException($"stored sweep bytes hash to {actual}, not the recorded {expectedSha256}");
        }
        return raw;
    }
}
