using System.Globalization;

namespace FilterQA.Core.Sampling;

/// <summary>
/// Chooses single sampling plans: from the MIL-STD-105E tables, zero-acceptance plans for a stated
/// LTPD, or 100 % inspection.
/// </summary>
public static class SamplingPlanner
{
    /// <summary>Standard name written on table plans.</summary>
    public const string Mil105EName = "MIL-STD-105E single sampling";

    /// <summary>Name written on zero-acceptance plans.</summary>
    public const string ZeroAcceptanceName = "zero-acceptance (c = 0) plan";

    /// <summary>Name written on chosen 100 % inspection.</summary>
    public const string FullInspectionName = "100 % inspection";

    /// <summary>
    /// The MIL-STD-105E single sampling plan: Table I gives the letter, Table II-A/B/C (by
    /// severity) gives n and Ac/Re, following arrows to the plan they point at; if n is at least
    /// the lot size the plan says 100 % inspection.
    /// </summary>
    /// <param name="lotSize">Units in the lot, at least 2.</param>
    /// <param name="level">Inspection level (II is the usual default).</param>
    /// <param name="severity">Normal, tightened or reduced (from <see cref="SwitchingRules"/>).</param>
    /// <param name="aqlPercent">AQL, percent nonconforming; one of <see cref="SingleSamplingTable.AqlPercents"/>.</param>
    /// <exception cref="ArgumentOutOfRangeException">Lot size below 2, undefined level or severity, or an AQL that is not a column held.</exception>
    public static SamplingPlan Mil105E(int lotSize, InspectionLevel level, InspectionSeverity severity, double aqlPercent)
    {
        CodeLetter letter = SampleSizeCodeLetters.For(lotSize, level);
        TablePlan plan = SingleSamplingTable.For(severity).Resolve(letter, aqlPercent);
        return new SamplingPlan(SamplingPlanKind.Mil105ESingle, Mil105EName, lotSize, plan.SampleSize, plan.AcceptanceNumber, plan.RejectionNumber)
        {
            Level = level,
            Severity = severity,
            AqlPercent = SingleSamplingTable.AqlPercents[SingleSamplingTable.ColumnOf(aqlPercent)],
            TableLetter = plan.TableLetter,
            LetterUsed = plan.LetterUsed,
        };
    }

    /// <summary>
    /// Sample size of a zero-acceptance plan: the smallest n with (1 − p1)^n ≤ β = 1 − confidence,
    /// n = ⌈ln β / ln(1 − p1)⌉ (binomial, so for lots much larger than n).
    /// </summary>
    /// <param name="ltpdFraction">p1, the fraction defective to be rejected with the stated confidence; 0 &lt; p1 &lt; 1 (0.01 = 1 %).</param>
    /// <param name="confidence">1 − β, 0 &lt; confidence &lt; 1 (0.90 = 90 %).</param>
    /// <exception cref="ArgumentOutOfRangeException">A value outside its open interval, or NaN.</exception>
    public static int ZeroAcceptanceSampleSize(double ltpdFraction, double confidence)
    {
        if (!(ltpdFraction > 0 && ltpdFraction < 1))
        {
            throw new ArgumentOutOfRangeException(nameof(ltpdFraction), ltpdFraction, "LTPD must be a fraction strictly between 0 and 1 (0.01 = 1 %)");
        }
        if (!(confidence > 0 && confidence < 1))
        {
            throw new ArgumentOutOfRangeException(nameof(confidence), confidence, "confidence must be strictly between 0 and 1 (0.90 = 90 %)");
        }
        double exact = Math.Log(1 - confidence) / Math.Log(1 - ltpdFraction);
        // A ratio that is an integer up to rounding (e.g. p1 = 0.5, confidence = 0.75 gives 2)
        // must not be pushed to the next integer by a last-bit error.
        double n = Math.Ceiling(exact - 1e-9 * exact);
        if (n > int.MaxValue)
        {
            throw new ArgumentOutOfRangeException(nameof(ltpdFraction), ltpdFraction, string.Create(CultureInfo.InvariantCulture,
                $"the zero-acceptance sample size for LTPD {ltpdFraction} at confidence {confidence} is too large ({n})"));
        }
        return Math.Max(1, (int)n);
    }

    /// <summary>
    /// A zero-acceptance (Ac = 0, Re = 1) plan for a lot, sized by <see cref="ZeroAcceptanceSampleSize"/>;
    /// 100 % inspection when that n reaches the lot size.
    /// </summary>
    /// <param name="lotSize">Units in the lot, at least 1.</param>
    /// <param name="ltpdFraction">p1, 0 &lt; p1 &lt; 1.</param>
    /// <param name="confidence">1 − β, 0 &lt; confidence &lt; 1.</param>
    /// <exception cref="ArgumentOutOfRangeException">Lot size below 1, or p1/confidence out of range.</exception>
    public static SamplingPlan ZeroAcceptance(int lotSize, double ltpdFraction, double confidence)
    {
        CheckLotSize(lotSize);
        int n = ZeroAcceptanceSampleSize(ltpdFraction, confidence);
        return new SamplingPlan(SamplingPlanKind.ZeroAcceptance, ZeroAcceptanceName, lotSize, n, 0, 1)
        {
            LtpdFraction = ltpdFraction,
            Confidence = confidence,
        };
    }

    /// <summary>100 % inspection of a lot: every unit is inspected; the lot is accepted with at most <paramref name="acceptanceNumber"/> defectives.</summary>
    /// <param name="lotSize">Units in the lot, at least 1.</param>
    /// <param name="acceptanceNumber">Ac, default 0 (any defective rejects the lot); 0 ≤ Ac &lt; lot size.</param>
    /// <exception cref="ArgumentOutOfRangeException">Lot size below 1 or Ac out of range.</exception>
    public static SamplingPlan FullInspection(int lotSize, int acceptanceNumber = 0)
    {
        CheckLotSize(lotSize);
        if (acceptanceNumber < 0 || acceptanceNumber >= lotSize)
        {
            throw new ArgumentOutOfRangeException(nameof(acceptanceNumber), acceptanceNumber,
                string.Create(CultureInfo.InvariantCulture, $"Ac must be at least 0 and below the lot size {lotSize}"));
        }
        return new SamplingPlan(SamplingPlanKind.FullInspection, FullInspectionName, lotSize, lotSize, acceptanceNumber, acceptanceNumber + 1);
    }

    private static void CheckLotSize(int lotSize)
    {
        if (lotSize < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(lotSize), lotSize, "a lot holds at least 1 unit");
        }
    }
}
