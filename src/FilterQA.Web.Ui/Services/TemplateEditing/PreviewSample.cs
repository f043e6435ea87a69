using FilterQA.Core.Decisions;

namespace FilterQA.Web.Ui.Services;

/// <summary>A unit the preview judges: a stored measurement (with its id) or an uploaded sweep file.</summary>
/// <param name="Label">What the screen calls it, e.g. "VP-2611-0042 / S0007 (attempt 1)".</param>
/// <param name="MeasurementId">The stored measurement's id; null for an uploaded file.</param>
/// <param name="Input">The evaluation input.</param>
/// <param name="FromOriginalFile">True when a stored measurement was read from its original file (not its compact trace).</param>
public sealed record PreviewSample(string Label, long? MeasurementId, MeasurementInput Input, bool FromOriginalFile);
