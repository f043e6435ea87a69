using FilterQA.Core.Sweeps;
using FilterQA.Data.Codecs;

namespace FilterQA.Data.Tests.Codecs;

/// <summary>
/// The compact trace form: frequencies exact, loss and phase to float32 precision. The bound used
/// throughout is IEEE 754 binary32 round-to-nearest: |decoded − x| ≤ |x|·2⁻²⁴ (24-bit significand).
/// </summary>
public sealed class ResponseTraceCodecTests
{
    private static readonly double HalfUlp = Math.Pow(2, -24);

    public static TheoryData<string> Grids => ["linear", "millihertz", "raw", "single"];

    private static FrequencyGrid Grid(string form) => form switch
    {
        "linear" => FrequencyGrid.Linear(20e6, 23e6, 2001),
        // Decimal frequencies as a Touchstone file lists them: whole millihertz, uneven steps.
        "millihertz" => FrequencyGrid.FromHz(Enumerable.Range(0, 801).Select(i => 21.4e6 + i * 1234.567 + (i % 3) * 0.001).ToArray()),
        // Frequencies no decimal grid holds (multiples of pi Hz).
        "raw" => FrequencyGrid.FromHz(Enumerable.Range(0, 300).Select(i => 1e6 + i * Math.PI).ToArray()),
        _ => FrequencyGrid.FromHz([455e3]),
    };

    private static ResponseTrace Trace(FrequencyGrid grid, bool phase, ResponsePath path = ResponsePath.Transmission)
    {
        var loss = new double[grid.Count];
        var phaseRad = new double[grid.Count];
        for (int i = 0; i < grid.Count; i++)
        {
            loss[i] = 3.0 + 70.0 * Math.Sin(i * 0.01) * Math.Sin(i * 0.01) + i * 1e-7;
            phaseRad[i] = Math.IEEERemainder(i * 0.37, 2 * Math.PI);
        }
        return ResponseTrace.Create(grid, path, loss, phase ? phaseRad : default);
    }

    [Theory]
    [MemberData(nameof(Grids))]
    public void Round_trip_gives_exact_frequencies_and_float32_loss_and_phase(string form)
    {
        ResponseTrace original = Trace(Grid(form), phase: true);

        ResponseTrace decoded = ResponseTraceCodec.Decode(ResponseTraceCodec.Encode(original));

        Assert.Equal(original.Grid.Hz.ToArray(), decoded.Grid.Hz.ToArray());
        Assert.Equal(original.Path, decoded.Path);
        Assert.True(decoded.HasPhase);
        for (int i = 0; i < original.Grid.Count; i++)
        {
            Assert.True(Math.Abs(decoded.LossDb[i] - original.LossDb[i]) <= Math.Abs(original.LossDb[i]) * HalfUlp, $"loss at {i}");
            Assert.True(Math.Abs(decoded.PhaseRad[i] - original.PhaseRad[i]) <= Math.Abs(original.PhaseRad[i]) * HalfUlp, $"phase at {i}");
            // Exactly the float32 nearest to the original, nothing coarser.
            Assert.Equal((double)(float)original.LossDb[i], decoded.LossDb[i]);
        }
    }

    [Fact]
    public void A_trace_without_phase_decodes_without_phase_and_keeps_its_path()
    {
        ResponseTrace original = Trace(Grid("linear"), phase: false, ResponsePath.InputReflection);

        ResponseTrace decoded = ResponseTraceCodec.Decode(ResponseTraceCodec.Encode(original));

        Assert.False(decoded.HasPhase);
        Assert.Equal(ResponsePath.InputReflection, decoded.Path);
    }

    [Fact]
    public void Encoding_is_deterministic_and_smaller_than_plain_float32()
    {
        ResponseTrace original = Trace(Grid("linear"), phase: true);

        byte[] once = ResponseTraceCodec.Encode(original);
        byte[] twice = ResponseTraceCodec.Encode(original);

        Assert.Equal(once, twice);
        // Plain float32 loss and phase alone would be 2001 × 8 bytes; the linear grid costs two doubles.
        Assert.True(once.Length < 2001 * 8, $"{once.Length} bytes");
    }

    [Fact]
    public void A_loss_beyond_float32_range_is_refused_with_its_index()
    {
        FrequencyGrid grid = FrequencyGrid.Linear(1e6, 2e6, 3);
        ResponseTrace huge = ResponseTrace.Create(grid, ResponsePath.Transmission, [1, 1e300, 1]);

        var problem = Assert.Throws<ArgumentException>(() => ResponseTraceCodec.Encode(huge));
        Assert.Contains("index 1", problem.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("signature")]
    [InlineData("version")]
    [InlineData("truncated")]
    [InlineData("trailing")]
    public void Damaged_bytes_give_a_clear_error(string damage)
    {
        byte[] good = ResponseTraceCodec.Encode(Trace(Grid("millihertz"), phase: true));
        byte[] bad = damage switch
        {
            "signature" => [(byte)'X', .. good[1..]],
            "version" => [.. good[..4], 99, .. good[5..]],
            "truncated" => good[..(good.Length / 2)],
            _ => Reencoded(good),
        };

        var problem = Assert.Throws<InvalidDataException>(() => ResponseTraceCodec.Decode(bad));
        Assert.StartsWith("trace blob:", problem.Message, StringComparison.Ordinal);
    }

    // A well-formed stream whose body has one byte too many.
    private static byte[] Reencoded(byte[] good)
    {
        using var input = new MemoryStream(good[5..]);
        using var brotli = new System.IO.Compression.BrotliStream(input, System.IO.Compression.CompressionMode.Decompress);
        using var body = new MemoryStream();
        brotli.CopyTo(body);
        body.WriteByte(0);
        using var output = new MemoryStream();
        output.Write(good.AsSpan(0, 5));
        using (var compress = new System.IO.Compression.BrotliStream(output, System.IO.Compression.CompressionLevel.Fastest, leaveOpen: true))
        {
            compress.Write(body.ToArray());
        }
        return output.ToArray();
    }
}
