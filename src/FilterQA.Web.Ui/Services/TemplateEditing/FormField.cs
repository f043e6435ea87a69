using System.Globalization;
using System.Text.RegularExpressions;

namespace FilterQA.Web.Ui.Services;

/// <summary>
/// One field of the editor's form as the engineer types it: a number and a unit for a quantity, else a value. It is
/// checked as typed (a number in the field's unit and sign); the reader's problems at its line are added to it.
/// </summary>
public sealed partial class FormField(FieldSpec spec)
{
    /// <summary>What the field is.</summary>
    public FieldSpec Spec { get; } = spec;

    /// <summary>The value: for a quantity its number as typed (point as decimal separator), else the text, word, integer or "true"/"false".</summary>
    public string Value { get; set; } = "";

    /// <summary>For a quantity: the unit picked from <see cref="FieldSpec.Units"/>.</summary>
    public string Unit { get; set; } = spec.Units.Count > 0 ? spec.Units[0].Symbol : "";

    /// <summary>Problems of this field: the as-typed check's, then the reader's at its line.</summary>
    public List<string> Problems { get; } = [];

    /// <summary>A unique id for the form's label and input.</summary>
    public string InputId { get; } = "f-" + Guid.NewGuid().ToString("N")[..10];

    /// <summary>True when nothing is entered.</summary>
    public bool IsEmpty => string.IsNullOrWhiteSpace(Value);

    /// <summary>
    /// For a quantity: the value in the SI unit used inside (Hz, dB, s, ohm, F; a tolerance in ppm stays in ppm), the
    /// number scaled exactly in decimal and converted once; null when empty or not a valid number in a known unit.
    /// </summary>
    public double? SiValue
    {
        get
        {
            if (Spec.Type != FieldType.Quantity || !TryNumber(out decimal number))
            {
                return null;
            }
            foreach ((string symbol, decimal factor) in Spec.Units)
            {
                if (symbol == Unit)
                {
                    return double.Parse((number * factor).ToString(CultureInfo.InvariantCulture), NumberStyles.Float, CultureInfo.InvariantCulture);
                }
            }
            return null;
        }
    }

    /// <summary>The SI value with its unit for display beside the field, e.g. "= 455000 Hz"; empty when there is none.</summary>
    public string SiText => SiValue is { } si && Unit != FieldUnits.SiSymbol(Spec.Units) && Unit != "ppm"
        ? "= " + si.ToString("R", CultureInfo.InvariantCulture) + " " + FieldUnits.SiSymbol(Spec.Units)
        : "";

    /// <summary>The value as the template text writes it ("455 kHz", "true", a word); null when empty.</summary>
    public string? TextValue => IsEmpty ? null
        : Spec.Type == FieldType.Quantity ? (Unit.Length == 0 ? Value.Trim() : Value.Trim() + " " + Unit)
        : Value.Trim();

    /// <summary>Checks the value as typed; replaces <see cref="Problems"/> with what it finds.</summary>
    public void Check()
    {
        Problems.Clear();
        if (IsEmpty)
        {
            if (!Spec.Optional)
            {
                Problems.Add($"{Spec.Label} is needed.");
            }
            return;
        }
        switch (Spec.Type)
        {
            case FieldType.Quantity:
                if (!TryNumber(out decimal number))
                {
                    Problems.Add(Value.Contains(',', StringComparison.Ordinal)
                        ? $"'{Value}' is not a number: write the decimal separator as a point and no thousands separators."
                        : $"'{Value}' is not a number.");
                }
                else if (!Spec.Units.Any(u => u.Symbol == Unit))
                {
                    Problems.Add($"'{Unit}' is not a unit of this field; pick one of {string.Join(", ", Spec.Units.Select(u => u.Symbol))}.");
                }
                else
                {
                    CheckSign(number);
                }
                break;
            case FieldType.Integer:
                if (!int.TryParse(Value.Trim(), NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out int whole))
                {
                    Problems.Add($"'{Value}' is not a whole number.");
                }
                else
                {
                    CheckSign(whole);
                }
                break;
            case FieldType.Word or FieldType.Flag:
                if (!Spec.Choices.Contains(Value.Trim()))
                {
                    Problems.Add($"'{Value}' is not one of {string.Join(", ", Spec.Choices)}.");
                }
                break;
        }
    }

    /// <summary>Sets the field from a value of the template text ("455 kHz" is split into number and unit).</summary>
    public void SetFromText(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (Spec.Type != FieldType.Quantity)
        {
            Value = text;
            return;
        }
        Match match = QuantityPattern().Match(text);
        if (match.Success && (match.Groups["unit"].Value.Length == 0 ? Spec.Units.Any(u => u.Symbol.Length == 0) : Spec.Units.Any(u => u.Symbol == match.Groups["unit"].Value)))
        {
            Value = match.Groups["number"].Value;
            Unit = match.Groups["unit"].Value;
        }
        else
        {
            Value = text;
        }
    }

    private bool TryNumber(out decimal number)
    {
        number = 0;
        string text = Value.Trim();
        return NumberPattern().IsMatch(text) && decimal.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out number);
    }

    private void CheckSign(decimal number)
    {
        if (Spec.Sign == FieldSign.Positive && number <= 0)
        {
            Problems.Add($"{Spec.Label} must be more than zero.");
        }
        else if (Spec.Sign == FieldSign.NonNegative && number < 0)
        {
            Problems.Add($"{Spec.Label} cannot be negative.");
        }
    }

    // The number syntax the template text accepts: optional sign, digits with an optional point, optional exponent.
    [GeneratedRegex(@"^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$", RegexOptions.CultureInvariant)]
    private static partial Regex NumberPattern();

    [GeneratedRegex(@"^\s*(?<number>[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*(?<unit>\S*)\s*$", RegexOptions.CultureInvariant)]
    private static partial Regex QuantityPattern();
}
