using FilterQA.Core.Sampling;

namespace FilterQA.Core.Tests.Sampling;

public sealed class SamplingPlannerTests
{
    [Fact]
    public void Mil105E_lot_1000_level_II_normal_AQL_1_is_J_80_2_3()
    {
        // MIL-STD-105E Table I: 501-1200 at level II is J; Table II-A J at 1.0 is n = 80, 2/3.
        SamplingPlan plan = SamplingPlanner.Mil105E(1000, InspectionLevel.II, InspectionSeverity.Normal, 1.0);
        Assert.Equal("MIL-STD-105E single sampling", plan.StandardName);
        Assert.Equal(SamplingPlanKind.Mil105ESingle, plan.Kind);
        Assert.Equal(InspectionLevel.II, plan.Level);
        Assert.Equal(InspectionSeverity.Normal, plan.Severity);
        Assert.Equal(1.0, plan.AqlPercent);
        Assert.Equal(CodeLetter.J, plan.TableLetter);
        Assert.Equal(CodeLetter.J, plan.LetterUsed);
        Assert.Equal(80, plan.SampleSize);
        Assert.Equal(2, plan.AcceptanceNumber);
        Assert.Equal(3, plan.RejectionNumber);
        Assert.False(plan.IsFullInspection);
    }

    [Fact]
    public void Mil105E_tightened_and_reduced_use_their_tables()
    {
        // Table II-B J at 1.0: 80, 1/2. Table II-C J at 1.0: 32, 1/3 (Re from memory).
        SamplingPlan tightened = SamplingPlanner.Mil105E(1000, InspectionLevel.II, InspectionSeverity.Tightened, 1.0);
        Assert.Equal((80, 1, 2), (tightened.SampleSize, tightened.AcceptanceNumber, tightened.RejectionNumber));
        SamplingPlan reduced = SamplingPlanner.Mil105E(1000, InspectionLevel.II, InspectionSeverity.Reduced, 1.0);
        Assert.Equal((32, 1, 3), (reduced.SampleSize, reduced.AcceptanceNumber, reduced.RejectionNumber));
        Assert.True(reduced.HasAcceptReturnGap);
    }

    [Fact]
    public void Mil105E_arrow_to_another_letter_takes_that_letters_n()
    {
        // Table I: lot 40 at level II is D; Table II-A D at 1.0 is ↓ → E, n = 13, 0/1.
        SamplingPlan plan = SamplingPlanner.Mil105E(40, InspectionLevel.II, InspectionSeverity.Normal, 1.0);
        Assert.Equal(CodeLetter.D, plan.TableLetter);
        Assert.Equal(CodeLetter.E, plan.LetterUsed);
        Assert.Equal(13, plan.SampleSize);
        Assert.Equal(0, plan.AcceptanceNumber);
        Assert.False(plan.IsFullInspection);
    }

    [Fact]
    public void Mil105E_n_at_or_above_lot_size_means_100_percent_inspection()
    {
        // Table I: lot 5 at level II is A; Table II-A A at 0.065 is ↓ down to L, n = 200, 0/1;
        // n >= lot size, so the tables say inspect 100 %.
        SamplingPlan plan = SamplingPlanner.Mil105E(5, InspectionLevel.II, InspectionSeverity.Normal, 0.065);
        Assert.True(plan.IsFullInspection);
        Assert.Equal(5, plan.SampleSize);
        Assert.Equal(200, plan.TableSampleSize);
        Assert.Equal(CodeLetter.L, plan.LetterUsed);
        Assert.Equal(0, plan.AcceptanceNumber);
        Assert.Equal(1, plan.RejectionNumber);
    }

    [Fact]
    public void Mil105E_n_equal_to_lot_size_is_also_100_percent()
    {
        // Table I: 16-25 at S-3 is B; Table II-A B at 4.0 is 0/1 with n = 3 below the lot of 16, so
        // the lot is sampled. Table I: 2-8 at III is B, so a lot of 3 gets n = 3 = lot size: 100 %.
        Assert.False(SamplingPlanner.Mil105E(16, InspectionLevel.S3, InspectionSeverity.Normal, 4.0).IsFullInspection);
        SamplingPlan small = SamplingPlanner.Mil105E(3, InspectionLevel.III, InspectionSeverity.Normal, 4.0);
        Assert.Equal(CodeLetter.B, small.TableLetter); // Table I: 2-8 at III is B
        Assert.True(small.IsFullInspection);            // n = 3 equals the lot size 3
        Assert.Equal(3, small.SampleSize);
    }

    [Theory]
    [InlineData(0.01, 0.90, 230)] // DOMAIN 5 zero-acceptance, computed: 1 % at 90 %
    [InlineData(0.01, 0.95, 299)] // 1 % at 95 %
    [InlineData(0.02, 0.90, 114)] // 2 % at 90 %
    [InlineData(0.05, 0.90, 45)]  // computed below by the loop
    [InlineData(0.5, 0.75, 2)]    // (1/2)^2 = 1/4 exactly: n = 2, not 3
    public void ZeroAcceptanceSampleSize_is_the_smallest_n_with_acceptance_at_most_beta(double p1, double confidence, int expected)
    {
        // Check by direct search: the smallest n with (1 - p1)^n <= 1 - confidence (c = 0 binomial).
        int n = 1;
        while (Math.Pow(1 - p1, n) > 1 - confidence + 1e-15)
        {
            n++;
        }
        Assert.Equal(expected, n);
        Assert.Equal(expected, SamplingPlanner.ZeroAcceptanceSampleSize(p1, confidence));
    }

    [Fact]
    public void ZeroAcceptance_plan_is_c_0_and_becomes_100_percent_for_a_small_lot()
    {
        SamplingPlan plan = SamplingPlanner.ZeroAcceptance(5000, 0.01, 0.90);
        Assert.Equal(SamplingPlanKind.ZeroAcceptance, plan.Kind);
        Assert.Equal((230, 0, 1), (plan.SampleSize, plan.AcceptanceNumber, plan.RejectionNumber));
        Assert.Equal(0.01, plan.LtpdFraction);
        Assert.Null(plan.TableLetter);
        SamplingPlan small = SamplingPlanner.ZeroAcceptance(200, 0.01, 0.90);
        Assert.True(small.IsFullInspection);
        Assert.Equal(200, small.SampleSize);
        Assert.Equal(230, small.TableSampleSize);
    }

    [Fact]
    public void FullInspection_inspects_every_unit()
    {
        SamplingPlan plan = SamplingPlanner.FullInspection(120);
        Assert.True(plan.IsFullInspection);
        Assert.Equal(120, plan.SampleSize);
        Assert.Equal((0, 1), (plan.AcceptanceNumber, plan.RejectionNumber));
        Assert.Equal("100 % inspection", plan.StandardName);
    }

    [Theory]
    [InlineData(0.0, 0.9)]
    [InlineData(1.0, 0.9)]
    [InlineData(0.01, 1.0)]
    [InlineData(0.01, 0.0)]
    [InlineData(double.NaN, 0.9)]
    public void ZeroAcceptanceSampleSize_rejects_out_of_range_inputs(double p1, double confidence)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => SamplingPlanner.ZeroAcceptanceSampleSize(p1, confidence));
    }

    [Fact]
    public void FullInspection_rejects_an_acceptance_number_not_below_the_lot()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => SamplingPlanner.FullInspection(10, 10));
        Assert.Throws<ArgumentOutOfRangeException>(() => SamplingPlanner.FullInspection(0));
    }
}
