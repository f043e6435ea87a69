using FilterQA.Reports.Pdf;
using FilterQA.Reports.Text;

namespace FilterQA.Reports.Documents;

/// <summary>The rejection report of a rejected lot: lot, plan and decision, failing units with their failing rules, Pareto.</summary>
public sealed class RejectionReportDocument(ReportFonts fonts)
{
    public void Render(RejectionReportContent content, PaperSize paper, Stream output)
    {
        ArgumentNullException.ThrowIfNull(content);
        ArgumentNullException.ThrowIfNull(output);
        LotHeader lot = content.Lot;
        var header = new RunningHeader("Rejection report · lot " + lot.LotNumber, $"part {lot.PartNumber} rev {lot.TemplateRevision}",
            $"generated {Say.Time(content.Stamp.GeneratedAt)} by {content.Stamp.GeneratedBy}");
        using var flow = new PageFlow(fonts, paper, header);
        flow.Text("Rejection report", TextStyle.Title);
        flow.Text($"Lot {lot.LotNumber} of {lot.PartNumber} from {lot.Supplier}", TextStyle.Body with { Colour = TextStyle.Muted });
        flow.Heading("Lot");
        DocumentParts.LotFields(flow, lot);
        flow.Heading("Sampling plan and decision");
        DocumentParts.PlanFields(flow, lot.Plan);
        flow.Fields(
        [
            DocumentParts.Field("Units tested", Say.Integer(content.UnitsTested)),
            DocumentParts.Field("Defectives", Say.Integer(content.Defectives)),
            DocumentParts.Field("Decision", content.Decision + (content.DecisionIsOverride ? " (override)" : string.Empty)),
            DocumentParts.Field("Decided by", Say.OrDash(content.DecidedBy)),
            DocumentParts.Field("Decided at (UTC)", content.DecidedAt is { } at ? Say.Time(at) : "–"),
        ]);
        flow.Fields([DocumentParts.Field("Reason", Say.OrDash(content.DecisionReason))], 1);
        flow.Heading("Pareto of failing rules");
        DocumentParts.Pareto(flow, fonts, content.Pareto);
        flow.Heading("Failing units");
        if (content.FailingUnits.Count == 0)
        {
            flow.Text("No counted measurement is no-go or not verifiable.", TextStyle.Body);
        }
        else
        {
            flow.Table(DocumentParts.FailingUnitsTable("Failing units and their blocking rules", content.FailingUnits, showLot: false));
        }
        flow.Write(output, new DocumentMetadata("Rejection report, lot " + lot.LotNumber, content.Stamp.GeneratedBy,
            $"Lot {lot.LotNumber}, part {lot.PartNumber}, supplier {lot.Supplier}: rejected", content.Stamp.GeneratedAt));
    }
}
