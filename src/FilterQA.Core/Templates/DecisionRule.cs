namespace FilterQA.Core.Templates;

/// <summary>
/// How a measured value and its uncertainty are turned into go/no-go (ILAC-G8:09/2019; JCGM 106:2012),
/// agreed before measuring and stored with the template.
/// </summary>
public enum DecisionRule
{
    /// <summary>Simple acceptance: guard band w = 0, the acceptance limit is the tolerance limit.</summary>
    SimpleAcceptance,

    /// <summary>
    /// Guarded acceptance, binary: guard band w = U (the rule's expanded uncertainty, k = 2); a value must
    /// lie inside the tolerance limit by at least w to pass.
    /// </summary>
    GuardedAcceptance,
}
