using System.Buffers;
using System.Buffers.Binary;
using System.Globalization;
using System.IO.Compression;
using FilterQA.Core.Sweeps;

namespace FilterQA.Data.Codecs;

/// <summary>
/// A compact binary form of a <see cref="ResponseTrace"/> for fast re-evaluation without parsing
/// the original file. Pure: the same trace always gives the same bytes.
/// <para>Precision: frequencies are exact (bit for bit). Loss (dB) and phase (rad) are stored as
/// IEEE float32, rounded to nearest, so each decoded value differs from the original by at most
/// |x|·2⁻²⁴ (half a float32 unit in the last place; for example ≤ 2.4·10⁻⁵ dB at 400 dB and
/// ≤ 1.9·10⁻⁷ rad at π rad).</para>
/// <para>Layout: "FQTR", version byte, then a Brotli stream of: path byte, flags byte (bit 0 phase
/// present; bits 1–2 grid form), point count (int32 LE), the grid, loss float32s, phase float32s.
/// The grid form is 0 = linear (start and stop as float64, rebuilt by <see cref="FrequencyGrid.Linear"/>),
/// 1 = millihertz integers delta-coded as zig-zag varints (used only when every frequency comes
/// back bit for bit), 2 = raw float64. The float32 arrays are byte-planed (all first bytes, then
/// all second bytes, ...) which lets the compressor find the slowly changing high bytes.</para>
/// </summary>
public static class ResponseTraceCodec
{
    private const byte Version = 1;
    private const int MaxPoints = 10_000_000;

    // Path, flags, count, a raw float64 grid and two float32 arrays: the longest body a valid trace has.
    private const long MaxBodyBytes = 6 + 16L * MaxPoints;
    private static ReadOnlySpan<byte> Magic => "FQTR"u8;

    /// <summary>Encodes <paramref name="trace"/>; throws when a loss or phase value does not fit a float32.</summary>
    public static byte[] Encode(ResponseTrace trace)
    {
        ArgumentNullException.ThrowIfNull(trace);
        int n = trace.Grid.Count;
        using var body = new MemoryStream(16 + n * 10);
        using (var writer = new BinaryWriter(body, System.Text.Encoding.UTF8, leaveOpen: true))
        {
            GridForm form = ChooseForm(trace.Grid);
            writer.Write((byte)trace.Path);
            writer.Write((byte)((trace.HasPhase ? 1 : 0) | ((int)form << 1)));
            writer.Write(n);
            WriteGrid(writer, trace.Grid, form);
            WriteFloats(writer, trace.LossDb, "loss");
            if (trace.HasPhase)
            {
                WriteFloats(writer, trace.PhaseRad, "phase");
            }
        }
        ReadOnlySpan<byte> plain = body.GetBuffer().AsSpan(0, (int)body.Length);
        var output = new byte[Magic.Length + 1 + BrotliEncoder.GetMaxCompressedLength(plain.Length)];
        Magic.CopyTo(output);
        output[Magic.Length] = Version;
        if (!BrotliEncoder.TryCompress(plain, output.AsSpan(Magic.Length + 1), out int written, 6, 22))
        {
            throw new InvalidOperationException("Brotli could not compress the trace");
        }
        return output.AsSpan(0, Magic.Length + 1 + written).ToArray();
    }

    /// <summary>Decodes bytes made by <see cref="Encode"/>; throws <see cref="InvalidDataException"/> naming what is wrong.</summary>
    public static ResponseTrace Decode(ReadOnlySpan<byte> encoded)
    {
        if (encoded.Length < Magic.Length + 1 || !encoded[..Magic.Length].SequenceEqual(Magic))
        {
            throw new InvalidDataException("trace blob: it does not start with the FQTR signature");
        }
        if (encoded[Magic.Length] != Version)
        {
            throw new InvalidDataException(Say($"trace blob: version {encoded[Magic.Length]} is not supported (this build reads version {Version})"));
        }
        // Re-evaluation and reports decode many thousands of traces: decompress straight into a pooled buffer and read
        // the body from it, instead of copying through streams.
        byte[] plain = ArrayPool<byte>.Shared.Rent(Math.Max(16 * 1024, encoded.Length * 4));
        try
        {
            int length = Decompress(encoded[(Magic.Length + 1)..], ref plain);
            return ReadBody(plain.AsSpan(0, length));
        }
        catch (EndOfStreamException problem)
        {
            throw new InvalidDataException("trace blob: the body ends early", problem);
        }
        catch (ArgumentException problem)
        {
            throw new InvalidDataException("trace blob: the decoded values do not form a valid trace: " + problem.Message, problem);
        }
        finally
        {
            ArrayPool<byte>.Shared.Return(plain);
        }
    }

    // Grows the (pooled) buffer while the decoder asks for room; a damaged or cut stream is named as such.
    private static int Decompress(ReadOnlySpan<byte> compressed, ref byte[] buffer)
    {
        using var decoder = new BrotliDecoder();
        int total = 0;
        while (true)
        {
            OperationStatus status = decoder.Decompress(compressed, buffer.AsSpan(total), out int consumed, out int written);
            compressed = compressed[consumed..];
            total += written;
            switch (status)
            {
                case OperationStatus.Done:
                    return total;
                case OperationStatus.DestinationTooSmall:
                    if (buffer.Length >= MaxBodyBytes)
                    {
                        throw new InvalidDataException(Say($"trace blob: the body is longer than the {MaxBodyBytes} bytes a trace of {MaxPoints} points can have"));
                    }
                    byte[] larger = ArrayPool<byte>.Shared.Rent((int)Math.Min(2L * buffer.Length, MaxBodyBytes));
                    buffer.AsSpan(0, total).CopyTo(larger);
                    ArrayPool<byte>.Shared.Return(buffer);
                    buffer = larger;
                    break;
                case OperationStatus.NeedMoreData:
                    throw new InvalidDataException("trace blob: the compressed body ends early");
                default:
                    throw new InvalidDataException("trace blob: the compressed body is damaged");
            }
        }
    }

    private static ResponseTrace ReadBody(ReadOnlySpan<byte> plain)
    {
        var reader = new BodyReader(plain);
        var path = (ResponsePath)reader.Byte();
        if (!Enum.IsDefined(path))
        {
            throw new InvalidDataException(Say($"trace blob: response path {(int)path} is not defined"));
        }
        byte flags = reader.Byte();
        bool hasPhase = (flags & 1) != 0;
        var form = (GridForm)((flags >> 1) & 3);
        if ((flags & ~7) != 0 || !Enum.IsDefined(form))
        {
            throw new InvalidDataException(Say($"trace blob: flags 0x{flags:x2} are not defined"));
        }
        int n = reader.Int32();
        if (n < 1 || n > MaxPoints)
        {
            throw new InvalidDataException(Say($"trace blob: point count {n} is outside 1 to {MaxPoints}"));
        }
        FrequencyGrid grid = ReadGrid(ref reader, form, n);
        double[] loss = ReadFloats(ref reader, n);
        double[] phase = hasPhase ? ReadFloats(ref reader, n) : [];
        if (reader.Remaining != 0)
        {
            throw new InvalidDataException(Say($"trace blob: {reader.Remaining} bytes follow the last value"));
        }
        return ResponseTrace.Create(grid, path, loss, phase);
    }

    private static GridForm ChooseForm(FrequencyGrid grid)
    {
        int n = grid.Count;
        ReadOnlySpan<double> hz = grid.Hz;
        if (n >= 2 && FrequencyGrid.Linear(grid.StartHz, grid.StopHz, n).Hz.SequenceEqual(hz))
        {
            return GridForm.Linear;
        }
        long previous = long.MinValue;
        for (int i = 0; i < n; i++)
        {
            // 9e12 Hz keeps f·1000 well inside the range where long and double agree exactly.
            if (hz[i] > 9e12)
            {
                return GridForm.Raw;
            }
            long q = (long)Math.Round(hz[i] * 1000.0);
            if (q / 1000.0 != hz[i] || q <= previous)
            {
                return GridForm.Raw;
            }
            previous = q;
        }
        return GridForm.MillihertzDeltas;
    }

    private static void WriteGrid(BinaryWriter writer, FrequencyGrid grid, GridForm form)
    {
        ReadOnlySpan<double> hz = grid.Hz;
        switch (form)
        {
            case GridForm.Linear:
                writer.Write(grid.StartHz);
                writer.Write(grid.StopHz);
                break;
            case GridForm.MillihertzDeltas:
                long previous = 0;
                foreach (double f in hz)
                {
                    long q = (long)Math.Round(f * 1000.0);
                    long delta = q - previous;
                    writer.Write7BitEncodedInt64((delta << 1) ^ (delta >> 63));
                    previous = q;
                }
                break;
            default:
                foreach (double f in hz)
                {
                    writer.Write(f);
                }
                break;
        }
    }

    private static FrequencyGrid ReadGrid(ref BodyReader reader, GridForm form, int n)
    {
        switch (form)
        {
            case GridForm.Linear:
                double start = reader.Double(), stop = reader.Double();
                return FrequencyGrid.Linear(start, stop, n);
            case GridForm.MillihertzDeltas:
                var hz = new double[n];
                long q = 0;
                for (int i = 0; i < n; i++)
                {
                    long zigzag = reader.Varint64();
                    q += (long)((ulong)zigzag >> 1) ^ -(zigzag & 1);
                    hz[i] = q / 1000.0;
                }
                return FrequencyGrid.FromHz(hz);
            default:
                var raw = new double[n];
                for (int i = 0; i < n; i++)
                {
                    raw[i] = reader.Double();
                }
                return FrequencyGrid.FromHz(raw);
        }
    }

    private static void WriteFloats(BinaryWriter writer, ReadOnlySpan<double> values, string what)
    {
        var bytes = new byte[values.Length * 4];
        for (int i = 0; i < values.Length; i++)
        {
            float single = (float)values[i];
            if (!float.IsFinite(single))
            {
                throw new ArgumentException(Say($"{what} at index {i} is {values[i]}; it does not fit a float32"));
            }
            uint word = BitConverter.SingleToUInt32Bits(single);
            for (int plane = 0; plane < 4; plane++)
            {
                bytes[plane * values.Length + i] = (byte)(word >> (8 * plane));
            }
        }
        writer.Write(bytes);
    }

    private static double[] ReadFloats(ref BodyReader reader, int n)
    {
        ReadOnlySpan<byte> bytes = reader.Bytes(n * 4);
        ReadOnlySpan<byte> b0 = bytes[..n], b1 = bytes.Slice(n, n), b2 = bytes.Slice(2 * n, n), b3 = bytes.Slice(3 * n, n);
        var values = new double[n];
        for (int i = 0; i < n; i++)
        {
            uint word = b0[i] | ((uint)b1[i] << 8) | ((uint)b2[i] << 16) | ((uint)b3[i] << 24);
            values[i] = BitConverter.UInt32BitsToSingle(word);
        }
        return values;
    }

    /// <summary>Little-endian reads from the decompressed body, as <see cref="BinaryWriter"/> wrote it; a short body ends early.</summary>
    private ref struct BodyReader(ReadOnlySpan<byte> body)
    {
        private readonly ReadOnlySpan<byte> _body = body;
        private int _at;

        public readonly int Remaining => _body.Length - _at;

        public ReadOnlySpan<byte> Bytes(int count)
        {
            if (count < 0 || count > Remaining)
            {
                throw new EndOfStreamException();
            }
            ReadOnlySpan<byte> taken = _body.Slice(_at, count);
            _at += count;
            return taken;
        }

        public byte Byte() => Bytes(1)[0];

        public int Int32() => BinaryPrimitives.ReadInt32LittleEndian(Bytes(4));

        public double Double() => BinaryPrimitives.ReadDoubleLittleEndian(Bytes(8));

        // BinaryWriter.Write7BitEncodedInt64: seven bits a byte, low group first, high bit set on every byte but the last.
        public long Varint64()
        {
            ulong result = 0;
            for (int shift = 0; shift < 70; shift += 7)
            {
                byte b = Byte();
                result |= (ulong)(b & 0x7F) << shift;
                if ((b & 0x80) == 0)
                {
                    return (long)result;
                }
            }
            throw new InvalidDataException("trace blob: a frequency step is not a valid 7-bit encoded integer");
        }
    }

    private static string Say(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);

    private enum GridForm
    {
        Linear = 0,
        MillihertzDeltas = 1,
        Raw = 2,
    }
}
