using System.Globalization;

namespace FilterQA.Core.Resonators;

/// <summary>
/// A response of the part other than the main mode (spurious, anharmonic or overtone resonance).
/// </summary>
/// <param name="Hz">Frequency of the mode's extremum, Hz (parabola-refined between points).</param>
/// <param name="RelativeDb">
/// Level relative to the main mode, dB. Transmission fixtures (series): the mode's |S21| peak level
/// minus the main peak level, negative when the mode is weaker. Dip fixtures (one-port |S11|, shunt |S21|):
/// the main dip level minus the mode's dip level (20·log10 of |S| at each), so again negative when the
/// mode's dip is shallower than the main one.
/// </param>
public sealed record UnwantedMode(double Hz, double RelativeDb)
{
    /// <summary>Frequency, Hz; finite and non-negative.</summary>
    public double Hz { get; } = double.IsFinite(Hz) && Hz >= 0 ? Hz
        : throw new ArgumentOutOfRangeException(nameof(Hz), Hz, "a mode frequency must be finite and non-negative");

    /// <summary>Level relative to the main mode, dB; finite; negative when weaker than the main mode.</summary>
    public double RelativeDb { get; } = double.IsFinite(RelativeDb) ? RelativeDb
        : throw new ArgumentOutOfRangeException(nameof(RelativeDb), RelativeDb, "a mode level must be finite");

    /// <inheritdoc />
    public override string ToString() => string.Create(CultureInfo.InvariantCulture, $"{Hz:F1} Hz, {RelativeDb:F2} dB");
}
