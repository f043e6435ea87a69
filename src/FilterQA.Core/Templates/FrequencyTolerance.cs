namespace FilterQA.Core.Templates;

/// <summary>A symmetric tolerance ± <see cref="Value"/> on a frequency, in hertz or in ppm of the nominal. Immutable.</summary>
public sealed record FrequencyTolerance
{
    /// <summary>Makes the tolerance.</summary>
    /// <param name="value">Half-width of the allowed range, in <paramref name="unit"/>; finite and above zero.</param>
    /// <param name="unit">Hertz or parts per million.</param>
    /// <exception cref="ArgumentException">Not finite, not above zero, or the unit is undefined.</exception>
    public FrequencyTolerance(double value, ToleranceUnit unit)
    {
        Value = Checks.Positive(value, "a frequency tolerance");
        Unit = Checks.Defined(unit, "the tolerance unit");
    }

    /// <summary>Half-width of the allowed range, in <see cref="Unit"/> (above zero).</summary>
    public double Value { get; }

    /// <summary>Hertz or parts per million.</summary>
    public ToleranceUnit Unit { get; }

    /// <summary>The rule unit that matches this tolerance (its uncertainty is stated in it).</summary>
    public RuleUnit RuleUnit => Unit == ToleranceUnit.Hertz ? RuleUnit.Hertz : RuleUnit.PartsPerMillion;

    /// <summary>Half-width in hertz: the value itself, or value·10⁻⁶·<paramref name="nominalHz"/> for ppm.</summary>
    /// <param name="nominalHz">Nominal frequency, Hz, the ppm refer to.</param>
    public double ToHz(double nominalHz) => Unit == ToleranceUnit.Hertz ? Value : Value * 1e-6 * nominalHz;

    /// <summary>Any value in this tolerance's unit converted to hertz (for an uncertainty stated in the same unit).</summary>
    /// <param name="valueInUnit">A value in <see cref="Unit"/>.</param>
    /// <param name="nominalHz">Nominal frequency, Hz, the ppm refer to.</param>
    public double ValueToHz(double valueInUnit, double nominalHz) =>
        Unit == ToleranceUnit.Hertz ? valueInUnit : valueInUnit * 1e-6 * nominalHz;
}
