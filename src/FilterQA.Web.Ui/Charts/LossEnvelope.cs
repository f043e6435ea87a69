using System.Collections.Immutable;

namespace FilterQA.Web.Ui.Charts;

/// <summary>
/// Many traces reduced to frequency bins: per bin the smallest and largest loss any trace had there
/// (dB, positive = attenuation). A bin no point fell into has a count of 0 and NaN for both losses;
/// charts leave such bins out.
/// </summary>
/// <param name="StartHz">Lower edge of the first bin, Hz.</param>
/// <param name="StopHz">Upper edge of the last bin, Hz (the last bin includes it).</param>
/// <param name="BinCentreHz">Centre of each bin, Hz.</param>
/// <param name="MinLossDb">Smallest loss in each bin, dB.</param>
/// <param name="MaxLossDb">Largest loss in each bin, dB.</param>
/// <param name="PointCounts">How many points fell in each bin.</param>
/// <param name="TraceCount">How many traces were reduced.</param>
public sealed record LossEnvelope(
    double StartHz,
    double StopHz,
    ImmutableArray<double> BinCentreHz,
    ImmutableArray<double> MinLossDb,
    ImmutableArray<double> MaxLossDb,
    ImmutableArray<int> PointCounts,
    int TraceCount)
{
    /// <summary>The envelope of no traces: no bins.</summary>
    public static LossEnvelope Empty { get; } = new(0, 0, [], [], [], [], 0);

    /// <summary>Number of bins.</summary>
    public int BinCount => BinCentreHz.Length;
}
