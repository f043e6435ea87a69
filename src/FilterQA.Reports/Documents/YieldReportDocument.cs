using System.Globalization;
using FilterQA.Core.Statistics;
using FilterQA.Core.Sweeps;
using FilterQA.Reports.Charts;
using FilterQA.Reports.Pdf;
using FilterQA.Reports.Text;

namespace FilterQA.Reports.Documents;

/// <summary>
/// The yield report of a lot or of a part over a period: yield per lot and in total, Pareto, histograms with
/// limits, Cp/Cpk, every unit's sweep as an envelope against the mask, and the non-conforming units. Multi-page.
/// </summary>
public sealed class YieldReportDocument(ReportFonts fonts)
{
    private const float OverlayHeightPt = 260;

    public void Render(YieldReportContent content, PaperSize paper, Stream output)
    {
        ArgumentNullException.ThrowIfNull(content);
        ArgumentNullException.ThrowIfNull(output);
        var header = new RunningHeader("Yield report · " + content.Scope, $"part {content.PartNumber}",
            $"generated {Say.Time(content.Stamp.GeneratedAt)} by {content.Stamp.GeneratedBy}");
        using var flow = new PageFlow(fonts, paper, header);
        flow.Text("Yield report", TextStyle.Title);
        flow.Text($"{content.Scope} · {content.PartNumber} {content.PartDescription}", TextStyle.Body with { Colour = TextStyle.Muted });
        flow.Heading("Yield");
        flow.Fields(
        [
            DocumentParts.Field("Lots", Say.Integer(content.Lots.Count)),
            DocumentParts.Field("Units tested", Say.Integer(content.UnitsTested)),
            DocumentParts.Field("Go at first attempt", Say.Integer(content.FirstPassGo)),
            DocumentParts.Field("Go as counted", Say.Integer(content.FinalGo)),
            DocumentParts.Field("First-pass yield", Say.Percent(Fraction(content.FirstPassGo, content.UnitsTested))),
            DocumentParts.Field("Final yield", Say.Percent(Fraction(content.FinalGo, content.UnitsTested))),
        ]);
        flow.Space(2);
        flow.Table(new ReportTable("Yield per lot",
        [
            new TableColumn("Lot", 1.8f),
            new TableColumn("Supplier", 1.8f),
            new TableColumn("Registered", 1.2f),
            new TableColumn("Status", 1.1f),
            new TableColumn("Tested", 0.9f, CellAlign.Right),
            new TableColumn("First-pass go", 1.1f, CellAlign.Right),
            new TableColumn("Final go", 0.9f, CellAlign.Right),
            new TableColumn("First-pass yield", 1.2f, CellAlign.Right),
            new TableColumn("Final yield", 1.1f, CellAlign.Right),
        ], content.Lots.Select(l => new TableRow([l.LotNumber, l.Supplier, Say.Date(l.CreatedAt), l.Status, Say.Integer(l.UnitsTested),
            Say.Integer(l.FirstPassGo), Say.Integer(l.FinalGo), Say.Percent(l.FirstPassYield), Say.Percent(l.FinalYield)])).ToArray()));

        flow.Heading("Pareto of failing rules");
        DocumentParts.Pareto(flow, fonts, content.Pareto);

        // The heading, the chart and its caption stay on one page.
        flow.KeepTogether(30 + OverlayHeightPt + 3 * flow.LineHeight(TextStyle.Small));
        flow.Heading("Every unit against the mask");
        LossEnvelope envelope = content.Envelope;
        IReadOnlyList<ResponseTrace> examples = content.ExampleSweeps;
        if (envelope.TraceCount == 0)
        {
            flow.Text("No unit has a counted sweep.", TextStyle.Body);
        }
        else
        {
            flow.Block(OverlayHeightPt, (canvas, rect) => OverlayChart.Draw(fonts, canvas, rect, envelope, examples, content.Mask));
            flow.Text(string.Create(CultureInfo.InvariantCulture,
                $"Shaded: the least and greatest loss of all {envelope.TraceCount} counted sweeps in each of {envelope.CentresHz.Length} frequency bins; lines: {examples.Count} of the units. {content.MaskNote}"),
                TextStyle.Small);
        }

        flow.Heading("Key parameters");
        flow.Table(CapabilityTable(content.Parameters));
        flow.Text("Histograms: units per bin of the counted values; dashed red lines are the limits. Cp and Cpk here use the overall standard deviation of the values (strictly Pp and Ppk); the lower bound is Bissell's at the confidence shown.",
            TextStyle.Small);
        float chartWidth = (flow.ContentWidthPt - 12) / 2;
        for (int i = 0; i < content.Parameters.Count; i += 2)
        {
            ParameterSummary left = content.Parameters[i];
            ParameterSummary? right = i + 1 < content.Parameters.Count ? content.Parameters[i + 1] : null;
            flow.Block(170, (canvas, rect) =>
            {
                HistogramChart.Draw(fonts, canvas, SkiaSharp.SKRect.Create(rect.Left, rect.Top, chartWidth, rect.Height), left, left.Parameter);
                if (right is not null)
                {
                    HistogramChart.Draw(fonts, canvas, SkiaSharp.SKRect.Create(rect.Left + chartWidth + 12, rect.Top, chartWidth, rect.Height), right, right.Parameter);
                }
            });
            flow.Space(6);
        }

        flow.Heading("Non-conforming units");
        if (content.NonConforming.Count == 0)
        {
            flow.Text("Every counted measurement is go.", TextStyle.Body);
        }
        else
        {
            flow.Table(DocumentParts.FailingUnitsTable("Non-conforming units and their blocking rules", content.NonConforming, showLot: true));
        }
        flow.Write(output, new DocumentMetadata("Yield report, " + content.Scope, content.Stamp.GeneratedBy,
            $"Yield of part {content.PartNumber}: {content.Scope}", content.Stamp.GeneratedAt));
    }

    internal static ReportTable CapabilityTable(IReadOnlyList<ParameterSummary> parameters)
    {
        var rows = new List<TableRow>(parameters.Count);
        foreach (ParameterSummary p in parameters)
        {
            SampleMoments m = p.Moments;
            double largest = new[] { m.Minimum, m.Maximum, p.Limits?.Lower ?? 0, p.Limits?.Upper ?? 0 }.Where(double.IsFinite).Select(Math.Abs).DefaultIfEmpty(0).Max();
            DisplayUnit unit = DisplayUnit.For(p.Unit, largest);
            int decimals = unit.DecimalsFor(unit.From(largest));
            CapabilityIndices? c = p.Capability;
            rows.Add(new TableRow(
            [
                p.Parameter,
                unit.Symbol.Length == 0 ? "ratio" : unit.Symbol,
                Say.Integer(m.Count),
                unit.Number(m.Mean, decimals),
                unit.Number(m.StandardDeviation, decimals),
                unit.Number(p.Limits?.Lower, decimals),
                unit.Number(p.Limits?.Upper, decimals),
                Say.Fixed(c?.Cp, 2),
                Say.Fixed(c?.Cpk, 2),
                c is null ? (p.CapabilityNote ?? "–") : Say.Fixed(c.CpkLowerBound, 2) + " (" + Say.Fixed(100 * c.Confidence, 0) + " %)",
            ]));
        }
        return new ReportTable("Capability",
        [
            new TableColumn("Parameter", 2.4f),
            new TableColumn("Unit", 0.7f),
            new TableColumn("n", 0.7f, CellAlign.Right),
            new TableColumn("Mean", 1.2f, CellAlign.Right),
            new TableColumn("Std dev", 1.2f, CellAlign.Right),
            new TableColumn("Lower limit", 1.2f, CellAlign.Right),
            new TableColumn("Upper limit", 1.2f, CellAlign.Right),
            new TableColumn("Cp", 0.7f, CellAlign.Right),
            new TableColumn("Cpk", 0.7f, CellAlign.Right),
            new TableColumn("Cpk lower bound", 1.7f, CellAlign.Right),
        ], rows);
    }

    private static double? Fraction(int part, int whole) => whole == 0 ? null : (double)part / whole;
}
