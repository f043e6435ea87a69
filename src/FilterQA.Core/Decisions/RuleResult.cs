using FilterQA.Core.Templates;

namespace FilterQA.Core.Decisions;

/// <summary>
/// The result of one rule for one unit. A rule with two sides (a minimum and a maximum bandwidth, a
/// ± tolerance) reports the side with the smaller margin.
/// </summary>
/// <param name="RuleId">The rule's id in its template.</param>
/// <param name="Kind">The rule kind.</param>
/// <param name="Title">The rule's plain-words title.</param>
/// <param name="Unit">Unit of <paramref name="MeasuredValue"/>, <paramref name="LimitValue"/>, <paramref name="Margin"/> and <paramref name="GuardBand"/>.</param>
/// <param name="MeasuredValue">What was measured; null when it could not be measured.</param>
/// <param name="LimitValue">The tolerance limit on the deciding side; null when the rule could not be resolved.</param>
/// <param name="Sense">Whether the limit is a maximum or a minimum.</param>
/// <param name="Margin">Signed distance from the measured value to the tolerance limit: positive inside, negative outside; null when not measured or not verifiable.</param>
/// <param name="GuardBand">The guard band w of the non-binary statement: the rule's uncertainty U (ILAC-G8:09/2019 4.2.3). Under simple acceptance a conditional pass still passes (see <see cref="UnitEvaluation.Passes"/>); under guarded acceptance TL − w is the acceptance limit.</param>
/// <param name="Outcome">Pass, conditional pass, conditional fail, fail or not verifiable.</param>
/// <param name="IsLowerBound">True when the measured value is only a lower bound ("at least"), e.g. a rejection limited by the noise floor.</param>
/// <param name="AtHz">Frequency where the deciding value was found, Hz; null when not at one frequency.</param>
/// <param name="Message">Plain words for the operator, e.g. "rejection 31.2 dB at 455.100 MHz, limit 35 dB".</param>
public sealed record RuleResult(
    string RuleId,
    RuleKind Kind,
    string Title,
    RuleUnit Unit,
    double? MeasuredValue,
    double? LimitValue,
    LimitSense Sense,
    double? Margin,
    double GuardBand,
    RuleOutcome Outcome,
    bool IsLowerBound,
    double? AtHz,
    string Message);
