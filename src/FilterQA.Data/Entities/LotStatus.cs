namespace FilterQA.Data.Entities;

/// <summary>Where a lot is in its life.</summary>
public enum LotStatus
{
    /// <summary>Created; no unit tested yet (its template revision may still be changed).</summary>
    Open,

    /// <summary>At least one unit tested.</summary>
    InTest,

    /// <summary>Quarantined: no more measurements until the hold is released or the lot is dispositioned.</summary>
    Held,

    Accepted,

    Rejected,
}
