namespace FilterQA.Core.Decisions;

/// <summary>
/// The statement for one rule, in the non-binary form of ILAC-G8:09/2019 clause 4.2.3:
/// the measured value against the tolerance limit TL and the guard band w (w = U under guarded
/// acceptance, 0 under simple acceptance).
/// </summary>
public enum RuleOutcome
{
    /// <summary>Inside the acceptance limit (TL moved inward by w).</summary>
    Pass,

    /// <summary>Inside the tolerance limit but within w of it (only with w &gt; 0).</summary>
    ConditionalPass,

    /// <summary>Outside the tolerance limit by no more than w (only with w &gt; 0).</summary>
    ConditionalFail,

    /// <summary>Outside the tolerance limit by more than w.</summary>
    Fail,

    /// <summary>The sweep cannot show the value: span, points, phase or S11 missing, noise floor above the limit, or the thru too old.</summary>
    NotVerifiable,
}
