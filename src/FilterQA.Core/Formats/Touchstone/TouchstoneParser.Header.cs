using System.Globalization;
using System.Text;

namespace FilterQA.Core.Formats.Touchstone;

/// <summary>The option line and the version 2.0 keywords.</summary>
internal ref partial struct TouchstoneParser
{


    /// <summary>Reads "# [unit] [parameter] [format] [R n...]" from the '#' to the end of its line.</summary>
    private void ReadOptionLine()
    {
        _optionLine = _line;
        _pos++;
        string? unit = null, parameter = null, format = null;
        bool referenceSeen = false;
        while (SkipToTokenOnLine())
        {
            int column = Column;
            ReadOnlySpan<byte> word = TakeWord();
            string upper = Encoding.ASCII.GetString(word).ToUpperInvariant();
            if (referenceSeen && _optionReferenceOhm.Length > 1)
            {
                throw ErrorAt(_line, column, $"R with one value per port must end the option line; found '{Show(word)}' after it");
            }
            switch (upper)
            {
                case "HZ" or "KHZ" or "MHZ" or "GHZ":
                    CheckRepeat(ref unit, upper, "frequency unit", column);
                    _unitPow10 = upper switch { "HZ" => 0, "KHZ" => 3, "MHZ" => 6, _ => 9 };
                    break;
                case "S" or "Y" or "Z" or "H" or "G":
                    CheckRepeat(ref parameter, upper, "parameter", column);
                    _parameter = Enum.Parse<TouchstoneParameter>(upper);
                    _parameterLine = _line;
                    _parameterColumn = column;
                    break;
                case "DB" or "MA" or "RI":
                    CheckRepeat(ref format, upper, "data format", column);
                    _format = upper switch { "DB" => TouchstoneDataFormat.DecibelAngle, "MA" => TouchstoneDataFormat.MagnitudeAngle, _ => TouchstoneDataFormat.RealImaginary };
                    break;
                case "R":
                    if (referenceSeen)
                    {
                        throw ErrorAt(_line, column, "the option line gives R twice");
                    }
                    referenceSeen = true;
                    _referenceLine = _line;
                    _referenceColumn = column;
                    _optionReferenceOhm = ReadOptionReferences();
                    break;
                default:
                    throw ErrorAt(_line, column, $"unknown option '{Show(word)}' on the option line; expected a unit (Hz, kHz, MHz, GHz), "
                        + "a parameter (S, Y, Z, H, G), a format (DB, MA, RI) or R followed by the reference resistance in ohms");
            }
        }
    }

    private readonly void CheckRepeat(ref string? seen, string token, string what, int column)
    {
        if (seen is not null && seen != token)
        {
            throw ErrorAt(_line, column, $"the option line gives two different values for the {what}: '{seen}' and '{token}'");
        }
        seen = token;
    }

    /// <summary>Reads the value(s) after R: one for every port, or (version 1.1) one per port.</summary>
    private double[] ReadOptionReferences()
    {
        var values = new List<double>();
        while (SkipToTokenOnLine())
        {
            int start = _pos;
            ReadOnlySpan<byte> word = PeekWord();
            bool looksNumeric = word[0] is (byte)'+' or (byte)'-' or (byte)'.' || (word[0] >= (byte)'0' && word[0] <= (byte)'9');
            if (values.Count > 0 && !looksNumeric)
            {
                break;
            }
            double r = TakeNumber(0, ValueRole.OptionReference, values.Count);
            if (!(r > 0))
            {
                _pos = start;
                throw ErrorHere($"the reference resistance R must be a positive number of ohms; found '{Show(word)}'");
            }
            values.Add(r);
        }
        if (values.Count == 0)
        {
            throw ErrorHere("R on the option line must be followed by the reference resistance in ohms (a positive number)");
        }
        return values.ToArray();
    }

    /// <summary>Checks what the option line says against the port count, once that is known.</summary>
    private readonly void CheckOptionsForPorts(int portCount)
    {
        if (_parameter is TouchstoneParameter.H or TouchstoneParameter.G)
        {
            string letter = _parameter.ToString();
            string problem = portCount != 2
                ? Invariant($"{letter} parameters exist only for 2-ports, but this file has {portCount} ports")
                : Invariant($"{letter} parameters are not supported; FilterQA reads S, Y and Z parameters");
            throw ErrorAt(_parameterLine, _parameterColumn, problem);
        }
        if (_keywordReferenceOhm is null && _optionReferenceOhm.Length != 1 && _optionReferenceOhm.Length != portCount)
        {
            throw ErrorAt(_referenceLine, _referenceColumn, Invariant(
                $"R gives {_optionReferenceOhm.Length} reference resistances for a {portCount}-port file; give one for every port, or one per port"));
        }
    }

    /// <summary>The reference impedance of each port: [Reference] if given, else R (one value for all, or one per port).</summary>
    private readonly double[] ReferencesFor(int portCount)
    {
        if (_keywordReferenceOhm is not null)
        {
            return _keywordReferenceOhm;
        }
        if (_optionReferenceOhm.Length == portCount)
        {
            return (double[])_optionReferenceOhm.Clone();
        }
        var all = new double[portCount];
        Array.Fill(all, _optionReferenceOhm[0]);
        return all;
    }

    private void WarnIgnoredOptionLine()
    {
        _warnings.Add(Invariant($"line {_line}: a further option line is ignored (the option line on line {_optionLine} applies)"));
        SkipRestOfLine();
    }

    private readonly SweepReadException KeywordOutsideVersion2(string keyword, string shown, int line, int column)
    {
        if (keyword == "[version]")
        {
            return ErrorAt(line, column, "[Version] must be the first line of a file that is not a comment");
        }
        return IsVersion2Keyword(keyword)
            ? ErrorAt(line, column, $"the keyword {shown} is Touchstone 2.0 syntax, but the file does not start with [Version] 2.0")
            : ErrorAt(line, column, $"unknown keyword {shown}");
    }

    private static bool IsVersion2Keyword(string keyword) => keyword is "[version]" or "[number of ports]" or "[two-port data order]"
        or "[number of frequencies]" or "[number of noise frequencies]" or "[reference]" or "[matrix format]" or "[network data]"
        or "[noise data]" or "[end]" or "[mixed-mode order]" or "[begin information]" or "[end information]";

    /// <summary>Reads the keywords from [Version] up to and including [Network Data].</summary>
    private void ReadVersion2Header(int versionLine)
    {
        if (!SkipToTokenOnLine())
        {
            throw ErrorAt(versionLine, 0, "[Version] needs a value; this reader reads version 2.0");
        }
        ReadOnlySpan<byte> version = TakeWord();
        if (!version.SequenceEqual("2.0"u8))
        {
            throw ErrorAt(versionLine, Column - version.Length, $"Touchstone version '{Show(version)}' is not supported; this reader reads 1.x and 2.0");
        }
        EnsureLineEnds("[Version] 2.0");
        if (!SkipToToken())
        {
            throw ErrorAt(versionLine, 0, "the file ends after [Version]; the option line (for example '# GHz S MA R 50') must follow it");
        }
        if (Current != (byte)'#')
        {
            throw ErrorHere($"expected the option line (for example '# GHz S MA R 50') right after [Version] 2.0; found '{Show(PeekWord())}'");
        }
        ReadOptionLine();
        string previous = "";
        while (true)
        {
            if (!SkipToToken())
            {
                throw ErrorAt(_lastTokenLine, 0, "the file ends before [Network Data]; a Touchstone 2.0 file needs [Number of Ports], "
                    + "[Number of Frequencies], [Network Data] and [End]");
            }
            if (Current == (byte)'#')
            {
                WarnIgnoredOptionLine();
                continue;
            }
            if (Current != (byte)'[')
            {
                throw previous == "[reference]"
                    ? ErrorHere(Invariant($"[Reference] (line {_referenceKeywordLine}) gives more than {_declaredPorts} values; give one per port"))
                    : ErrorHere($"expected a keyword such as [Number of Ports] or [Network Data]; found '{Show(PeekWord())}' (data must follow [Network Data])");
            }
            int line = _line, column = Column;
            string keyword = TakeKeyword(out string shown);
            previous = keyword;
            if (keyword == "[network data]")
            {
                CheckHeaderComplete(line, column);
                EnsureLineEnds("[Network Data]");
                return;
            }
            ReadHeaderKeyword(keyword, shown, line, column);
        }
    }

    private void ReadHeaderKeyword(string keyword, string shown, int line, int column)
    {
        switch (keyword)
        {
            case "[number of ports]":
                Once(_portsLine, shown, line, column);
                _portsLine = line;
                _declaredPorts = TakeCount(shown, MaxPorts);
                if (_extensionPortCount != 0 && _extensionPortCount != _declaredPorts)
                {
                    throw ErrorAt(line, column, Invariant($"[Number of Ports] says {_declaredPorts} ports, but the file name '{_fileName}' says {_extensionPortCount}"));
                }
                if (_callerPortCount != 0 && _callerPortCount != _declaredPorts)
                {
                    throw ErrorAt(line, column, Invariant($"[Number of Ports] says {_declaredPorts} ports, but the caller asked for {_callerPortCount}"));
                }
                break;
            case "[two-port data order]":
                Once(_dataOrderLine, shown, line, column);
                NeedPorts(shown, line, column);
                if (_declaredPorts != 2)
                {
                    throw ErrorAt(line, column, Invariant($"[Two-Port Data Order] is only for 2-port files; this file has {_declaredPorts} ports"));
                }
                _dataOrderLine = line;
                ReadOnlySpan<byte> order = SkipToTokenOnLine() ? TakeWord() : default;
                if (order.SequenceEqual("12_21"u8) || order.SequenceEqual("21_12"u8))
                {
                    _order21Before12 = order[0] == (byte)'2';
                }
                else
                {
                    throw ErrorAt(line, column, $"[Two-Port Data Order] must be 12_21 or 21_12; found '{Show(order)}'");
                }
                break;
            case "[number of frequencies]":
                Once(_frequenciesLine, shown, line, column);
                _frequenciesLine = line;
                _declaredFrequencies = TakeCount(shown, int.MaxValue);
                break;
            case "[number of noise frequencies]":
                Once(_noiseFrequenciesLine, shown, line, column);
                NeedPorts(shown, line, column);
                if (_declaredPorts != 2)
                {
                    throw ErrorAt(line, column, Invariant($"noise data exists only for 2-ports; this file has {_declaredPorts} ports"));
                }
                _noiseFrequenciesLine = line;
                _declaredNoiseFrequencies = TakeCount(shown, int.MaxValue);
                break;
            case "[reference]":
                Once(_referenceKeywordLine, shown, line, column);
                NeedPorts(shown, line, column);
                _referenceKeywordLine = line;
                _keywordReferenceOhm = ReadKeywordReferences(line);
                return;
            case "[matrix format]":
                Once(_matrixFormatLine, shown, line, column);
                NeedPorts(shown, line, column);
                _matrixFormatLine = line;
                ReadOnlySpan<byte> format = SkipToTokenOnLine() ? TakeWord() : default;
                if (Ascii.EqualsIgnoreCase(format, "full"u8))
                {
                    _matrixFormat = TouchstoneMatrixFormat.Full;
                }
                else if (Ascii.EqualsIgnoreCase(format, "lower"u8))
                {
                    _matrixFormat = TouchstoneMatrixFormat.Lower;
                }
                else if (Ascii.EqualsIgnoreCase(format, "upper"u8))
                {
                    _matrixFormat = TouchstoneMatrixFormat.Upper;
                }
                else
                {
                    throw ErrorAt(line, column, $"[Matrix Format] must be Full, Lower or Upper; found '{Show(format)}'");
                }
                break;
            case "[version]":
                throw ErrorAt(line, column, "[Version] may appear only once, as the first line that is not a comment");
            case "[noise data]" or "[end]":
                throw ErrorAt(line, column, $"{shown} before [Network Data]; the network data comes first");
            default:
                throw UnsupportedOrUnknown(keyword, shown, line, column);
        }
        EnsureLineEnds(shown);
    }

    private readonly SweepReadException UnsupportedOrUnknown(string keyword, string shown, int line, int column) => keyword switch
    {
        "[mixed-mode order]" => ErrorAt(line, column, "[Mixed-Mode Order] (mixed-mode data) is not supported; FilterQA reads single-ended data"),
        "[begin information]" or "[end information]" => ErrorAt(line, column, $"{shown} (an information block) is not supported"),
        _ when IsVersion2Keyword(keyword) => ErrorAt(line, column, $"{shown} is out of place here"),
        _ => ErrorAt(line, column, $"unknown keyword {shown}"),
    };

    private readonly void Once(int seenLine, string shown, int line, int column)
    {
        if (seenLine != 0)
        {
            throw ErrorAt(line, column, Invariant($"{shown} is given twice (first on line {seenLine})"));
        }
    }

    private readonly void NeedPorts(string shown, int line, int column)
    {
        if (_portsLine == 0)
        {
            throw ErrorAt(line, column, $"{shown} must come after [Number of Ports]");
        }
    }

    private void CheckHeaderComplete(int line, int column)
    {
        if (_portsLine == 0)
        {
            throw ErrorAt(line, column, "[Number of Ports] is missing; it must come before [Network Data]");
        }
        if (_declaredPorts == 2 && _dataOrderLine == 0)
        {
            throw ErrorAt(line, column, "[Two-Port Data Order] (12_21 or 21_12) is missing; a 2-port file must give it before [Network Data]");
        }
        if (_frequenciesLine == 0)
        {
            throw ErrorAt(line, column, "[Number of Frequencies] is missing; it must come before [Network Data]");
        }
    }

    /// <summary>A whole number from 1 to <paramref name="max"/> on the keyword's line.</summary>
    private int TakeCount(string shown, int max)
    {
        if (!SkipToTokenOnLine())
        {
            throw ErrorHere($"{shown} needs a whole number on its line");
        }
        ReadOnlySpan<byte> word = PeekWord();
        if (word.Length > 10 || !int.TryParse(word, NumberStyles.None, CultureInfo.InvariantCulture, out int value) || value < 1 || value > max)
        {
            throw ErrorHere(Invariant($"{shown} needs a whole number from 1 to {max}; found '{Show(word)}'"));
        }
        _pos += word.Length;
        return value;
    }

    /// <summary>Reads one positive reference impedance per port; the values may run over several lines.</summary>
    private double[] ReadKeywordReferences(int keywordLine)
    {
        var values = new double[_declaredPorts];
        for (int got = 0; got < values.Length; got++)
        {
            if (!SkipToToken())
            {
                throw ErrorAt(_lastTokenLine, 0, Invariant($"[Reference] (line {keywordLine}) needs {values.Length} values, one per port; the file ends after {got}"));
            }
            if (Current is (byte)'[' or (byte)'#')
            {
                throw ErrorHere(Invariant($"[Reference] (line {keywordLine}) needs {values.Length} values, one per port; found {got}"));
            }
            int start = _pos;
            double r = TakeNumber(0, ValueRole.Reference, got);
            if (!(r > 0))
            {
                _pos = start;
                throw ErrorHere(Invariant($"the reference impedance of port {got + 1} must be a positive number of ohms; found '{Show(PeekWord())}'"));
            }
            values[got] = r;
        }
        if (SkipToTokenOnLine())
        {
            throw ErrorHere(Invariant($"[Reference] (line {keywordLine}) gives more than {values.Length} values; give one per port"));
        }
        return values;
    }

    /// <summary>Nothing but blanks or a comment may follow on this line.</summary>
    private void EnsureLineEnds(string after)
    {
        if (SkipToTokenOnLine())
        {
            throw ErrorHere($"unexpected '{Show(PeekWord())}' after {after}; nothing else belongs on this line");
        }
    }
}
