using FilterQA.Core.Sampling;
using FilterQA.Web.Ui.Services;

namespace FilterQA.Web.Ui.Tests.Services;

public sealed class NewLotFormTests
{
    private static NewLotForm Filled() => new()
    {
        LotNumber = " VP-2611-0042 ",
        PartNumber = "TME-CF455-15",
        Supplier = "Veltrane Piezo",
        QuantityReceived = 1200,
        DateCode = "2544",
        SupplierLot = " ",
    };

    [Fact]
    public void Without_the_right_to_change_the_plan_the_default_plan_applies_whatever_the_fields_say()
    {
        NewLotForm form = Filled();
        form.Plan = PlanChoice.FullInspection;
        var lot = form.ToNewLot(mayChangePlan: false);
        // The incoming default (DOMAIN/SCENARIO): MIL-STD-105E, general level II, AQL 0.65 %, severity from switching.
        Assert.Equal(SamplingPlanKind.Mil105ESingle, lot.Plan.Kind);
        Assert.Equal(InspectionLevel.II, lot.Plan.Level);
        Assert.Equal(0.65, lot.Plan.AqlPercent);
        Assert.Null(lot.Plan.Severity);
        Assert.Equal("VP-2611-0042", lot.LotNumber);
        Assert.Null(lot.SupplierLot);
        Assert.Equal("2544", lot.DateCode);
    }

    [Fact]
    public void A_quality_engineer_may_choose_a_zero_acceptance_plan_given_in_percent()
    {
        NewLotForm form = Filled();
        form.Plan = PlanChoice.ZeroAcceptance;
        form.LtpdPercent = 5;
        form.ConfidencePercent = 90;
        var lot = form.ToNewLot(mayChangePlan: true);
        Assert.Equal(SamplingPlanKind.ZeroAcceptance, lot.Plan.Kind);
        // 5 % and 90 % as fractions; exact within 1e-15 (one division by 100).
        Assert.Equal(0.05, lot.Plan.LtpdFraction!.Value, 15);
        Assert.Equal(0.90, lot.Plan.Confidence!.Value, 15);
    }

    [Fact]
    public void Every_missing_field_is_named_at_once()
    {
        var problems = new NewLotForm().Problems(mayChangePlan: false);
        Assert.Equal(4, problems.Count);
        Assert.StartsWith("Lot number", problems[0], StringComparison.Ordinal);
        Assert.StartsWith("Part", problems[1], StringComparison.Ordinal);
        Assert.StartsWith("Supplier", problems[2], StringComparison.Ordinal);
        Assert.StartsWith("Quantity received", problems[3], StringComparison.Ordinal);
        Assert.Throws<InvalidOperationException>(() => new NewLotForm().ToNewLot(false));
    }
}
