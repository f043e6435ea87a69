using FilterQA.Reports.Charts;
using FilterQA.Reports.Pdf;
using FilterQA.Reports.Text;

namespace FilterQA.Reports.Documents;

/// <summary>One page for one stored measurement: header, sweep against the mask, every rule's value, limit, margin and outcome.</summary>
public sealed class UnitReportDocument(ReportFonts fonts)
{
    public void Render(UnitReportContent content, PaperSize paper, Stream output)
    {
        ArgumentNullException.ThrowIfNull(content);
        ArgumentNullException.ThrowIfNull(output);
        var header = new RunningHeader($"Unit report · {content.Serial} · lot {content.LotNumber}", $"part {content.PartNumber} rev {content.TemplateRevision}",
            $"measurement {content.MeasurementId} · generated {Say.Time(content.Stamp.GeneratedAt)} by {content.Stamp.GeneratedBy}");
        using var flow = new PageFlow(fonts, paper, header);
        flow.Text($"Unit {content.Serial}: {content.Verdict}", TextStyle.Title.WithColour(content.Verdict == "go" ? TextStyle.Good : TextStyle.Alarm));
        flow.Fields(
        [
            DocumentParts.Field("Lot", content.LotNumber),
            DocumentParts.Field("Part number", content.PartNumber),
            DocumentParts.Field("Template revision", Say.Integer(content.TemplateRevision)),
            DocumentParts.Field("Attempt", Say.Integer(content.Attempt) + (content.CountsForLot ? " (counts for the lot)" : " (beyond the retest policy)")),
            DocumentParts.Field("Station", content.Station),
            DocumentParts.Field("Operator", content.Operator),
            DocumentParts.Field("Measured at (UTC)", Say.Time(content.MeasuredAt)),
            DocumentParts.Field("Thru", content.Thru),
            DocumentParts.Field("Measurement", content.MeasurementId.ToString(System.Globalization.CultureInfo.InvariantCulture)),
        ]);
        flow.Fields([DocumentParts.Field("Sweep file", content.SweepFile), DocumentParts.Field("Sweep SHA-256", content.SweepSha256)], 1);
        flow.Space(4);
        float chartHeight = Math.Min(250, flow.PageHeightPt * 0.3f);
        flow.Block(chartHeight, (canvas, rect) => SweepChart.Draw(fonts, canvas, rect, content.Sweep, content.Mask, content.Serial));
        flow.Space(4);
        flow.Table(new ReportTable("Rules",
        [
            new TableColumn("Rule", 1.6f),
            new TableColumn("What", 3),
            new TableColumn("Measured", 1.4f, CellAlign.Right),
            new TableColumn("Limit", 1.5f, CellAlign.Right),
            new TableColumn("Margin", 1.3f, CellAlign.Right),
            new TableColumn("Outcome", 1.2f),
        ], content.Rules.Select(r => new TableRow([r.RuleId, r.Title, RuleFormat.Value(r), RuleFormat.Limit(r), RuleFormat.Margin(r), Say.Outcome(r.Outcome)], r.Blocking)).ToArray()));
        foreach (string warning in content.Warnings)
        {
            flow.Text("Warning: " + warning, TextStyle.Small);
        }
        flow.Write(output, new DocumentMetadata($"Unit report {content.Serial}, lot {content.LotNumber}", content.Stamp.GeneratedBy,
            $"Measurement {content.MeasurementId} of unit {content.Serial}, part {content.PartNumber}: {content.Verdict}", content.Stamp.GeneratedAt));
    }
}
