using System.Globalization;
using FilterQA.Data.Services;

namespace FilterQA.Web.Ui.Services;

/// <summary>
/// The station's latest thru against the lot template's maximum age, shown on the bench before testing.
/// The intake makes the binding check when a sweep arrives; this only warns early.
/// </summary>
/// <param name="Station">The station.</param>
/// <param name="Thru">Its latest thru; null when it has none.</param>
/// <param name="AgeS">Age of the thru now, s; null without a thru.</param>
/// <param name="MaximumAgeS">What the template allows, s.</param>
public sealed record ThruStatus(string Station, ThruInfo? Thru, double? AgeS, double MaximumAgeS)
{
    /// <summary>True when a thru exists and is not older than the template allows.</summary>
    public bool IsCurrent => AgeS is { } age && age <= MaximumAgeS;

    /// <summary>Plain words for the bench.</summary>
    public string Describe() => Thru is null || AgeS is not { } age
        ? $"Station {Station} has no thru on record. Power-trace sweeps will be refused until one is recorded."
        : IsCurrent
            ? string.Create(CultureInfo.InvariantCulture, $"Thru of {Station} recorded {age / 3600:0.0} h ago (this part allows {MaximumAgeS / 3600:0.0} h).")
            : string.Create(CultureInfo.InvariantCulture,
                $"Thru of {Station} is {age / 3600:0.0} h old; this part allows {MaximumAgeS / 3600:0.0} h. Record a new thru before testing.");
}
