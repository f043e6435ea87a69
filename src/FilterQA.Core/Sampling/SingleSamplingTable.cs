using System.Globalization;

namespace FilterQA.Core.Sampling;

/// <summary>
/// A MIL-STD-105E single-sampling master table (II-A normal, II-B tightened, II-C reduced) held as
/// data: code letters down, AQL columns 0.065 % to 6.5 % across, each cell Ac/Re, ↓, ↑ or blank.
/// Columns above 6.5 % are not held (not confirmed from a source). Immutable and thread-safe.
/// </summary>
public sealed class SingleSamplingTable
{
    private static readonly double[] AqlColumns = [0.065, 0.10, 0.15, 0.25, 0.40, 0.65, 1.0, 1.5, 2.5, 4.0, 6.5];

    private readonly int[] _sampleSize;        // by letter; 0 where the letter is not in this table
    private readonly SamplingCell[,] _cells;   // [letter, column]

    private SingleSamplingTable(InspectionSeverity severity, string name, int[] sampleSize, string[] rows)
    {
        Severity = severity;
        Name = name;
        _sampleSize = sampleSize;
        _cells = new SamplingCell[sampleSize.Length, AqlColumns.Length];
        for (int letter = 0; letter < sampleSize.Length; letter++)
        {
            string[] tokens = rows[letter].Split(' ', StringSplitOptions.RemoveEmptyEntries);
            if (tokens.Length != AqlColumns.Length)
            {
                throw new InvalidOperationException(FormattableString.Invariant(
                    $"{name}: row {(CodeLetter)letter} has {tokens.Length} cells, expected {AqlColumns.Length}"));
            }
            for (int column = 0; column < tokens.Length; column++)
            {
                _cells[letter, column] = ParseCell(tokens[column]);
            }
        }
    }

    // Rows A..R; cells for AQL 0.065 0.10 0.15 0.25 0.40 0.65 1.0 1.5 2.5 4.0 6.5 (%).
    // Transcribed from MIL-STD-105E Table II-A (normal inspection, single sampling).
    private static readonly string[] NormalRows =
    [
        /* A    2 */ "↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ 0/1",
        /* B    3 */ "↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ 0/1 ↑",
        /* C    5 */ "↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ 0/1 ↑ ↓",
        /* D    8 */ "↓ ↓ ↓ ↓ ↓ ↓ ↓ 0/1 ↑ ↓ 1/2",
        /* E   13 */ "↓ ↓ ↓ ↓ ↓ ↓ 0/1 ↑ ↓ 1/2 2/3",
        /* F   20 */ "↓ ↓ ↓ ↓ ↓ 0/1 ↑ ↓ 1/2 2/3 3/4",
        /* G   32 */ "↓ ↓ ↓ ↓ 0/1 ↑ ↓ 1/2 2/3 3/4 5/6",
        /* H   50 */ "↓ ↓ ↓ 0/1 ↑ ↓ 1/2 2/3 3/4 5/6 7/8",
        /* J   80 */ "↓ ↓ 0/1 ↑ ↓ 1/2 2/3 3/4 5/6 7/8 10/11",
        /* K  125 */ "↓ 0/1 ↑ ↓ 1/2 2/3 3/4 5/6 7/8 10/11 14/15",
        /* L  200 */ "0/1 ↑ ↓ 1/2 2/3 3/4 5/6 7/8 10/11 14/15 21/22",
        /* M  315 */ "↑ ↓ 1/2 2/3 3/4 5/6 7/8 10/11 14/15 21/22 ↑",
        /* N  500 */ "↓ 1/2 2/3 3/4 5/6 7/8 10/11 14/15 21/22 ↑ ↑",
        /* P  800 */ "1/2 2/3 3/4 5/6 7/8 10/11 14/15 21/22 ↑ ↑ ↑",
        /* Q 1250 */ "2/3 3/4 5/6 7/8 10/11 14/15 21/22 ↑ ↑ ↑ ↑",
        /* R 2000 */ "3/4 5/6 7/8 10/11 14/15 21/22 ↑ ↑ ↑ ↑ ↑",
    ];

    // Transcribed from MIL-STD-105E Table II-B (tightened inspection, single sampling). Row S
    // (n = 3150) has an entry only in columns tighter than 0.065 %, so it is blank here.
    private static readonly string[] TightenedRows =
    [
        /* A    2 */ "↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓",
        /* B    3 */ "↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ 0/1",
        /* C    5 */ "↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ 0/1 ↑",
        /* D    8 */ "↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ 0/1 ↑ ↓",
        /* E   13 */ "↓ ↓ ↓ ↓ ↓ ↓ ↓ 0/1 ↑ ↓ 1/2",
        /* F   20 */ "↓ ↓ ↓ ↓ ↓ ↓ 0/1 ↑ ↓ 1/2 2/3",
        /* G   32 */ "↓ ↓ ↓ ↓ ↓ 0/1 ↑ ↓ 1/2 2/3 3/4",
        /* H   50 */ "↓ ↓ ↓ ↓ 0/1 ↑ ↓ 1/2 2/3 3/4 5/6",
        /* J   80 */ "↓ ↓ ↓ 0/1 ↑ ↓ 1/2 2/3 3/4 5/6 8/9",
        /* K  125 */ "↓ ↓ 0/1 ↑ ↓ 1/2 2/3 3/4 5/6 8/9 12/13",
        /* L  200 */ "↓ 0/1 ↑ ↓ 1/2 2/3 3/4 5/6 8/9 12/13 18/19",
        /* M  315 */ "0/1 ↑ ↓ 1/2 2/3 3/4 5/6 8/9 12/13 18/19 ↑",
        /* N  500 */ "↑ ↓ 1/2 2/3 3/4 5/6 8/9 12/13 18/19 ↑ ↑",
        /* P  800 */ "↓ 1/2 2/3 3/4 5/6 8/9 12/13 18/19 ↑ ↑ ↑",
        /* Q 1250 */ "1/2 2/3 3/4 5/6 8/9 12/13 18/19 ↑ ↑ ↑ ↑",
        /* R 2000 */ "2/3 3/4 5/6 8/9 12/13 18/19 ↑ ↑ ↑ ↑ ↑",
        /* S 3150 */ "- - - - - - - - - - -",
    ];

    // MIL-STD-105E Table II-C (reduced inspection, single sampling). The arrows sit in the same
    // cells as Table II-A, and each II-A plan is replaced by the reduced plan in the same place:
    // 0/1 -> 0/1, 1/2 -> 0/2, 2/3 -> 1/3, 3/4 -> 1/4, 5/6 -> 2/5, 7/8 -> 3/6, 10/11 -> 5/8,
    // 14/15 -> 7/10, 21/22 -> 10/13. The Ac numbers are from the published table; the Re numbers
    // (Re > Ac + 1, the "accept but return to normal" gap) are from memory.
    private static readonly string[] ReducedRows =
    [
        /* A    2 */ "↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ 0/1",
        /* B    2 */ "↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ 0/1 ↑",
        /* C    2 */ "↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ 0/1 ↑ ↓",
        /* D    3 */ "↓ ↓ ↓ ↓ ↓ ↓ ↓ 0/1 ↑ ↓ 0/2",
        /* E    5 */ "↓ ↓ ↓ ↓ ↓ ↓ 0/1 ↑ ↓ 0/2 1/3",
        /* F    8 */ "↓ ↓ ↓ ↓ ↓ 0/1 ↑ ↓ 0/2 1/3 1/4",
        /* G   13 */ "↓ ↓ ↓ ↓ 0/1 ↑ ↓ 0/2 1/3 1/4 2/5",
        /* H   20 */ "↓ ↓ ↓ 0/1 ↑ ↓ 0/2 1/3 1/4 2/5 3/6",
        /* J   32 */ "↓ ↓ 0/1 ↑ ↓ 0/2 1/3 1/4 2/5 3/6 5/8",
        /* K   50 */ "↓ 0/1 ↑ ↓ 0/2 1/3 1/4 2/5 3/6 5/8 7/10",
        /* L   80 */ "0/1 ↑ ↓ 0/2 1/3 1/4 2/5 3/6 5/8 7/10 10/13",
        /* M  125 */ "↑ ↓ 0/2 1/3 1/4 2/5 3/6 5/8 7/10 10/13 ↑",
        /* N  200 */ "↓ 0/2 1/3 1/4 2/5 3/6 5/8 7/10 10/13 ↑ ↑",
        /* P  315 */ "0/2 1/3 1/4 2/5 3/6 5/8 7/10 10/13 ↑ ↑ ↑",
        /* Q  500 */ "1/3 1/4 2/5 3/6 5/8 7/10 10/13 ↑ ↑ ↑ ↑",
        /* R  800 */ "1/4 2/5 3/6 5/8 7/10 10/13 ↑ ↑ ↑ ↑ ↑",
    ];

    private static readonly int[] NormalSampleSizes = [2, 3, 5, 8, 13, 20, 32, 50, 80, 125, 200, 315, 500, 800, 1250, 2000];
    private static readonly int[] TightenedSampleSizes = [2, 3, 5, 8, 13, 20, 32, 50, 80, 125, 200, 315, 500, 800, 1250, 2000, 3150];
    private static readonly int[] ReducedSampleSizes = [2, 2, 2, 3, 5, 8, 13, 20, 32, 50, 80, 125, 200, 315, 500, 800];

    /// <summary>Table II-A: normal inspection, single sampling (letters A to R).</summary>
    public static SingleSamplingTable Normal { get; } =
        new(InspectionSeverity.Normal, "MIL-STD-105E Table II-A (normal, single sampling)", NormalSampleSizes, NormalRows);

    /// <summary>Table II-B: tightened inspection, single sampling (letters A to S; S blank in the columns held).</summary>
    public static SingleSamplingTable Tightened { get; } =
        new(InspectionSeverity.Tightened, "MIL-STD-105E Table II-B (tightened, single sampling)", TightenedSampleSizes, TightenedRows);

    /// <summary>Table II-C: reduced inspection, single sampling, as in MIL-STD-105E (letters A to R).</summary>
    public static SingleSamplingTable Reduced { get; } =
        new(InspectionSeverity.Reduced, "MIL-STD-105E Table II-C (reduced, single sampling)", ReducedSampleSizes, ReducedRows);

    /// <summary>The AQL columns held, percent nonconforming, in increasing order: 0.065 to 6.5.</summary>
    public static IReadOnlyList<double> AqlPercents { get; } = AqlColumns;

    /// <summary>The table for a severity.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not a defined severity.</exception>
    public static SingleSamplingTable For(InspectionSeverity severity) => severity switch
    {
        InspectionSeverity.Normal => Normal,
        InspectionSeverity.Tightened => Tightened,
        InspectionSeverity.Reduced => Reduced,
        _ => throw new ArgumentOutOfRangeException(nameof(severity), severity, "not a defined inspection severity"),
    };

    /// <summary>Severity this table serves.</summary>
    public InspectionSeverity Severity { get; }

    /// <summary>Name of the table, for reports.</summary>
    public string Name { get; }

    /// <summary>The last letter the table has a row for (R, or S for tightened).</summary>
    public CodeLetter LastLetter => (CodeLetter)(_sampleSize.Length - 1);

    /// <summary>True when the table has a row for <paramref name="letter"/>.</summary>
    public bool HasLetter(CodeLetter letter) => (int)letter >= 0 && (int)letter < _sampleSize.Length;

    /// <summary>Sample size n of a letter's row in this table (units).</summary>
    /// <exception cref="ArgumentOutOfRangeException">The table has no row for the letter (S outside tightened).</exception>
    public int SampleSize(CodeLetter letter)
    {
        CheckLetter(letter);
        return _sampleSize[(int)letter];
    }

    /// <summary>The cell at a letter's row and an AQL column, exactly as the table prints it (arrows not followed).</summary>
    /// <param name="letter">Row.</param>
    /// <param name="aqlPercent">AQL in percent nonconforming; must be one of <see cref="AqlPercents"/>.</param>
    /// <exception cref="ArgumentOutOfRangeException">No such row, or the AQL is not a column of the table.</exception>
    public SamplingCell Cell(CodeLetter letter, double aqlPercent)
    {
        CheckLetter(letter);
        return _cells[(int)letter, ColumnOf(aqlPercent)];
    }

    /// <summary>
    /// The plan for a letter and AQL: the cell's Ac/Re, or, at an arrow, the first plan in the
    /// arrow's direction in the same column, with that letter's sample size and its Ac/Re together.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">No such row, or the AQL is not a column of the table.</exception>
    /// <exception cref="InvalidOperationException">The cell is blank, or an arrow runs off the table (never for the tables held; tests check every cell).</exception>
    public TablePlan Resolve(CodeLetter letter, double aqlPercent)
    {
        CheckLetter(letter);
        int column = ColumnOf(aqlPercent);
        int row = (int)letter;
        SamplingCell start = _cells[row, column];
        int step = start.Kind switch
        {
            SamplingCellKind.Plan => 0,
            SamplingCellKind.ArrowDown => 1,
            SamplingCellKind.ArrowUp => -1,
            _ => throw new InvalidOperationException(FormattableString.Invariant(
                $"{Name}: letter {letter} has no plan at AQL {aqlPercent} %")),
        };
        while (_cells[row, column].Kind != SamplingCellKind.Plan)
        {
            row += step;
            bool offTable = row < 0 || row >= _sampleSize.Length;
            if (offTable || _cells[row, column].Kind == SamplingCellKind.Blank
                || _cells[row, column].Kind == (step > 0 ? SamplingCellKind.ArrowUp : SamplingCellKind.ArrowDown))
            {
                throw new InvalidOperationException(FormattableString.Invariant(
                    $"{Name}: the arrow at letter {letter}, AQL {aqlPercent} % leads to no plan"));
            }
        }
        SamplingCell plan = _cells[row, column];
        return new TablePlan(letter, (CodeLetter)row, _sampleSize[row], plan.AcceptanceNumber, plan.RejectionNumber);
    }

    /// <summary>Index of an AQL column; the AQL must match a column to within 1e-9 relative.</summary>
    internal static int ColumnOf(double aqlPercent)
    {
        for (int i = 0; i < AqlColumns.Length; i++)
        {
            if (Math.Abs(aqlPercent - AqlColumns[i]) <= 1e-9 * AqlColumns[i])
            {
                return i;
            }
        }
        throw new ArgumentOutOfRangeException(nameof(aqlPercent), aqlPercent, string.Create(CultureInfo.InvariantCulture,
            $"AQL {aqlPercent} % is not a column of the tables held; use one of {string.Join(", ", AqlColumns.Select(a => a.ToString(CultureInfo.InvariantCulture)))} (percent nonconforming)"));
    }

    private void CheckLetter(CodeLetter letter)
    {
        if (!HasLetter(letter))
        {
            throw new ArgumentOutOfRangeException(nameof(letter), letter, $"{Name} has no row for letter {letter}");
        }
    }

    private static SamplingCell ParseCell(string token)
    {
        switch (token)
        {
            case "↓":
                return SamplingCell.Down;
            case "↑":
                return SamplingCell.Up;
            case "-":
                return SamplingCell.Blank;
            default:
                int slash = token.IndexOf('/', StringComparison.Ordinal);
                return SamplingCell.Of(
                    int.Parse(token.AsSpan(0, slash), NumberStyles.None, CultureInfo.InvariantCulture),
                    int.Parse(token.AsSpan(slash + 1), NumberStyles.None, CultureInfo.InvariantCulture));
        }
    }
}
