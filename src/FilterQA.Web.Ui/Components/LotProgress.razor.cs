using System.Globalization;
using FilterQA.Data.Services;
using FilterQA.Web.Ui.Services;
using Microsoft.AspNetCore.Components;

namespace FilterQA.Web.Ui.Components;

/// <summary>
/// A lot's progress against its plan: sample size n, units tested, Ac and Re, defectives so far, and
/// its state: testing, rejection number reached, or sample complete.
/// </summary>
public partial class LotProgress
{
    /// <summary>The lot's summary (required).</summary>
    [Parameter, EditorRequired]
    public LotSummary Summary { get; set; } = null!;

    private string State =>
        Summary.Defectives >= Summary.Plan.RejectionNumber ? "reject-reached"
        : Summary.UnitsTested >= Summary.Plan.SampleSize ? "sample-complete"
        : "testing";

    private string StateText => State switch
    {
        "reject-reached" => string.Create(CultureInfo.InvariantCulture,
            $"Rejection number reached: {Summary.Defectives} defective. The plan rejects this lot; an approver decides."),
        "sample-complete" => string.Create(CultureInfo.InvariantCulture,
            $"Sample complete: the plan says {Words.Decision(Summary.Decision)}. An approver decides the lot."),
        _ => string.Create(CultureInfo.InvariantCulture,
            $"{Summary.Plan.SampleSize - Summary.UnitsTested} more to test."),
    };

    private string PlanText
    {
        get
        {
            var plan = Summary.Plan;
            string detail = plan.Level is { } level && plan.AqlPercent is { } aql
                ? string.Create(CultureInfo.InvariantCulture, $", level {level}, AQL {aql:0.###} %, {plan.Severity?.ToString().ToLowerInvariant()} inspection")
                : plan.LtpdFraction is { } ltpd && plan.Confidence is { } confidence
                    ? string.Create(CultureInfo.InvariantCulture, $", LTPD {ltpd * 100:0.##} % at {confidence * 100:0.#} % confidence")
                    : "";
            string full = plan.IsFullInspection && plan.Kind != FilterQA.Core.Sampling.SamplingPlanKind.FullInspection ? " (the sample reaches the lot size: every unit is tested)" : "";
            return string.Create(CultureInfo.InvariantCulture, $"{plan.StandardName}{detail}; lot of {plan.LotSize}{full}.");
        }
    }

    protected override void OnParametersSet() => ArgumentNullException.ThrowIfNull(Summary);
}
