using FilterQA.Core.Templates;

namespace FilterQA.Data.Services;

/// <summary>One part as the template list shows it.</summary>
/// <param name="PartNumber">The part number.</param>
/// <param name="Description">The part's description as first registered.</param>
/// <param name="Device">The device kind its templates are for.</param>
/// <param name="LatestReleased">The highest released (not withdrawn) revision; null when none.</param>
/// <param name="LatestDraft">The highest draft revision; null when none.</param>
/// <param name="Revisions">How many revisions are stored, whatever their status.</param>
public sealed record PartTemplateSummary(string PartNumber, string Description, DeviceKind Device, int? LatestReleased, int? LatestDraft, int Revisions);
