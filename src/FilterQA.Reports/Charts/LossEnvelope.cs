namespace FilterQA.Reports.Charts;

/// <summary>
/// The smallest and largest loss (dB, positive = attenuation) of any unit in each frequency bin; a bin no
/// point fell in is left out, so the arrays hold only filled bins, in increasing frequency.
/// </summary>
public sealed record LossEnvelope(double[] CentresHz, double[] MinLossDb, double[] MaxLossDb, int TraceCount)
{
    public static LossEnvelope Empty { get; } = new([], [], [], 0);
}
