using System.Globalization;
using FilterQA.Core.Statistics;
using FilterQA.Data.Services.Certificates;
using FilterQA.Reports.Charts;
using FilterQA.Reports.Pdf;
using FilterQA.Reports.Text;

namespace FilterQA.Reports.Documents;

/// <summary>Sections more than one report prints the same way.</summary>
internal static class DocumentParts
{
    public static KeyValuePair<string, string> Field(string label, string value) => new(label, value);

    public static void LotFields(PageFlow flow, LotHeader lot)
    {
        flow.Fields(
        [
            Field("Lot", lot.LotNumber),
            Field("Status", lot.Status),
            Field("Part number", lot.PartNumber),
            Field("Part", lot.PartDescription),
            Field("Template revision", Say.Integer(lot.TemplateRevision)),
            Field("Registered (UTC)", Say.Time(lot.CreatedAt)),
            Field("Supplier", lot.Supplier),
            Field("Supplier lot", Say.OrDash(lot.SupplierLot)),
            Field("Date code", Say.OrDash(lot.DateCode)),
            Field("Quantity received", Say.Integer(lot.QuantityReceived)),
            Field("Customer", Say.OrDash(lot.Customer)),
            Field("Purchase order", Say.OrDash(lot.PurchaseOrder)),
        ]);
        flow.Fields([Field("Template hash", lot.TemplateHash)], 1);
    }

    public static void PlanFields(PageFlow flow, CertificatePlan plan)
    {
        flow.Fields(
        [
            Field("Standard", plan.Standard),
            Field("Inspection level", Say.OrDash(plan.InspectionLevel)),
            Field("Severity", Say.OrDash(plan.Severity)),
            Field("AQL", plan.AqlPercent is { } aql ? aql.ToString("0.###", CultureInfo.InvariantCulture) + " %" : "–"),
            Field("Code letter", Say.OrDash(plan.CodeLetter)),
            Field("Sample size", Say.Integer(plan.SampleSize)),
            Field("Acceptance number (Ac)", Say.Integer(plan.AcceptanceNumber)),
            Field("Rejection number (Re)", Say.Integer(plan.RejectionNumber)),
        ]);
    }

    /// <summary>The Pareto chart beside a table of every failing rule with count, share and cumulative share.</summary>
    public static void Pareto(PageFlow flow, ReportFonts fonts, IReadOnlyList<ParetoEntry> entries)
    {
        if (entries.Count == 0)
        {
            flow.Text("No rule failed in the counted measurements.", TextStyle.Body);
            return;
        }
        ParetoEntry[] shown = entries.Take(ParetoBarChart.MaxBars).ToArray();
        float height = Math.Clamp(40 + 18 * shown.Length, 110, 260);
        flow.Block(height, (canvas, rect) => ParetoBarChart.Draw(fonts, canvas, rect, shown));
        flow.Space(4);
        flow.Table(new ReportTable("Failing rules",
        [
            new TableColumn("Rule", 4),
            new TableColumn("Failures", 1.2f, CellAlign.Right),
            new TableColumn("Share", 1.2f, CellAlign.Right),
            new TableColumn("Cumulative", 1.2f, CellAlign.Right),
        ], entries.Select(e => new TableRow([e.Rule, Say.Integer(e.Count), Say.Percent(e.Share), Say.Percent(e.CumulativeShare)])).ToArray()));
    }

    /// <summary>One row per failing rule of each unit: the unit on its first row, measured value against limit.</summary>
    public static ReportTable FailingUnitsTable(string title, IReadOnlyList<NonConformingUnit> units, bool showLot)
    {
        var rows = new List<TableRow>();
        foreach (NonConformingUnit unit in units)
        {
            if (unit.FailingRules.Count == 0)
            {
                rows.Add(Row(unit, null, first: true));
                continue;
            }
            for (int i = 0; i < unit.FailingRules.Count; i++)
            {
                rows.Add(Row(unit, unit.FailingRules[i], i == 0));
            }
        }
        var columns = new List<TableColumn>();
        if (showLot)
        {
            columns.Add(new TableColumn("Lot", 1.5f));
        }
        columns.AddRange(
        [
            new TableColumn("Serial", 1.2f),
            new TableColumn("Attempt", 1.15f, CellAlign.Right),
            new TableColumn("Verdict", 1.1f),
            new TableColumn("Failing rule", 2.6f),
            new TableColumn("Measured", 1.4f, CellAlign.Right),
            new TableColumn("Limit", 1.5f, CellAlign.Right),
            new TableColumn("Outcome", 1.2f),
        ]);
        return new ReportTable(title, columns, rows);

        TableRow Row(NonConformingUnit unit, RuleLine? rule, bool first)
        {
            var cells = new List<string>();
            if (showLot)
            {
                cells.Add(first ? unit.LotNumber : string.Empty);
            }
            cells.Add(first ? unit.Serial : string.Empty);
            cells.Add(first ? Say.Integer(unit.Attempt) : string.Empty);
            cells.Add(first ? unit.Verdict : string.Empty);
            cells.Add(rule is null ? "(no blocking rule recorded)" : rule.RuleId);
            cells.Add(rule is null ? "–" : RuleFormat.Value(rule));
            cells.Add(rule is null ? "–" : RuleFormat.Limit(rule));
            cells.Add(rule is null ? "–" : Say.Outcome(rule.Outcome));
            return new TableRow(cells, Alarm: false);
        }
    }
}
