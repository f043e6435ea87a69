using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Formats.Delimited;

/// <summary>
/// How <see cref="DelimitedTextReader"/> reads a file. Every setting is optional: null means "find it
/// in the file". Immutable; an invalid setting cannot be made.
/// </summary>
public sealed record DelimitedTextOptions
{
    private readonly char? _delimiter;
    private readonly FrequencyUnit? _unit;
    private readonly ScalarQuantity? _quantity;

    /// <summary>Options that detect everything from the file.</summary>
    public static DelimitedTextOptions Detect { get; } = new();

    /// <summary>
    /// The cell delimiter: ',', '\t' or ';'. Null (default) detects it from the first row that is not a
    /// comment: a tab if it has one, else a semicolon if it has one, else a comma (quoted text ignored).
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">Any other character.</exception>
    public char? Delimiter
    {
        get => _delimiter;
        init => _delimiter = value is null or ',' or '\t' or ';'
            ? value
            : throw new ArgumentOutOfRangeException(nameof(Delimiter), value, "the delimiter must be ',', tab or ';'");
    }

    /// <summary>
    /// Unit of the frequency column. Null (default) takes it from the header ("Frequency (MHz)",
    /// "Freq [kHz]", "f/GHz", "frequency_hz"), or hertz when the header names none or there is no header.
    /// When set and the header names a different unit, the file is refused rather than read 1000× wrong.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">A value that is not a defined unit.</exception>
    public FrequencyUnit? Unit
    {
        get => _unit;
        init => _unit = value is null || Enum.IsDefined(value.Value)
            ? value
            : throw new ArgumentOutOfRangeException(nameof(Unit), value, "not a frequency unit");
    }

    /// <summary>
    /// What the level column holds. Null (default) takes it from the header ("dBm" → power, "dB" →
    /// gain), or a gain in dB when the header says neither or there is no header. When set and the
    /// header says the other one, the file is refused.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">A value that is not a defined quantity.</exception>
    public ScalarQuantity? Quantity
    {
        get => _quantity;
        init => _quantity = value is null || Enum.IsDefined(value.Value)
            ? value
            : throw new ArgumentOutOfRangeException(nameof(Quantity), value, "not a scalar quantity");
    }

    /// <summary>
    /// Columns to use, 1-based. Null (default) picks them from the header words, or by position
    /// (frequency, level, optional phase) when the file has no header.
    /// </summary>
    public DelimitedColumns? Columns { get; init; }
}
