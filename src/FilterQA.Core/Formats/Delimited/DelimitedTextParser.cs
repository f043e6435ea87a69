using System.Globalization;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Formats.Delimited;

/// <summary>
/// Walks the decoded text line by line: comments become notes, the first content row fixes the
/// delimiter and is either the header or the first data row, every data row is checked and parsed.
/// Throws only <see cref="DelimitedProblem"/>; builds the trace only once every row is good.
/// </summary>
internal sealed class DelimitedTextParser
{
    private readonly DelimitedTextOptions _options;
    private readonly List<string> _notes = [];
    private readonly List<DelimitedCell> _cells = [];
    private readonly List<double> _hz = [];
    private readonly List<double> _level = [];
    private readonly List<double> _phase = [];

    private char _delimiter;
    private bool _started;
    private bool _trailingEmptyCell;
    private int _expectedCells;
    private int _layoutLine;
    private DelimitedColumnPlan? _plan;
    private int _previousLine;

    private DelimitedTextParser(DelimitedTextOptions options) => _options = options;

    /// <summary>Parses <paramref name="text"/> into a scalar trace and the file's notes.</summary>
    public static (ScalarTrace Trace, IReadOnlyList<string> Notes) Parse(string text, DelimitedTextOptions options)
    {
        var parser = new DelimitedTextParser(options);
        int i = 0, line = 0;
        while (i < text.Length)
        {
            int start = i;
            while (i < text.Length && text[i] != '\r' && text[i] != '\n')
            {
                i++;
            }
            int end = i;
            if (i < text.Length)
            {
                i += text[i] == '\r' && i + 1 < text.Length && text[i + 1] == '\n' ? 2 : 1;
            }
            line++;
            parser.Line(line, text.AsSpan(start, end - start));
        }
        return (parser.Finish(), parser._notes);
    }

    private void Line(int line, ReadOnlySpan<char> text)
    {
        ReadOnlySpan<char> trimmed = text.Trim(" \t");
        if (trimmed.IsEmpty)
        {
            return;
        }
        if (trimmed[0] is '#' or '!')
        {
            int bad = DelimitedCellSplitter.IndexOfForbidden(trimmed);
            if (bad >= 0)
            {
                throw new DelimitedProblem(line, 1, "this comment line " + DelimitedCellSplitter.Forbidden(trimmed[bad]));
            }
            _notes.Add(trimmed[1..].Trim(" \t").ToString());
            return;
        }
        if (!_started)
        {
            // With no delimiter found the row is one cell (or holds a control character): either is reported below.
            _delimiter = _options.Delimiter ?? DelimitedCellSplitter.Detect(text) ?? ',';
        }
        if (!DelimitedCellSplitter.TrySplit(text, _delimiter, _cells, out int badCell, out string? problem))
        {
            throw new DelimitedProblem(line, badCell, "this cell " + problem);
        }
        if (!_started)
        {
            First(line, text);
            return;
        }
        if (_trailingEmptyCell && _cells.Count > 1 && !_cells[^1].Quoted && _cells[^1].IsEmpty(text))
        {
            _cells.RemoveAt(_cells.Count - 1);
        }
        Data(line, text);
    }

    private void First(int line, ReadOnlySpan<char> text)
    {
        _started = true;
        // Spreadsheets often end every row with a delimiter: that empty last cell is not a column.
        if (_cells.Count > 1 && !_cells[^1].Quoted && _cells[^1].IsEmpty(text))
        {
            _trailingEmptyCell = true;
            _cells.RemoveAt(_cells.Count - 1);
        }
        if (_cells.Count < 2)
        {
            throw new DelimitedProblem(line, 0, _options.Delimiter is { } given
                ? $"this row has one cell; expected at least frequency and level separated by a {Name(given)}"
                : "this row has one cell; expected at least frequency and level separated by a comma, tab or semicolon");
        }
        _expectedCells = _cells.Count;
        _layoutLine = line;

        int numeric = 0, words = 0;
        foreach (DelimitedCell cell in _cells)
        {
            ReadOnlySpan<char> raw = cell.Raw(text);
            if (DelimitedNumber.LooksNumeric(raw))
            {
                numeric++;
            }
            else if (!raw.Trim().IsEmpty)
            {
                words++;
            }
        }
        // A header has words and no numbers; a row with numbers is data (a bad cell in it is reported as such).
        if (words > 0 && numeric == 0)
        {
            var header = new string[_cells.Count];
            for (int i = 0; i < header.Length; i++)
            {
                header[i] = _cells[i].Text(text).Trim();
            }
            _plan = DelimitedColumnChooser.FromHeader(header, line, _options);
            return;
        }
        _plan = DelimitedColumnChooser.Positional(_expectedCells, line, _options);
        Data(line, text);
    }

    private void Data(int line, ReadOnlySpan<char> text)
    {
        DelimitedColumnPlan plan = _plan!;
        if (_cells.Count != _expectedCells)
        {
            bool more = _cells.Count > _expectedCells;
            string hint = more && _delimiter == ',' ? " (a decimal comma? in a comma-delimited file the decimal mark must be '.')" : "";
            throw new DelimitedProblem(line, (more ? _expectedCells : _cells.Count) + 1, string.Create(CultureInfo.InvariantCulture,
                $"this row has {_cells.Count} cells; expected {_expectedCells} as in line {_layoutLine}{hint}"));
        }
        double hz = Number(line, text, plan.FrequencyIndex, "frequency", plan.Unit.DecimalExponent());
        if (hz < 0)
        {
            throw new DelimitedProblem(line, plan.FrequencyIndex + 1,
                $"the frequency {Cell(text, plan.FrequencyIndex)} is negative; frequencies must be 0 Hz or more");
        }
        if (_hz.Count > 0 && hz <= _hz[^1])
        {
            double previous = _hz[^1];
            throw new DelimitedProblem(line, plan.FrequencyIndex + 1, hz == previous
                ? string.Create(CultureInfo.InvariantCulture, $"the frequency {hz:R} Hz repeats that of line {_previousLine}; frequencies must strictly increase")
                : string.Create(CultureInfo.InvariantCulture, $"the frequency {hz:R} Hz is below {previous:R} Hz of line {_previousLine}; frequencies must strictly increase"));
        }
        double level = Number(line, text, plan.LevelIndex, "level", 0);
        if (plan.PhaseIndex is { } phaseIndex)
        {
            _phase.Add(Number(line, text, phaseIndex, "phase", 0));
        }
        _hz.Add(hz);
        _level.Add(level);
        _previousLine = line;
    }

    private double Number(int line, ReadOnlySpan<char> text, int index, string what, int decimalShift)
    {
        DelimitedCell cell = _cells[index];
        DelimitedNumberStatus status = DelimitedNumber.TryParse(cell.Raw(text), _delimiter == ';', decimalShift, out double value);
        string shown = Cell(text, index);
        return status switch
        {
            DelimitedNumberStatus.Ok => value,
            DelimitedNumberStatus.Empty => throw new DelimitedProblem(line, index + 1, $"the {what} cell is empty; expected a number"),
            DelimitedNumberStatus.NotFinite => throw new DelimitedProblem(line, index + 1,
                $"the {what} {shown} is not a finite number; expected a decimal number (NaN and infinities are refused)"),
            DelimitedNumberStatus.Overflow => throw new DelimitedProblem(line, index + 1,
                $"the {what} {shown} is too large for a double (beyond about 1.8e308 {(decimalShift > 0 ? "Hz" : "in its unit")}); expected a measured value"),
            DelimitedNumberStatus.DecimalCommaNotAllowed => throw new DelimitedProblem(line, index + 1,
                $"the {what} {shown} has a decimal comma; a decimal comma is accepted only in semicolon-delimited files, expected '.'"),
            _ => throw new DelimitedProblem(line, index + 1,
                $"the {what} {shown} is not a number; expected a decimal number such as -3.25 or 1.5e6 (no thousands separators)"),
        };
    }

    private string Cell(ReadOnlySpan<char> text, int index) => DelimitedColumnChooser.Quote(_cells[index].Text(text).Trim());

    private ScalarTrace Finish()
    {
        if (_hz.Count == 0)
        {
            throw new DelimitedProblem(0, 0, _started
                ? "there are no data rows after the header; expected rows of frequency and level"
                : "there are no data rows (only comments or blank lines); expected rows of frequency and level");
        }
        FrequencyGrid grid = FrequencyGrid.Own(_hz.ToArray());
        return ScalarTrace.Own(grid, _plan!.Quantity, _level.ToArray(), _plan.PhaseIndex is null ? null : _phase.ToArray());
    }

    private static string Name(char delimiter) => delimiter switch
    {
        '\t' => "tab",
        ';' => "semicolon",
        _ => "comma",
    };
}
