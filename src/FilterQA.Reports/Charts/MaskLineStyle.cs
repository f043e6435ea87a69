using FilterQA.Core.Decisions;
using FilterQA.Core.Templates;
using ScottPlot;

namespace FilterQA.Reports.Charts;

/// <summary>Limit lines drawn the same way in every chart: maximum loss red dashed, minimum loss (rejection) blue dash-dot.</summary>
internal static class MaskLineStyle
{
    public static readonly Color MaximumLoss = Color.FromHex("#c0182b");
    public static readonly Color MinimumLoss = Color.FromHex("#1f4fb4");

    public static void Add(Plot plot, IReadOnlyList<MaskLine> mask, FrequencyScale scale)
    {
        bool upperNamed = false, lowerNamed = false;
        foreach (MaskLine line in mask)
        {
            if (line.FrequenciesHz.Length == 0)
            {
                continue;
            }
            bool upper = line.Boundary == LimitBoundary.Upper;
            double[] xs = line.FrequenciesHz.Select(scale.From).ToArray();
            double[] ys = [.. line.LossDb];
            var scatter = plot.Add.ScatterLine(xs, ys);
            scatter.Color = upper ? MaximumLoss : MinimumLoss;
            scatter.LineWidth = 1.6f;
            scatter.LinePattern = upper ? LinePattern.Dashed : LinePattern.DenselyDashed;
            scatter.MarkerSize = 0;
            if (upper && !upperNamed)
            {
                scatter.LegendText = "limit: maximum loss";
                upperNamed = true;
            }
            else if (!upper && !lowerNamed)
            {
                scatter.LegendText = "limit: minimum loss";
                lowerNamed = true;
            }
        }
    }
}
