namespace FilterQA.Core.Resonators;

/// <summary>Something a resonator measurement found questionable: a stable code and a message with the numbers.</summary>
/// <param name="Code">What kind of problem; stable across versions.</param>
/// <param name="Message">Plain-language explanation with the values involved (invariant culture).</param>
public sealed record ResonatorWarning(ResonatorWarningCode Code, string Message);
