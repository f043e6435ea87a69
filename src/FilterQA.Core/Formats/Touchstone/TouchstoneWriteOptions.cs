using FilterQA.Core.Sweeps;
namespace FilterQA.Core.Formats.Touchstone;

/// <summary>Choices for <see cref="TouchstoneWriter"/>. Immutable; the defaults write an exact, unambiguous file.</summary>
public sealed record TouchstoneWriteOptions
{
    /// <summary>The options used when none are given: Hz, RI, no comment lines.</summary>
    public static TouchstoneWriteOptions Default { get; } = new();

    /// <summary>Unit of the frequency column; default <see cref="FrequencyUnit.Hz"/>.</summary>
    /// <remarks>Any unit reads back to the same frequencies in Hz exactly: the writer moves the decimal point in the text
    /// instead of dividing, and the reader scales the decimal exponent instead of multiplying.</remarks>
    public FrequencyUnit FrequencyUnit { get; init; } = FrequencyUnit.Hz;

    /// <summary>Number format of each complex value; default <see cref="TouchstoneDataFormat.RealImaginary"/>, the only exact one.</summary>
    public TouchstoneDataFormat DataFormat { get; init; } = TouchstoneDataFormat.RealImaginary;

    /// <summary>
    /// Lines written as comments (each prefixed with "! ") before the option line; printable ASCII and tab only,
    /// no line breaks. Default none.
    /// </summary>
    public IReadOnlyList<string> Comments { get; init; } = [];
}
