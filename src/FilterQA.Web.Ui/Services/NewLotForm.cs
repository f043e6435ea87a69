using System.Globalization;
using FilterQA.Core.Sampling;
using FilterQA.Data.Services;

namespace FilterQA.Web.Ui.Services;

/// <summary>
/// The new-lot form's fields, with the incoming plan's defaults: MIL-STD-105E general inspection level II,
/// AQL 0.65 % and the severity from the part and supplier's switching history. Only a quality engineer may
/// change the plan; for anyone else <see cref="ToNewLot"/> uses the defaults whatever the fields say.
/// </summary>
public sealed class NewLotForm
{
    /// <summary>The default inspection level of the incoming plan.</summary>
    public const InspectionLevel DefaultLevel = InspectionLevel.II;

    /// <summary>The default AQL of the incoming plan, percent nonconforming (major defects).</summary>
    public const double DefaultAqlPercent = 0.65;

    /// <summary>The AQL values the form offers, percent (the preferred series of the sampling tables).</summary>
    public static IReadOnlyList<double> AqlChoices { get; } = [0.010, 0.015, 0.025, 0.040, 0.065, 0.10, 0.15, 0.25, 0.40, 0.65, 1.0, 1.5, 2.5, 4.0, 6.5];

    public string LotNumber { get; set; } = "";

    public string PartNumber { get; set; } = "";

    public string Supplier { get; set; } = "";

    public string? SupplierLot { get; set; }

    public string? DateCode { get; set; }

    public int QuantityReceived { get; set; }

    public string? PurchaseOrder { get; set; }

    public string? Customer { get; set; }

    public PlanChoice Plan { get; set; } = PlanChoice.Standard;

    public InspectionLevel Level { get; set; } = DefaultLevel;

    public double AqlPercent { get; set; } = DefaultAqlPercent;

    /// <summary>Null: from the switching history.</summary>
    public InspectionSeverity? Severity { get; set; }

    /// <summary>Lot tolerance percent defective for a c = 0 plan, percent (0..100 exclusive).</summary>
    public double LtpdPercent { get; set; } = 5;

    /// <summary>Confidence of a c = 0 plan, percent (0..100 exclusive).</summary>
    public double ConfidencePercent { get; set; } = 90;

    /// <summary>Acceptance number for 100 % inspection.</summary>
    public int FullInspectionAcceptance { get; set; }

    /// <summary>Every problem with the fields, in form order; empty when the lot can be created.</summary>
    public IReadOnlyList<string> Problems(bool mayChangePlan)
    {
        var problems = new List<string>();
        if (string.IsNullOrWhiteSpace(LotNumber))
        {
            problems.Add("Lot number: give the lot number, e.g. VP-2611-0042.");
        }
        if (string.IsNullOrWhiteSpace(PartNumber))
        {
            problems.Add("Part: choose the part number.");
        }
        if (string.IsNullOrWhiteSpace(Supplier))
        {
            problems.Add("Supplier: give the supplier.");
        }
        if (QuantityReceived < 1)
        {
            problems.Add(string.Create(CultureInfo.InvariantCulture, $"Quantity received: at least 1 unit (is {QuantityReceived})."));
        }
        if (mayChangePlan)
        {
            if (Plan == PlanChoice.Standard && !(AqlPercent > 0))
            {
                problems.Add("AQL: choose an AQL above 0 %.");
            }
            if (Plan == PlanChoice.ZeroAcceptance && !(LtpdPercent > 0 && LtpdPercent < 100))
            {
                problems.Add(string.Create(CultureInfo.InvariantCulture, $"LTPD: between 0 and 100 % (is {LtpdPercent} %)."));
            }
            if (Plan == PlanChoice.ZeroAcceptance && !(ConfidencePercent > 0 && ConfidencePercent < 100))
            {
                problems.Add(string.Create(CultureInfo.InvariantCulture, $"Confidence: between 0 and 100 % (is {ConfidencePercent} %)."));
            }
            if (Plan == PlanChoice.FullInspection && FullInspectionAcceptance < 0)
            {
                problems.Add("Acceptance number: 0 or more.");
            }
        }
        return problems;
    }

    /// <summary>The lot to create; the plan from the fields when <paramref name="mayChangePlan"/>, else the defaults.</summary>
    /// <exception cref="InvalidOperationException">The fields have problems (see <see cref="Problems"/>).</exception>
    public NewLot ToNewLot(bool mayChangePlan)
    {
        IReadOnlyList<string> problems = Problems(mayChangePlan);
        if (problems.Count > 0)
        {
            throw new InvalidOperationException(string.Join(" ", problems));
        }
        PlanRequest plan = !mayChangePlan
            ? PlanRequest.Mil105E(DefaultLevel, DefaultAqlPercent)
            : Plan switch
            {
                PlanChoice.ZeroAcceptance => PlanRequest.ZeroAcceptance(LtpdPercent / 100, ConfidencePercent / 100),
                PlanChoice.FullInspection => PlanRequest.FullInspection(FullInspectionAcceptance),
                _ => PlanRequest.Mil105E(Level, AqlPercent, Severity),
            };
        return new NewLot(LotNumber.Trim(), PartNumber.Trim(), null, Supplier.Trim(), QuantityReceived, plan)
        {
            SupplierLot = Blank(SupplierLot),
            DateCode = Blank(DateCode),
            PurchaseOrder = Blank(PurchaseOrder),
            Customer = Blank(Customer),
        };
    }

    private static string? Blank(string? text) => string.IsNullOrWhiteSpace(text) ? null : text.Trim();
}
