namespace FilterQA.Web.Ui.Services;

/// <summary>One field of the template editor's form: its key in the template text, its label, how it is entered.</summary>
/// <param name="Key">The field's key in the template text (e.g. "minimum").</param>
/// <param name="Label">Plain words for the form, saying for a dB figure whether it is a loss or a rejection.</param>
/// <param name="Type">How it is entered.</param>
/// <param name="Units">For a quantity: the units it may be entered in; empty otherwise.</param>
/// <param name="Choices">For a word: the words allowed, as the text writes them; empty otherwise.</param>
/// <param name="Sign">Which numbers it accepts.</param>
/// <param name="Optional">True when it may be left empty (then it is left out of the text).</param>
public sealed record FieldSpec(string Key, string Label, FieldType Type, IReadOnlyList<(string Symbol, decimal Factor)> Units,
    IReadOnlyList<string> Choices, FieldSign Sign = FieldSign.Any, bool Optional = false);
