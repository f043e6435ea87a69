namespace FilterQA.Web.Ui.Services;

/// <summary>How a form field of the template editor is entered.</summary>
public enum FieldType
{
    /// <summary>Free text (a description, a title, a rule id).</summary>
    Text,

    /// <summary>A whole number.</summary>
    Integer,

    /// <summary>One word from a fixed list (a frequency anchor, a decision rule).</summary>
    Word,

    /// <summary>Yes or no.</summary>
    Flag,

    /// <summary>A number with a unit picked from the field's list (kHz, MHz, dB, ns, ohm, pF, ppm).</summary>
    Quantity,
}
