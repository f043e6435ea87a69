using System.Globalization;

namespace FilterQA.Core.Formats.Delimited;

/// <summary>
/// Columns picked by the caller instead of by header words, numbered from 1 (the first cell of a row is column 1).
/// Immutable; validated when made.
/// </summary>
public sealed record DelimitedColumns
{
    /// <summary>Picks the columns.</summary>
    /// <param name="frequencyColumn">Column of the frequency, 1-based.</param>
    /// <param name="levelColumn">Column of the level (gain in dB or power in dBm), 1-based.</param>
    /// <param name="phaseColumn">Column of the phase in degrees, 1-based, or null for none.</param>
    /// <exception cref="ArgumentOutOfRangeException">A column below 1, or two columns the same.</exception>
    public DelimitedColumns(int frequencyColumn, int levelColumn, int? phaseColumn = null)
    {
        Check(frequencyColumn, nameof(frequencyColumn));
        Check(levelColumn, nameof(levelColumn));
        if (phaseColumn is { } phase)
        {
            Check(phase, nameof(phaseColumn));
        }
        if (frequencyColumn == levelColumn || frequencyColumn == phaseColumn || levelColumn == phaseColumn)
        {
            throw new ArgumentOutOfRangeException(nameof(levelColumn), string.Create(CultureInfo.InvariantCulture,
                $"frequency, level and phase need different columns; got {frequencyColumn}, {levelColumn} and {phaseColumn?.ToString(CultureInfo.InvariantCulture) ?? "none"}"));
        }
        FrequencyColumn = frequencyColumn;
        LevelColumn = levelColumn;
        PhaseColumn = phaseColumn;
    }

    /// <summary>Column of the frequency, 1-based.</summary>
    public int FrequencyColumn { get; }

    /// <summary>Column of the level, 1-based.</summary>
    public int LevelColumn { get; }

    /// <summary>Column of the phase in degrees, 1-based; null when the trace has no phase.</summary>
    public int? PhaseColumn { get; }

    /// <summary>The highest column picked, 1-based.</summary>
    public int HighestColumn => Math.Max(Math.Max(FrequencyColumn, LevelColumn), PhaseColumn ?? 0);

    private static void Check(int column, string name)
    {
        if (column < 1)
        {
            throw new ArgumentOutOfRangeException(name, column, "columns are numbered from 1");
        }
    }
}
