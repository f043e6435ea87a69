using System.Globalization;

namespace FilterQA.Core.Sampling;

/// <summary>
/// Applies a plan to the defectives counted in a lot's sample. Early rejection (curtailment once
/// defectives reach Re) is allowed by default, as common practice allows; early acceptance is never
/// given, since single sampling decides acceptance only on the complete sample.
/// </summary>
public static class LotDisposition
{
    /// <summary>The decision for a sample of which <paramref name="unitsInspected"/> units have been inspected.</summary>
    /// <param name="plan">The plan in force.</param>
    /// <param name="unitsInspected">Units of the sample inspected so far, 0..n.</param>
    /// <param name="defectives">Defective units among them, 0..unitsInspected.</param>
    /// <param name="allowEarlyRejection">When true (default) reaching Re before the sample is complete gives <see cref="LotDecision.RejectDecided"/>; when false it stays <see cref="LotDecision.Pending"/> until the sample is complete.</param>
    /// <exception cref="ArgumentNullException">No plan.</exception>
    /// <exception cref="ArgumentOutOfRangeException">Counts negative, more units than the sample, or more defectives than units.</exception>
    public static LotDecision Decide(SamplingPlan plan, int unitsInspected, int defectives, bool allowEarlyRejection = true)
    {
        ArgumentNullException.ThrowIfNull(plan);
        if (unitsInspected < 0 || unitsInspected > plan.SampleSize)
        {
            throw new ArgumentOutOfRangeException(nameof(unitsInspected), unitsInspected,
                string.Create(CultureInfo.InvariantCulture, $"units inspected must be between 0 and the sample size {plan.SampleSize}"));
        }
        if (defectives < 0 || defectives > unitsInspected)
        {
            throw new ArgumentOutOfRangeException(nameof(defectives), defectives,
                string.Create(CultureInfo.InvariantCulture, $"defectives must be between 0 and the units inspected ({unitsInspected})"));
        }
        bool complete = unitsInspected == plan.SampleSize;
        if (defectives >= plan.RejectionNumber)
        {
            return complete ? LotDecision.Reject : allowEarlyRejection ? LotDecision.RejectDecided : LotDecision.Pending;
        }
        if (!complete)
        {
            return LotDecision.Pending;
        }
        return defectives <= plan.AcceptanceNumber ? LotDecision.Accept : LotDecision.AcceptReturnToNormal;
    }

    /// <summary>The decision for a complete sample (all n units inspected).</summary>
    /// <exception cref="ArgumentOutOfRangeException">Defectives negative or above n.</exception>
    public static LotDecision DecideComplete(SamplingPlan plan, int defectives)
    {
        ArgumentNullException.ThrowIfNull(plan);
        return Decide(plan, plan.SampleSize, defectives);
    }
}
