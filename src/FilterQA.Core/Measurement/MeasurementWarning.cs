namespace FilterQA.Core.Measurement;

/// <summary>
/// Something a measurement noticed that the user should know: a value that could not be measured,
/// a sweep that is too coarse for the feature, a floor that was estimated.
/// </summary>
/// <param name="Code">Stable machine code, one of <see cref="MeasurementWarningCodes"/>; never changes wording.</param>
/// <param name="Message">Human explanation with the numbers that broke the rule (invariant culture).</param>
public sealed record MeasurementWarning(string Code, string Message);
