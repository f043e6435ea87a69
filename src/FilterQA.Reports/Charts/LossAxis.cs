using ScottPlot;

namespace FilterQA.Reports.Charts;

/// <summary>The loss axis of a sweep chart: attenuation grows downwards, as a filter's response is usually read.</summary>
internal static class LossAxis
{
    public const string Label = "Loss (dB, attenuation positive)";

    public static void Apply(Plot plot, double lowestDb, double highestDb, FrequencyScale scale, double startHz, double stopHz)
    {
        if (!(highestDb > lowestDb))
        {
            highestDb = lowestDb + 1;
        }
        double pad = (highestDb - lowestDb) * 0.04;
        plot.Axes.SetLimitsX(scale.From(startHz), scale.From(stopHz));
        // Bottom above top inverts the axis: more attenuation lower on the page.
        plot.Axes.SetLimitsY(highestDb + pad, lowestDb - pad);
        plot.XLabel("Frequency (" + scale.Symbol + ")");
        plot.YLabel(Label);
    }
}
