namespace FilterQA.Core.Sampling;

/// <summary>A change of severity (or discontinuation) caused by one lot of the history.</summary>
/// <param name="LotIndex">0-based index of the lot whose result caused the change; the new severity applies from the next lot.</param>
/// <param name="From">Severity before.</param>
/// <param name="To">Severity after (equal to <paramref name="From"/> for a discontinuation).</param>
/// <param name="Discontinues">True when sampling inspection is discontinued.</param>
/// <param name="Reason">Plain-language reason naming the rule.</param>
public sealed record SwitchingEvent(int LotIndex, InspectionSeverity From, InspectionSeverity To, bool Discontinues, string Reason);
