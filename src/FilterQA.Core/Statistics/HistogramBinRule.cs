namespace FilterQA.Core.Statistics;

/// <summary>How a histogram chooses its bins when the caller gives no edges.</summary>
public enum HistogramBinRule
{
    /// <summary>
    /// Freedman–Diaconis: bin width 2·IQR·n^(−1/3) (IQR as MathNet.Numerics'
    /// Statistics.InterquartileRange computes it); falls back to Sturges when the IQR is 0. The default.
    /// </summary>
    FreedmanDiaconis,

    /// <summary>Sturges: ⌈log₂ n⌉ + 1 bins of equal width.</summary>
    Sturges,
}
