namespace FilterQA.Core.Decisions;

/// <summary>
/// The non-binary decision statement of ILAC-G8:09/2019 clause 4.2.3 for one measured value against a tolerance
/// limit TL with guard band w: pass inside TL − w, conditional pass from TL − w to TL, conditional fail from TL to
/// TL + w, fail beyond TL + w.
/// </summary>
public static class NonBinaryStatement
{
    /// <summary>Classifies a signed margin.</summary>
    /// <param name="margin">Distance from the value to TL in the rule's unit: positive inside the limit, negative outside; finite.</param>
    /// <param name="guardBand">w, zero or more, same unit. A value exactly at TL − w passes (the acceptance limit is
    /// inclusive, as "at most 3.75 dB" is); exactly at TL is a conditional pass (a pass when w = 0).</param>
    /// <returns><see cref="RuleOutcome.Pass"/> when margin ≥ w; <see cref="RuleOutcome.ConditionalPass"/> when 0 ≤ margin &lt; w;
    /// <see cref="RuleOutcome.ConditionalFail"/> when −w ≤ margin &lt; 0; <see cref="RuleOutcome.Fail"/> below −w.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The margin is not finite, or w is negative or not finite.</exception>
    public static RuleOutcome Classify(double margin, double guardBand)
    {
        if (!double.IsFinite(margin))
        {
            throw new ArgumentOutOfRangeException(nameof(margin), margin, "a margin must be finite; a value that cannot be measured is not verifiable");
        }
        if (!double.IsFinite(guardBand) || guardBand < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(guardBand), guardBand, "a guard band must be finite and zero or more");
        }
        return margin >= guardBand ? RuleOutcome.Pass
            : margin >= 0 ? RuleOutcome.ConditionalPass
            : margin >= -guardBand ? RuleOutcome.ConditionalFail
            : RuleOutcome.Fail;
    }
}
