namespace FilterQA.Core.Sampling;

/// <summary>
/// The result of original (first) inspection of one lot, as the switching rules need it.
/// Resubmitted lots are not original inspection and do not belong in the history.
/// </summary>
public sealed record LotOutcome
{
    private readonly bool _betweenAcAndRe;

    /// <summary>Makes an outcome.</summary>
    /// <param name="accepted">True when the lot was accepted on original inspection (including an accept in the reduced gap).</param>
    /// <param name="defectives">Defectives found in the sample, 0..sampleSize.</param>
    /// <param name="sampleSize">Units in the sample, at least 1.</param>
    /// <exception cref="ArgumentOutOfRangeException">Sample size below 1, or defectives outside 0..sampleSize.</exception>
    public LotOutcome(bool accepted, int defectives, int sampleSize)
    {
        if (sampleSize < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(sampleSize), sampleSize, "a lot outcome needs a sample of at least 1 unit");
        }
        if (defectives < 0 || defectives > sampleSize)
        {
            throw new ArgumentOutOfRangeException(nameof(defectives), defectives,
                FormattableString.Invariant($"defectives must be between 0 and the sample size {sampleSize}"));
        }
        Accepted = accepted;
        Defectives = defectives;
        SampleSize = sampleSize;
    }

    /// <summary>True when the lot was accepted on original inspection.</summary>
    public bool Accepted { get; }

    /// <summary>Defectives found in the sample.</summary>
    public int Defectives { get; }

    /// <summary>Units in the sample.</summary>
    public int SampleSize { get; }

    /// <summary>
    /// True when, on reduced inspection, the defectives were above Ac but below Re: the lot is
    /// accepted and inspection returns to normal. Only an accepted lot can be in the gap.
    /// </summary>
    /// <exception cref="ArgumentException">Set true on a lot that was not accepted.</exception>
    public bool BetweenAcAndRe
    {
        get => _betweenAcAndRe;
        init
        {
            if (value && !Accepted)
            {
                throw new ArgumentException("a lot between Ac and Re is accepted; a rejected lot cannot be in the gap", nameof(BetweenAcAndRe));
            }
            _betweenAcAndRe = value;
        }
    }

    /// <summary>Ac of the plan the lot was inspected with; needed by the ISO 2859-1 switching score.</summary>
    public int? AcceptanceNumber { get; init; }

    /// <summary>
    /// True when the lot would also have been accepted at the AQL one step tighter; needed by the
    /// ISO 2859-1 switching score when Ac ≥ 2.
    /// </summary>
    public bool? PassesAtNextTighterAql { get; init; }

    /// <summary>False when production was irregular or delayed around this lot; default true.</summary>
    public bool ProductionSteady { get; init; } = true;

    /// <summary>The outcome of a complete sample judged by <paramref name="plan"/>.</summary>
    /// <param name="plan">The plan the lot was inspected with.</param>
    /// <param name="defectives">Defectives in the complete sample.</param>
    /// <param name="productionSteady">False when production was irregular or delayed.</param>
    /// <param name="passesAtNextTighterAql">For the ISO 2859-1 score when Ac ≥ 2; null when not known.</param>
    /// <exception cref="ArgumentOutOfRangeException">Defectives outside 0..n.</exception>
    public static LotOutcome FromPlan(SamplingPlan plan, int defectives, bool productionSteady = true, bool? passesAtNextTighterAql = null)
    {
        ArgumentNullException.ThrowIfNull(plan);
        LotDecision decision = LotDisposition.DecideComplete(plan, defectives);
        bool accepted = decision is LotDecision.Accept or LotDecision.AcceptReturnToNormal;
        return new LotOutcome(accepted, defectives, plan.SampleSize)
        {
            BetweenAcAndRe = decision == LotDecision.AcceptReturnToNormal,
            AcceptanceNumber = plan.AcceptanceNumber,
            PassesAtNextTighterAql = passesAtNextTighterAql,
            ProductionSteady = productionSteady,
        };
    }
}
