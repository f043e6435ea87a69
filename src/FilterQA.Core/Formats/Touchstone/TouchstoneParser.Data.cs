using System.Buffers;
using System.Numerics;
using System.Runtime.CompilerServices;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Formats.Touchstone;

/// <summary>Network data blocks, the noise block and the finished sweep.</summary>
internal ref partial struct TouchstoneParser
{
    private const double DegreesToRadians = Math.PI / 180.0;

    /// <summary>ln(10)/20: 10^(a/20) = e^(a·ln10/20). Exp is several times faster than Pow and within a few units in the last place.</summary>
    private const double DecibelToNeper = 0.11512925464970229;

    private static readonly string[] NoiseValueNames =
    [
        "noise frequency", "minimum noise figure NFmin in dB", "magnitude of the optimum source reflection",
        "angle of the optimum source reflection in degrees", "equivalent noise resistance Rn",
    ];




    /// <summary>What a number is, so a message can name it without a string being made for every value.</summary>
    private enum ValueRole
    {
        Frequency,
        BlockValue,
        NoiseValue,
        OptionReference,
        Reference,
    }

    private Sweep ParseVersion1()
    {
        if (_callerPortCount != 0 && _extensionPortCount != 0 && _callerPortCount != _extensionPortCount)
        {
            throw new SweepReadException(_fileName, 0, 0, Invariant($"the caller asked for {_callerPortCount} ports, but the file name '{_fileName}' says {_extensionPortCount}"));
        }
        int ports = _callerPortCount != 0 ? _callerPortCount : _extensionPortCount;
        if (ports == 0)
        {
            throw new SweepReadException(_fileName, 0, 0, $"cannot tell the number of ports: the name '{_fileName}' does not end in .sNp (for example .s2p) "
                + "and the file has no [Number of Ports]; rename the file or give the port count");
        }
        _portSource = _callerPortCount != 0 ? "the port count given by the caller" : $"the file name '{_fileName}'";
        CheckOptionsForPorts(ports);
        StartData(ports, blockBound: int.MaxValue);
        while (SkipToToken())
        {
            if (Current == (byte)'#')
            {
                WarnIgnoredOptionLine();
                continue;
            }
            if (Current == (byte)'[')
            {
                int keywordLine = _line, keywordColumn = Column;
                string keyword = TakeKeyword(out string shown);
                throw KeywordOutsideVersion2(keyword, shown, keywordLine, keywordColumn);
            }
            int line = _line, column = Column;
            double hz = TakeFrequency();
            if (_blocks > 0 && hz <= _frequencies![_blocks - 1])
            {
                if (_ports == 2)
                {
                    // Version 1 marks the start of the noise block only by a frequency that does not increase.
                    ReadNoiseVersion1(hz, line);
                    break;
                }
                throw FrequencyOrderError(hz, line, column);
            }
            ReadBlock(hz, line);
        }
        if (_blocks == 0)
        {
            throw ErrorAt(_optionLine, 0, "the file has an option line but no network data");
        }
        return Build(SweepFormat.Touchstone1);
    }

    private Sweep ParseVersion2(int versionLine)
    {
        _version = 2;
        ReadVersion2Header(versionLine);
        _ports = _declaredPorts;
        _portSource = Invariant($"[Number of Ports] on line {_portsLine}");
        CheckOptionsForPorts(_ports);
        StartData(_ports, _declaredFrequencies);
        for (int read = 0; read < _declaredFrequencies;)
        {
            if (!SkipToToken())
            {
                throw ErrorAt(_lastTokenLine, 0, Invariant(
                    $"the file ends after {read} of the {_declaredFrequencies} network blocks that [Number of Frequencies] (line {_frequenciesLine}) declares"));
            }
            if (Current == (byte)'#')
            {
                WarnIgnoredOptionLine();
                continue;
            }
            if (Current == (byte)'[')
            {
                throw ErrorHere(Invariant($"found '{Show(PeekKeyword())}' after {read} network blocks, but [Number of Frequencies] (line {_frequenciesLine}) declares {_declaredFrequencies}"));
            }
            int line = _line, column = Column;
            double hz = TakeFrequency();
            if (_blocks > 0 && hz <= _frequencies![_blocks - 1])
            {
                throw FrequencyOrderError(hz, line, column);
            }
            ReadBlock(hz, line);
            read++;
        }
        ReadVersion2Tail();
        return Build(SweepFormat.Touchstone2);
    }

    /// <summary>After the network data: an optional [Noise Data] block, then [End] and nothing more.</summary>
    private void ReadVersion2Tail()
    {
        while (true)
        {
            if (!SkipToToken())
            {
                throw ErrorAt(_lastTokenLine, 0, "the file ends without [End]; a Touchstone 2.0 file must end with [End]");
            }
            if (Current == (byte)'#')
            {
                WarnIgnoredOptionLine();
                continue;
            }
            if (Current != (byte)'[')
            {
                throw _noise is null
                    ? ErrorHere(Invariant($"more network data than the {_declaredFrequencies} blocks that [Number of Frequencies] (line {_frequenciesLine}) declares"))
                    : ErrorHere(Invariant($"more noise data than the {_declaredNoiseFrequencies} lines that [Number of Noise Frequencies] (line {_noiseFrequenciesLine}) declares"));
            }
            int line = _line, column = Column;
            string keyword = TakeKeyword(out string shown);
            if (keyword == "[noise data]")
            {
                if (_noise is not null)
                {
                    throw ErrorAt(line, column, "[Noise Data] is given twice");
                }
                if (_noiseFrequenciesLine == 0)
                {
                    throw ErrorAt(line, column, _ports == 2
                        ? "[Noise Data] needs [Number of Noise Frequencies] before [Network Data]"
                        : Invariant($"noise data exists only for 2-ports; this file has {_ports} ports"));
                }
                EnsureLineEnds("[Noise Data]");
                ReadNoiseVersion2();
                continue;
            }
            if (keyword == "[end]")
            {
                if (_noiseFrequenciesLine != 0 && _noise is null)
                {
                    throw ErrorAt(line, column, Invariant($"[Number of Noise Frequencies] (line {_noiseFrequenciesLine}) declares noise data, but there is no [Noise Data]"));
                }
                if (SkipToToken())
                {
                    throw ErrorHere($"nothing may follow [End]; found '{Show(PeekWord())}'");
                }
                return;
            }
            throw keyword is "[number of ports]" or "[two-port data order]" or "[number of frequencies]" or "[number of noise frequencies]"
                or "[reference]" or "[matrix format]" or "[network data]" or "[version]"
                ? ErrorAt(line, column, $"{shown} must come before the network data")
                : UnsupportedOrUnknown(keyword, shown, line, column);
        }
    }

    private readonly ReadOnlySpan<byte> PeekKeyword()
    {
        ReadOnlySpan<byte> rest = _text[_pos..];
        int end = rest.IndexOfAny((byte)']', (byte)'\n', (byte)'\r');
        return end >= 0 && rest[end] == (byte)']' ? rest[..(end + 1)] : PeekWord();
    }

    /// <summary>Sets the block layout and rents the staging arrays, sized once from an upper bound on the block count.</summary>
    private void StartData(int ports, int blockBound)
    {
        _ports = ports;
        _referenceOhm = ReferencesFor(ports);
        int n2 = ports * ports;
        _pairIndex = PairIndex(ports);
        _pairs = _pairIndex.Length;
        _valuesPerBlock = 1 + 2 * _pairs;
        _blockOnOneLine = _version == 1 && ports <= 2;

        // Every block starts a line and holds _valuesPerBlock numbers of at least two bytes each (digit and separator),
        // so neither the line count nor the byte count can be exceeded.
        ReadOnlySpan<byte> rest = _text[_pos..];
        long lines = (long)rest.Count((byte)'\n') + rest.Count((byte)'\r') + 1;
        long byTokens = (rest.Length / 2 + 1) / _valuesPerBlock + 1;
        long bound = Math.Max(1, Math.Min(Math.Min(lines, byTokens), blockBound));
        _frequencies = ArrayPool<double>.Shared.Rent((int)bound);
        _staging = ArrayPool<Complex>.Shared.Rent((int)(bound * n2));
    }

    /// <summary>Where each pair of the file's block goes in the row-major n×n matrix.</summary>
    private readonly int[] PairIndex(int n)
    {
        var index = new List<int>(n * n);
        if (n == 2 && _matrixFormat == TouchstoneMatrixFormat.Full && (_version == 1 || _order21Before12))
        {
            // N11 N21 N12 N22: version 1 always, version 2 when [Two-Port Data Order] is 21_12.
            return [0, 2, 1, 3];
        }
        for (int row = 0; row < n; row++)
        {
            int from = _matrixFormat == TouchstoneMatrixFormat.Upper ? row : 0;
            int to = _matrixFormat == TouchstoneMatrixFormat.Lower ? row : n - 1;
            for (int column = from; column <= to; column++)
            {
                index.Add(row * n + column);
            }
        }
        return index.ToArray();
    }

    /// <summary>Frequency of a block or noise line, in Hz: not negative.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private double TakeFrequency()
    {
        int start = _pos;
        double hz = TakeNumber(_unitPow10, ValueRole.Frequency, 0);
        if (hz < 0)
        {
            _pos = start;
            throw ErrorHere($"the frequency '{Show(PeekWord())}' is negative; frequencies must be 0 or more");
        }
        return hz + 0.0;
    }

    /// <summary>Reads the rest of one block, whose frequency has been read, into the staging array.</summary>
    private void ReadBlock(double hz, int blockLine)
    {
        int n2 = _ports * _ports;
        if ((_blocks + 1) * n2 > _staging!.Length || _blocks >= _frequencies!.Length)
        {
            Grow();
        }
        Span<Complex> matrix = _staging.AsSpan(_blocks * n2, n2);
        ReadOnlySpan<int> pairIndex = _pairIndex;
        for (int pair = 0; pair < pairIndex.Length; pair++)
        {
            int valueIndex = 1 + 2 * pair;
            SkipToBlockValue(valueIndex, blockLine);
            int aLine = _line, aColumn = Column;
            double a = TakeNumber(0, ValueRole.BlockValue, valueIndex);
            SkipToBlockValue(valueIndex + 1, blockLine);
            double b = TakeNumber(0, ValueRole.BlockValue, valueIndex + 1);
            matrix[pairIndex[pair]] = ToComplex(a, b, aLine, aColumn, valueIndex);
        }
        if (_matrixFormat != TouchstoneMatrixFormat.Full)
        {
            Mirror(matrix, _ports, _matrixFormat == TouchstoneMatrixFormat.Lower);
        }
        if (_parameter != TouchstoneParameter.S
            && !ImmittanceConversion.ToScattering(matrix, _ports, _parameter == TouchstoneParameter.Y, _referenceOhm, normalised: _version == 1))
        {
            throw ErrorAt(blockLine, 0, Invariant($"the {_parameter} data at {Hz(hz)} cannot be converted to S: the matrix (I + {(_parameter == TouchstoneParameter.Y ? "y" : "z")}) is singular"));
        }
        if (SkipToTokenOnLine())
        {
            throw BlockOverrunError(blockLine);
        }
        _frequencies![_blocks++] = hz;
        _lastBlockLine = blockLine;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private void SkipToBlockValue(int valueIndex, int blockLine)
    {
        bool found = _blockOnOneLine ? SkipToTokenOnLine() : SkipToToken();
        if (!found || Current == (byte)'#' || Current == (byte)'[')
        {
            throw BlockShortError(valueIndex, blockLine, found);
        }
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private readonly Complex ToComplex(double a, double b, int aLine, int aColumn, int valueIndex)
    {
        double magnitude;
        switch (_format)
        {
            case TouchstoneDataFormat.RealImaginary:
                return new Complex(a, b);
            case TouchstoneDataFormat.MagnitudeAngle:
                if (a < 0)
                {
                    throw ErrorAt(aLine, aColumn, Invariant($"the magnitude of {ElementName(valueIndex)} is negative ({a:R}); in MA format a magnitude must be 0 or more"));
                }
                magnitude = a;
                break;
            default:
                magnitude = Math.Exp(a * DecibelToNeper);
                if (double.IsInfinity(magnitude))
                {
                    throw ErrorAt(aLine, aColumn, Invariant($"{a:R} dB ({ElementName(valueIndex)}) is too large: its magnitude overflows a double"));
                }
                break;
        }
        (double sin, double cos) = Math.SinCos(b * DegreesToRadians);
        return new Complex(magnitude * cos, magnitude * sin);
    }

    private static void Mirror(Span<Complex> matrix, int n, bool lowerGiven)
    {
        for (int row = 0; row < n; row++)
        {
            for (int column = row + 1; column < n; column++)
            {
                if (lowerGiven)
                {
                    matrix[row * n + column] = matrix[column * n + row];
                }
                else
                {
                    matrix[column * n + row] = matrix[row * n + column];
                }
            }
        }
    }

    private void Grow()
    {
        int capacity = Math.Max(_frequencies!.Length * 2, 16);
        double[] frequencies = ArrayPool<double>.Shared.Rent(capacity);
        Complex[] staging = ArrayPool<Complex>.Shared.Rent(capacity * _ports * _ports);
        _frequencies.AsSpan(0, _blocks).CopyTo(frequencies);
        _staging.AsSpan(0, _blocks * _ports * _ports).CopyTo(staging);
        ReturnBuffers();
        _frequencies = frequencies;
        _staging = staging;
    }

    // ---------------------------------------------------------------- noise

    private void ReadNoiseVersion1(double firstHz, int firstLine)
    {
        _noise = [];
        ReadNoiseLine(firstHz, firstLine, firstOfVersion1: true);
        while (SkipToToken())
        {
            if (Current == (byte)'#')
            {
                WarnIgnoredOptionLine();
                continue;
            }
            if (Current == (byte)'[')
            {
                int keywordLine = _line, keywordColumn = Column;
                string keyword = TakeKeyword(out string shown);
                throw KeywordOutsideVersion2(keyword, shown, keywordLine, keywordColumn);
            }
            int line = _line;
            ReadNoiseLine(TakeFrequency(), line, firstOfVersion1: false);
        }
    }

    private void ReadNoiseVersion2()
    {
        _noise = [];
        for (int read = 0; read < _declaredNoiseFrequencies;)
        {
            if (!SkipToToken())
            {
                throw ErrorAt(_lastTokenLine, 0, Invariant(
                    $"the file ends after {read} of the {_declaredNoiseFrequencies} noise lines that [Number of Noise Frequencies] (line {_noiseFrequenciesLine}) declares"));
            }
            if (Current == (byte)'#')
            {
                WarnIgnoredOptionLine();
                continue;
            }
            if (Current == (byte)'[')
            {
                throw ErrorHere(Invariant($"found '{Show(PeekKeyword())}' after {read} noise lines, but [Number of Noise Frequencies] (line {_noiseFrequenciesLine}) declares {_declaredNoiseFrequencies}"));
            }
            int line = _line;
            ReadNoiseLine(TakeFrequency(), line, firstOfVersion1: false);
            read++;
        }
    }

    /// <summary>One noise line: frequency (read), NFmin dB, |Γopt|, angle of Γopt, Rn, all on one line.</summary>
    private void ReadNoiseLine(double hz, int line, bool firstOfVersion1)
    {
        List<double> noise = _noise!;
        int count = noise.Count / 5;
        if (count > 0 && hz <= noise[^5])
        {
            throw ErrorAt(line, 0, Invariant($"noise frequency {Hz(hz)} is not above the previous noise frequency {Hz(noise[^5])} (line {_lastNoiseLine}); noise frequencies must strictly increase"));
        }
        noise.Add(hz);
        for (int index = 1; index < 5; index++)
        {
            if (!SkipToTokenOnLine() || Current == (byte)'#' || Current == (byte)'[')
            {
                throw NoiseCountError(line, index, firstOfVersion1, hz);
            }
            int start = _pos;
            double value = TakeNumber(0, ValueRole.NoiseValue, index);
            if ((index == 2 || index == 4) && value < 0)
            {
                _pos = start;
                throw ErrorHere(Invariant($"the {NoiseValueNames[index]} must not be negative; found {value:R}"));
            }
            noise.Add(value);
        }
        if (SkipToTokenOnLine())
        {
            int total = 5 + CountValuesOnLine();
            throw NoiseCountError(line, total, firstOfVersion1, hz);
        }
        _lastNoiseLine = line;
    }

    private int CountValuesOnLine()
    {
        int count = 0;
        while (SkipToTokenOnLine())
        {
            TakeWord();
            count++;
        }
        return count;
    }

    private readonly SweepReadException NoiseCountError(int line, int count, bool firstOfVersion1, double hz)
    {
        string expected = Invariant($"noise lines hold 5 values (frequency, NFmin in dB, |Γopt|, angle of Γopt in degrees, Rn); line {line} has {count}");
        if (firstOfVersion1)
        {
            double previous = _frequencies![_blocks - 1];
            string relation = hz == previous ? "repeats" : "is below";
            return ErrorAt(line, 0, Invariant($"line {line} starts with frequency {Hz(hz)}, which {relation} the last network frequency {Hz(previous)} (line {_lastBlockLine}), ")
                + Invariant($"so it would begin the noise data; but {expected}. If it is network data, frequencies must strictly increase"));
        }
        return ErrorAt(line, 0, count > 5 ? expected + " (network data cannot follow the noise data)" : expected);
    }

    // ---------------------------------------------------------------- errors about blocks

    private readonly SweepReadException FrequencyOrderError(double hz, int line, int column)
    {
        double previous = _frequencies![_blocks - 1];
        string problem = hz == previous
            ? Invariant($"frequency {Hz(hz)} repeats the frequency of the previous block (line {_lastBlockLine}); frequencies must strictly increase")
            : Invariant($"frequency {Hz(hz)} is below the previous frequency {Hz(previous)} (line {_lastBlockLine}); frequencies must strictly increase");
        if (_version == 1 && _ports != 2)
        {
            problem += " (only 2-port files may restart the frequencies for a noise block)";
        }
        return ErrorAt(line, column, problem);
    }

    private readonly string BlockShape => Invariant(
        $"a {_ports}-port block (port count from {_portSource}) has {_valuesPerBlock} values: the frequency and {_pairs} complex pairs");

    [MethodImpl(MethodImplOptions.NoInlining)]
    private readonly SweepReadException BlockShortError(int valueIndex, int blockLine, bool found)
    {
        string expected = Describe(ValueRole.BlockValue, valueIndex);
        if (_blockOnOneLine)
        {
            return ErrorAt(blockLine, 0, Invariant($"line {blockLine} has {valueIndex} values, but {BlockShape}, all on one line; expected {expected} next"));
        }
        if (!found)
        {
            return ErrorAt(_lastTokenLine, 0, Invariant($"the file ends in the middle of the block that starts on line {blockLine}: expected {expected} (value {valueIndex + 1} of {_valuesPerBlock}); {BlockShape}"));
        }
        return ErrorHere(Invariant($"the block that starts on line {blockLine} has only {valueIndex} of its {_valuesPerBlock} values before '{Show(PeekKeyword())}': expected {expected}"));
    }

    private readonly SweepReadException BlockOverrunError(int blockLine)
    {
        return _line == blockLine
            ? ErrorHere(Invariant($"line {blockLine} has more values than one block: {BlockShape}; found '{Show(PeekWord())}' after them"))
            : ErrorHere(Invariant($"the block that starts on line {blockLine} ends in the middle of line {_line}, where '{Show(PeekWord())}' follows; {BlockShape}, and each block must end its line"));
    }

    /// <summary>Names a value for a message, e.g. "real part of S21" or "noise frequency".</summary>
    private readonly string Describe(ValueRole role, int index)
    {
        switch (role)
        {
            case ValueRole.Frequency:
                return "frequency";
            case ValueRole.NoiseValue:
                return NoiseValueNames[index];
            case ValueRole.OptionReference:
                return "reference resistance R in ohms";
            case ValueRole.Reference:
                return Invariant($"reference impedance of port {index + 1} in ohms");
            default:
                if (index == 0)
                {
                    return "frequency";
                }
                bool first = (index - 1) % 2 == 0;
                string part = _format switch
                {
                    TouchstoneDataFormat.RealImaginary => first ? "real part" : "imaginary part",
                    TouchstoneDataFormat.MagnitudeAngle => first ? "magnitude" : "angle in degrees",
                    _ => first ? "magnitude in dB" : "angle in degrees",
                };
                return part + " of " + ElementName(index);
        }
    }

    private readonly string ElementName(int valueIndex)
    {
        int element = _pairIndex[(valueIndex - 1) / 2];
        int row = element / _ports + 1, column = element % _ports + 1;
        string letter = _parameter.ToString();
        return _ports < 10 ? Invariant($"{letter}{row}{column}") : Invariant($"{letter}({row},{column})");
    }

    // ---------------------------------------------------------------- the result

    private readonly Sweep Build(SweepFormat format)
    {
        int count = _blocks;
        int n2 = _ports * _ports;
        var hz = new double[count];
        _frequencies.AsSpan(0, count).CopyTo(hz);
        // Every element is written by the transpose below, so the large array need not be zeroed first.
        Complex[] flat = GC.AllocateUninitializedArray<Complex>(n2 * count);
        ReadOnlySpan<Complex> staging = _staging;
        for (int f = 0; f < count; f++)
        {
            ReadOnlySpan<Complex> matrix = staging.Slice(f * n2, n2);
            for (int element = 0; element < n2; element++)
            {
                flat[element * count + f] = matrix[element];
            }
        }
        FrequencyGrid grid = FrequencyGrid.Own(hz);
        NetworkData network = NetworkData.Own(grid, _ports, flat, _referenceOhm);
        return Sweep.FromNetwork(network, Source(format), BuildNoise());
    }

    private readonly NoiseParameters? BuildNoise()
    {
        if (_noise is null)
        {
            return null;
        }
        int count = _noise.Count / 5;
        var hz = new double[count];
        var nf = new double[count];
        var magnitude = new double[count];
        var angle = new double[count];
        var rn = new double[count];
        // Version 1 normalises Rn to the reference of the (input) port 1; version 2 gives ohms.
        double rnScale = _version == 1 ? _referenceOhm[0] : 1.0;
        for (int i = 0; i < count; i++)
        {
            hz[i] = _noise[5 * i];
            nf[i] = _noise[5 * i + 1];
            magnitude[i] = _noise[5 * i + 2];
            angle[i] = _noise[5 * i + 3];
            rn[i] = _noise[5 * i + 4] * rnScale;
        }
        return NoiseParameters.Create(FrequencyGrid.Own(hz), nf, magnitude, angle, rn);
    }
}
