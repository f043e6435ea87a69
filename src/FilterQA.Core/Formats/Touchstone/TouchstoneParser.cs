using System.Buffers;
using System.Globalization;
using System.Numerics;
using System.Runtime.CompilerServices;
using System.Security.Cryptography;
using System.Text;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Formats.Touchstone;

/// <summary>
/// Reads one Touchstone file held in memory as UTF-8 (in fact ASCII) bytes, straight from the bytes:
/// no string is made per line or number. Numbers are read as a token stream; line breaks are tracked
/// only to report where a problem is and to check that every block starts and ends a line.
/// Every problem is a <see cref="SweepReadException"/> naming line and column.
/// </summary>
/// <remarks>This part holds the entry point, the byte scanner and the error helpers; the header
/// (option line, version 2.0 keywords) and the data blocks live in the other parts.</remarks>
internal ref partial struct TouchstoneParser
{
    private const int MaxPorts = 999;

    private readonly ReadOnlySpan<byte> _content;
    private readonly ReadOnlySpan<byte> _text;
    private readonly string _fileName;
    private readonly int _callerPortCount;
    private readonly int _extensionPortCount;
    private readonly List<string> _notes = [];
    private readonly List<string> _warnings = [];

    private int _pos;
    private int _line = 1;
    private int _lineStart;
    private int _lastTokenLine;

    // Option line and version 2.0 header (see the Header part); a line of 0 means "not given".
    private int _version = 1;
    private int _optionLine;
    private int _unitPow10 = 9;
    private TouchstoneParameter _parameter = TouchstoneParameter.S;
    private int _parameterLine;
    private int _parameterColumn;
    private TouchstoneDataFormat _format = TouchstoneDataFormat.MagnitudeAngle;
    private double[] _optionReferenceOhm = [50.0];
    private int _referenceLine;
    private int _referenceColumn;
    private int _portsLine;
    private int _declaredPorts;
    private int _dataOrderLine;
    private bool _order21Before12;
    private int _frequenciesLine;
    private int _declaredFrequencies;
    private int _noiseFrequenciesLine;
    private int _declaredNoiseFrequencies;
    private int _referenceKeywordLine;
    private double[]? _keywordReferenceOhm;
    private int _matrixFormatLine;
    private TouchstoneMatrixFormat _matrixFormat = TouchstoneMatrixFormat.Full;
    private int _ports;
    private string _portSource = "";
    private int _pairs;
    private int _valuesPerBlock;
    private int[] _pairIndex = [];
    private bool _blockOnOneLine;
    private double[] _referenceOhm = [];
    private Complex[]? _staging;
    private double[]? _frequencies;
    private int _blocks;
    private int _lastBlockLine;
    private List<double>? _noise;
    private int _lastNoiseLine;

    public TouchstoneParser(ReadOnlySpan<byte> content, string fileName, int callerPortCount)
    {
        _content = content;
        _text = content;
        _fileName = fileName;
        _callerPortCount = callerPortCount;
        _extensionPortCount = PortCountFromExtension(fileName);
    }

    private readonly int Column => _pos - _lineStart + 1;

    private readonly byte Current => _text[_pos];

    /// <summary>Reads the whole file; returns the sweep or throws <see cref="SweepReadException"/>.</summary>
    public Sweep Parse()
    {
        try
        {
            return ParseFile();
        }
        finally
        {
            ReturnBuffers();
        }
    }

    private Sweep ParseFile()
    {
        if (_text.Length == 0)
        {
            throw new SweepReadException(_fileName, 0, 0, "the file is empty (0 bytes); a Touchstone file needs an option line and data");
        }
        if (_text.StartsWith("\uFEFF"u8))
        {
            // Columns are counted from after the mark, as an editor shows them.
            _pos = 3;
            _lineStart = 3;
            _warnings.Add("the file starts with a UTF-8 byte-order mark; Touchstone files are plain ASCII (the mark was skipped)");
        }
        if (!SkipToToken())
        {
            throw new SweepReadException(_fileName, 0, 0, "the file holds no option line and no data (only blank lines or comments)");
        }
        if (Current == (byte)'[')
        {
            int line = _line, column = Column;
            string keyword = TakeKeyword(out string shown);
            if (keyword == "[version]")
            {
                return ParseVersion2(line);
            }
            throw KeywordOutsideVersion2(keyword, shown, line, column);
        }
        if (Current != (byte)'#')
        {
            throw ErrorHere($"expected the option line (for example '# GHz S MA R 50') before any data; found '{Show(PeekWord())}'");
        }
        ReadOptionLine();
        return ParseVersion1();
    }

    // ---------------------------------------------------------------- scanning

    /// <summary>Skips blanks, line ends and comments up to the next token; false at the end of the text.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private bool SkipToToken()
    {
        ReadOnlySpan<byte> text = _text;
        int pos = _pos;
        while ((uint)pos < (uint)text.Length)
        {
            byte b = text[pos];
            if (b == (byte)' ' || b == (byte)'\t')
            {
                pos++;
            }
            else if (b == (byte)'\n')
            {
                pos++;
                _line++;
                _lineStart = pos;
            }
            else if (b == (byte)'\r')
            {
                pos++;
                if (pos < text.Length && text[pos] == (byte)'\n')
                {
                    pos++;
                }
                _line++;
                _lineStart = pos;
            }
            else if (b == (byte)'!')
            {
                pos = SkipComment(pos);
            }
            else
            {
                _pos = pos;
                if (b < 0x20 || b >= 0x7F)
                {
                    throw BadByte(b);
                }
                _lastTokenLine = _line;
                return true;
            }
        }
        _pos = pos;
        return false;
    }

    /// <summary>Like <see cref="SkipToToken"/> but never leaves the line: false at a line end, a comment or the end of the text.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private bool SkipToTokenOnLine()
    {
        ReadOnlySpan<byte> text = _text;
        int pos = _pos;
        while ((uint)pos < (uint)text.Length)
        {
            byte b = text[pos];
            if (b == (byte)' ' || b == (byte)'\t')
            {
                pos++;
                continue;
            }
            _pos = pos;
            if (b == (byte)'\n' || b == (byte)'\r' || b == (byte)'!')
            {
                return false;
            }
            if (b < 0x20 || b >= 0x7F)
            {
                throw BadByte(b);
            }
            _lastTokenLine = _line;
            return true;
        }
        _pos = pos;
        return false;
    }

    /// <summary>Skips a comment from its '!' to the end of its line; keeps it as a note when it fills the line.</summary>
    private int SkipComment(int bang)
    {
        int start = bang + 1;
        ReadOnlySpan<byte> rest = _text[start..];
        int end = rest.IndexOfAny((byte)'\n', (byte)'\r');
        ReadOnlySpan<byte> comment = end < 0 ? rest : rest[..end];
        int bad = IndexOfNonText(comment);
        if (bad >= 0)
        {
            _pos = start + bad;
            throw BadByte(comment[bad]);
        }
        if (_lastTokenLine != _line)
        {
            _notes.Add(Encoding.ASCII.GetString(comment).Trim());
        }
        return start + comment.Length;
    }

    /// <summary>Skips the rest of the current line (used for ignored option lines), still checking its bytes.</summary>
    private void SkipRestOfLine()
    {
        ReadOnlySpan<byte> rest = _text[_pos..];
        int end = rest.IndexOfAny((byte)'\n', (byte)'\r');
        ReadOnlySpan<byte> line = end < 0 ? rest : rest[..end];
        int bad = IndexOfNonText(line);
        if (bad >= 0)
        {
            _pos += bad;
            throw BadByte(line[bad]);
        }
        _pos += line.Length;
    }

    private static int IndexOfNonText(ReadOnlySpan<byte> span)
    {
        int offset = 0;
        while (true)
        {
            int i = span[offset..].IndexOfAnyExceptInRange((byte)0x20, (byte)0x7E);
            if (i < 0)
            {
                return -1;
            }
            if (span[offset + i] != (byte)'\t')
            {
                return offset + i;
            }
            offset += i + 1;
        }
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static bool IsWordByte(byte b) => b > 0x20 && b < 0x7F && b != (byte)'!';

    /// <summary>Takes the word at the current position (up to a blank, a line end, a comment or a bad byte).</summary>
    private ReadOnlySpan<byte> TakeWord()
    {
        int start = _pos;
        while (_pos < _text.Length && IsWordByte(_text[_pos]))
        {
            _pos++;
        }
        return _text[start.._pos];
    }

    /// <summary>The word at the current position, without taking it (for messages).</summary>
    private readonly ReadOnlySpan<byte> PeekWord()
    {
        int end = _pos;
        while (end < _text.Length && IsWordByte(_text[end]))
        {
            end++;
        }
        return _text[_pos..end];
    }

    /// <summary>
    /// Takes a bracketed keyword such as "[Number of Ports]"; returns it lower-cased with single spaces
    /// (the standard makes keywords case-insensitive) and gives the text as written in <paramref name="shown"/>.
    /// </summary>
    private string TakeKeyword(out string shown)
    {
        int start = _pos;
        int i = _pos + 1;
        while (i < _text.Length && _text[i] != (byte)']' && _text[i] != (byte)'\n' && _text[i] != (byte)'\r')
        {
            byte b = _text[i];
            if ((b < 0x20 && b != (byte)'\t') || b >= 0x7F)
            {
                _pos = i;
                throw BadByte(b);
            }
            i++;
        }
        if (i >= _text.Length || _text[i] != (byte)']')
        {
            throw ErrorHere($"the keyword '{Show(_text[start..i])}' has no closing ']' on its line");
        }
        _pos = i + 1;
        shown = Encoding.ASCII.GetString(_text[start.._pos]);
        string inner = string.Join(' ', shown[1..^1].Split([' ', '\t'], StringSplitOptions.RemoveEmptyEntries));
        return "[" + inner.ToLowerInvariant() + "]";
    }

    /// <summary>Takes the number at the current position, scaled by 10^<paramref name="scalePow10"/>; throws a clear error otherwise.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private double TakeNumber(int scalePow10, ValueRole role, int index)
    {
        int start = _pos;
        if (AsciiNumber.TryParsePrefix(_text[start..], scalePow10, out double value, out int consumed))
        {
            int end = start + consumed;
            if ((end >= _text.Length || !IsWordByte(_text[end])) && double.IsFinite(value))
            {
                _pos = end;
                return value;
            }
        }
        throw NumberError(role, index);
    }

    // ---------------------------------------------------------------- errors

    private readonly SweepReadException ErrorHere(string problem) => new(_fileName, _line, Column, problem);

    private readonly SweepReadException ErrorAt(int line, int column, string problem) => new(_fileName, line, column, problem);

    private readonly SweepReadException BadByte(byte b)
    {
        string problem = b < 0x20 || b == 0x7F
            ? string.Create(CultureInfo.InvariantCulture, $"control character 0x{b:X2} is not allowed; Touchstone files are printable ASCII text")
            : string.Create(CultureInfo.InvariantCulture, $"byte 0x{b:X2} is not ASCII; Touchstone files are printable ASCII text (is this a binary file or another text encoding?)");
        return ErrorHere(problem);
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private readonly SweepReadException NumberError(ValueRole role, int index)
    {
        ReadOnlySpan<byte> word = PeekWord();
        string what = Describe(role, index);
        string shown = Show(word);
        if (word.IsEmpty)
        {
            return ErrorHere($"expected a number ({what}), found {(_pos < _text.Length ? $"'{(char)_text[_pos]}'" : "the end of the file")}");
        }
        if (AsciiNumber.TryParse(word, out double value) && !double.IsFinite(value))
        {
            return ErrorHere($"the number '{shown}' ({what}) is too large for a double (overflow)");
        }
        if (AsciiNumber.TryParsePrefix(word, 0, out _, out _) && !AsciiNumber.TryParse(word, out _) && word.Contains((byte)',') && word.IndexOfAnyInRange((byte)'0', (byte)'9') >= 0)
        {
            return ErrorHere($"expected a number ({what}), found '{shown}': Touchstone numbers use a decimal point, not a comma");
        }
        if (IsFortranNumber(word))
        {
            return ErrorHere($"expected a number ({what}), found '{shown}': a Fortran 'D' exponent; Touchstone numbers use 'E'");
        }
        if (IsNotANumberWord(word))
        {
            return ErrorHere($"expected a number ({what}), found '{shown}': NaN and infinity are not allowed; every value must be a finite number");
        }
        return ErrorHere($"expected a number ({what}), found '{shown}'");
    }

    private static bool IsFortranNumber(ReadOnlySpan<byte> word)
    {
        int d = word.IndexOfAny((byte)'d', (byte)'D');
        if (d <= 0)
        {
            return false;
        }
        Span<byte> copy = stackalloc byte[Math.Min(word.Length, 64)];
        if (word.Length > copy.Length)
        {
            return false;
        }
        word.CopyTo(copy);
        copy[d] = (byte)'E';
        return AsciiNumber.TryParse(copy, out _);
    }

    private static bool IsNotANumberWord(ReadOnlySpan<byte> word)
    {
        if (word.Length > 0 && (word[0] == (byte)'+' || word[0] == (byte)'-'))
        {
            word = word[1..];
        }
        return Ascii.EqualsIgnoreCase(word, "nan"u8) || Ascii.EqualsIgnoreCase(word, "inf"u8)
            || Ascii.EqualsIgnoreCase(word, "infinity"u8) || Ascii.EqualsIgnoreCase(word, "1.#inf"u8)
            || Ascii.EqualsIgnoreCase(word, "1.#qnan"u8) || Ascii.EqualsIgnoreCase(word, "nan(ind)"u8);
    }

    /// <summary>Text of a token for a message: at most 40 characters.</summary>
    private static string Show(ReadOnlySpan<byte> word)
    {
        string text = Encoding.ASCII.GetString(word.Length > 40 ? word[..40] : word);
        return word.Length > 40 ? text + "..." : text;
    }

    private static string Hz(double hz) => string.Create(CultureInfo.InvariantCulture, $"{hz:R} Hz");

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);

    /// <summary>The port count a name ending in .sNp gives (N from 1 to 999), or 0.</summary>
    internal static int PortCountFromExtension(string fileName)
    {
        string extension = Path.GetExtension(fileName);
        if (extension.Length < 4 || (extension[1] | 0x20) != 's' || (extension[^1] | 0x20) != 'p')
        {
            return 0;
        }
        ReadOnlySpan<char> digits = extension.AsSpan(2, extension.Length - 3);
        if (digits.Length > 3 || !int.TryParse(digits, NumberStyles.None, CultureInfo.InvariantCulture, out int n) || n < 1)
        {
            return 0;
        }
        return n;
    }

    private readonly string Sha256Hex() => Convert.ToHexStringLower(SHA256.HashData(_content));

    private readonly SweepSource Source(SweepFormat format) => new(_fileName, format, Sha256Hex(), _notes.ToArray(), _warnings.ToArray());

    private void ReturnBuffers()
    {
        if (_staging is not null)
        {
            ArrayPool<Complex>.Shared.Return(_staging);
            _staging = null;
        }
        if (_frequencies is not null)
        {
            ArrayPool<double>.Shared.Return(_frequencies);
            _frequencies = null;
        }
    }
}
