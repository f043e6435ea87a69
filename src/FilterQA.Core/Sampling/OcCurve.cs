namespace FilterQA.Core.Sampling;

/// <summary>An operating-characteristic curve: probability of acceptance and AOQ at each fraction defective.</summary>
public sealed class OcCurve
{
    private readonly double[] _p;
    private readonly double[] _pa;
    private readonly double[] _aoq;

    internal OcCurve(OcModel model, double[] fractionDefective, double[] acceptanceProbability, double[] aoq)
    {
        Model = model;
        _p = fractionDefective;
        _pa = acceptanceProbability;
        _aoq = aoq;
    }

    /// <summary>Distribution the curve was computed with.</summary>
    public OcModel Model { get; }

    /// <summary>Number of points.</summary>
    public int Count => _p.Length;

    /// <summary>Fraction defective p of each point, 0..1, increasing.</summary>
    public ReadOnlySpan<double> FractionDefective => _p;

    /// <summary>Probability of acceptance Pa at each point, 0..1.</summary>
    public ReadOnlySpan<double> AcceptanceProbability => _pa;

    /// <summary>Average outgoing quality p·Pa·(N − n)/N at each point, fraction 0..1 (rejected lots screened, defectives replaced).</summary>
    public ReadOnlySpan<double> AverageOutgoingQuality => _aoq;
}
