using System.Security.Cryptography;
using System.Text;
using FilterQA.Data.Codecs;

namespace FilterQA.Data.Tests.Codecs;

/// <summary>The original file bytes are kept losslessly and checked by SHA-256 (FIPS 180-4, the framework's implementation) when read back.</summary>
public sealed class SweepBytesTests
{
    private static readonly byte[] Touchstone = Encoding.ASCII.GetBytes(string.Concat(
        Enumerable.Range(0, 500).Select(i => FormattableString.Invariant($"{455000 + i * 200} -0.{i % 97:D2} 12.5 -3.{i % 89:D2} 33.0\n"))));

    [Fact]
    public void Bytes_come_back_exactly_and_smaller_when_stored()
    {
        byte[] compressed = SweepBytes.Compress(Touchstone);

        byte[] back = SweepBytes.Decompress(compressed, Touchstone.Length, Convert.ToHexStringLower(SHA256.HashData(Touchstone)));

        Assert.Equal(Touchstone, back);
        Assert.True(compressed.Length < Touchstone.Length / 2, $"{compressed.Length} of {Touchstone.Length} bytes");
    }

    [Fact]
    public void The_hash_is_the_standard_sha256_in_lower_case_hex()
    {
        // FIPS 180-4 example: SHA-256("abc").
        Assert.Equal("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", SweepBytes.Sha256Hex("abc"u8));
    }

    [Fact]
    public void A_wrong_hash_or_length_is_reported()
    {
        byte[] compressed = SweepBytes.Compress(Touchstone);
        string sha = SweepBytes.Sha256Hex(Touchstone);

        Assert.Contains("hash", Assert.Throws<InvalidDataException>(() => SweepBytes.Decompress(compressed, Touchstone.Length, new string('0', 64))).Message,
            StringComparison.Ordinal);
        Assert.Throws<InvalidDataException>(() => SweepBytes.Decompress(compressed, Touchstone.Length - 1, sha));
        Assert.Throws<InvalidDataException>(() => SweepBytes.Decompress(compressed, Touchstone.Length + 1, sha));
    }
}
