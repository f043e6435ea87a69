using FilterQA.Core.Decisions;
using FilterQA.Web.Ui.Charts;

namespace FilterQA.Web.Ui.Services;

/// <summary>One previewed unit judged against the draft: the evaluation (each rule's value, margin, outcome) and its chart.</summary>
/// <param name="Sample">The unit.</param>
/// <param name="Evaluation">The draft's verdict and rule results.</param>
/// <param name="Chart">The measured response against the draft's limit lines.</param>
public sealed record PreviewOutcome(PreviewSample Sample, UnitEvaluation Evaluation, ChartModel Chart);
