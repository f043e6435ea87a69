namespace FilterQA.Web.Ui.Services;

/// <summary>A part's retest policy as the bench needs it.</summary>
/// <param name="MaxRetests">Retests a unit may have (0: the first measurement is the only one).</param>
/// <param name="RetestCounts">True when a retest within the limit decides the unit; false when retests are for information only.</param>
public sealed record RetestRule(int MaxRetests, bool RetestCounts)
{
    /// <summary>Whether a unit measured <paramref name="attempts"/> times may be measured again under this policy.</summary>
    public bool AllowsAnotherAfter(int attempts) => attempts <= MaxRetests;
}
