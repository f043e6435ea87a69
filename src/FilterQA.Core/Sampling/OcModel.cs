namespace FilterQA.Core.Sampling;

/// <summary>Distribution used for the probability of acceptance.</summary>
public enum OcModel
{
    /// <summary>Binomial: a stream of lots, or a lot much larger than the sample (type B OC curve).</summary>
    Binomial,

    /// <summary>Hypergeometric: an isolated lot of known size holding D = round(N·p) defectives (type A OC curve).</summary>
    Hypergeometric,

    /// <summary>Poisson with λ = n·p: the usual approximation for small p.</summary>
    Poisson,
}
