using FilterQA.Core.Decisions;
using Microsoft.AspNetCore.Components;

namespace FilterQA.Web.Ui.Components;

/// <summary>
/// Shows a unit's verdict large: go (a tick in a circle), no-go (a cross in an octagon) or not verifiable
/// (an exclamation mark in a triangle, never the go shape or words), with each blocking rule's message.
/// </summary>
public partial class VerdictPanel
{
    /// <summary>The unit's evaluation (required).</summary>
    [Parameter, EditorRequired]
    public UnitEvaluation Evaluation { get; set; } = null!;

    /// <summary>The unit's serial, shown under the verdict; none by default.</summary>
    [Parameter]
    public string? Serial { get; set; }

    private IReadOnlyList<RuleResult> Blocking { get; set; } = [];

    private string CssClass => Evaluation.Verdict switch
    {
        UnitVerdict.Go => "verdict-go",
        UnitVerdict.NoGo => "verdict-nogo",
        _ => "verdict-unverified",
    };

    private string DataVerdict => Evaluation.Verdict switch
    {
        UnitVerdict.Go => "go",
        UnitVerdict.NoGo => "no-go",
        _ => "not-verifiable",
    };

    private string Shape => Evaluation.Verdict switch
    {
        UnitVerdict.Go => "circle-tick",
        UnitVerdict.NoGo => "octagon-cross",
        _ => "triangle-exclamation",
    };

    private string Meaning => Evaluation.Verdict switch
    {
        UnitVerdict.Go => "Every rule passes. The unit is good.",
        UnitVerdict.NoGo => "At least one rule fails. The unit is defective.",
        _ => "The sweep cannot show every limit. The unit is not passed; it counts as defective until measured properly.",
    };

    protected override void OnParametersSet()
    {
        ArgumentNullException.ThrowIfNull(Evaluation);
        Blocking = Evaluation.BlockingRules.ToArray();
    }
}
