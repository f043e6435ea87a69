namespace FilterQA.Core.Sampling;

/// <summary>What a sampling plan says about a lot given the sample inspected so far.</summary>
public enum LotDecision
{
    /// <summary>The sample is not complete and no decision is reached yet.</summary>
    Pending,

    /// <summary>Complete sample, defectives ≤ Ac: accept the lot.</summary>
    Accept,

    /// <summary>
    /// Complete sample on a plan with a gap (reduced inspection), Ac &lt; defectives &lt; Re:
    /// accept the lot, and return to normal inspection from the next lot.
    /// </summary>
    AcceptReturnToNormal,

    /// <summary>Complete sample, defectives ≥ Re: reject the lot.</summary>
    Reject,

    /// <summary>
    /// Defectives reached Re before the sample was complete: rejection is already decided and the
    /// rest of the sample need not be inspected (curtailed inspection, allowed unless switched off).
    /// </summary>
    RejectDecided,
}
