using FilterQA.Core.Sampling;

namespace FilterQA.Data.Services;

/// <summary>
/// How a new lot is to be sampled. For MIL-STD-105E, a null severity means "from the switching
/// history of this part and supplier" (<see cref="SwitchingRules"/>).
/// </summary>
public sealed record PlanRequest
{
    private PlanRequest(SamplingPlanKind kind) => Kind = kind;

    public SamplingPlanKind Kind { get; }

    public InspectionLevel? Level { get; private init; }

    public double? AqlPercent { get; private init; }

    public InspectionSeverity? Severity { get; private init; }

    public SwitchingOptions? Switching { get; private init; }

    public double? LtpdFraction { get; private init; }

    public double? Confidence { get; private init; }

    public int AcceptanceNumber { get; private init; }

    /// <summary>MIL-STD-105E single sampling at <paramref name="level"/> and <paramref name="aqlPercent"/>.</summary>
    public static PlanRequest Mil105E(InspectionLevel level, double aqlPercent, InspectionSeverity? severity = null, SwitchingOptions? switching = null) =>
        new(SamplingPlanKind.Mil105ESingle) { Level = level, AqlPercent = aqlPercent, Severity = severity, Switching = switching };

    /// <summary>A c = 0 plan whose sample size rejects a lot at <paramref name="ltpdFraction"/> with <paramref name="confidence"/>.</summary>
    public static PlanRequest ZeroAcceptance(double ltpdFraction, double confidence) =>
        new(SamplingPlanKind.ZeroAcceptance) { LtpdFraction = ltpdFraction, Confidence = confidence };

    /// <summary>Every unit of the lot is tested; the lot is accepted with at most <paramref name="acceptanceNumber"/> defectives.</summary>
    public static PlanRequest FullInspection(int acceptanceNumber = 0) =>
        new(SamplingPlanKind.FullInspection) { AcceptanceNumber = acceptanceNumber };
}
