namespace FilterQA.Core.Templates.Differences;

/// <summary>
/// One field that differs between two revisions, with both values as the template text writes them (quantities with
/// their unit, e.g. "6 dB", "455 kHz", "8 h"; words for choices, e.g. "guarded-acceptance").
/// </summary>
/// <param name="Field">The field's key in the template text, e.g. "maximum", "uncertainty", "sweep.max-thru-age",
/// or "guard band" for the guard band the decision rule gives a rule.</param>
/// <param name="OldValue">The value in the earlier revision; null when the field is not there (added field).</param>
/// <param name="NewValue">The value in the later revision; null when the field is not there (removed field).</param>
public sealed record FieldChange(string Field, string? OldValue, string? NewValue);
